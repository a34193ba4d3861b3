/**
 * The material survey: property summaries of one material, i.e. total hemispherical emissivity
 * ε(T) over a temperature range, total absorptivity α for an irradiation source (the sources
 * themselves live in {@code org.exitance.spectral.source}), the ratio α/ε, and the curves a
 * spectrum plot draws. Takes model objects, returns records; no files, no JSON (the readers live
 * in {@code org.exitance.cases}, the writers in {@code org.exitance.report}).
 *
 * <p>Units: wavelength in µm, temperature in K, spectral irradiance in W/(m²·µm), irradiance in
 * W/m². Definitions of total emissivity and absorptivity and Kirchhoff's law for diffuse
 * surfaces: J. R. Howell, M. P. Mengüç, K. Daun, R. Siegel, <i>Thermal Radiation Heat
 * Transfer</i>, 7th ed., CRC Press, 2021, Ch. 3; F. P. Incropera et al., <i>Fundamentals of Heat
 * and Mass Transfer</i>, 6th ed., Wiley, 2007, Secs. 12.4–12.7. See docs/theory-spectral.md.
 */
package org.exitance.properties;
