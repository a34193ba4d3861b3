/**
 * Irradiation sources, the physics inputs for external and environment radiation: a blackbody
 * at a temperature ({@link org.exitance.spectral.source.BlackbodySource}) and a tabulated
 * spectrum ({@link org.exitance.spectral.source.SourceSpectrum}), behind
 * {@link org.exitance.spectral.source.IrradiationSource}; and the exact absorptivity of a diffuse
 * surface for a tabulated spectrum ({@link org.exitance.spectral.source.SpectrumAbsorptivity}).
 * Imports only {@code org.exitance.spectral}; no model objects, files or JSON.
 *
 * <p>Units: wavelength in µm, temperature in K, spectral irradiance in W/(m²·µm), irradiance in
 * W/m². Total absorptivity and Kirchhoff's law for diffuse surfaces: J. R. Howell, M. P. Mengüç,
 * K. Daun, R. Siegel, <i>Thermal Radiation Heat Transfer</i>, 7th ed., CRC Press, 2021, Ch. 3;
 * F. P. Incropera et al., <i>Fundamentals of Heat and Mass Transfer</i>, 6th ed., Wiley, 2007,
 * Secs. 12.5–12.7.
 */
package org.exitance.spectral.source;
