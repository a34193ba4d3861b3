/**
 * Spectral physics core of Exitance: physical constants, Planck's law and the blackbody
 * radiation functions, diffuse spectral emissivity models and Planck-weighted band averages.
 *
 * <p>Units throughout: wavelength in micrometres (µm), temperature in kelvin (K), emissive powers
 * in W/m² (band/total) or W/(m²·µm) (spectral). Theory and literature: {@code docs/theory-spectral.md}.
 *
 * <p>Main references:
 * <ul>
 *   <li>J. R. Howell, M. P. Mengüç, K. Daun, R. Siegel, <i>Thermal Radiation Heat Transfer</i>,
 *       7th ed., CRC Press, 2021 (cited as "Siegel &amp; Howell").</li>
 *   <li>M. F. Modest, S. Mazumder, <i>Radiative Heat Transfer</i>, 4th ed., Academic Press, 2022
 *       (cited as "Modest"); 3rd ed. 2013 has the same material in Ch. 1.</li>
 *   <li>F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, <i>Fundamentals of Heat and
 *       Mass Transfer</i>, 6th ed., Wiley, 2007, Ch. 12 (cited as "Incropera").</li>
 *   <li>S. L. Chang, K. T. Rhee, "Blackbody radiation functions", <i>Int. Commun. Heat Mass
 *       Transfer</i> 11 (1984) 451–455.</li>
 * </ul>
 */
package org.exitance.spectral;
