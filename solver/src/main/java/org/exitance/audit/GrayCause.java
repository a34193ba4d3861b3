package org.exitance.audit;

/**
 * Why a surface's gray answer is off, in numbers: what it actually absorbs against what the gray
 * shortcut assumes, and where in the spectrum the difference sits.
 *
 * @param effectiveAbsorptivity       Σ_k ε_k G_k / Σ_k G_k: absorptivity for the radiation the surface
 *                                    actually receives in the band solution (–)
 * @param emissivityAtOwnTemperature  total hemispherical ε at the surface's own temperature: what the
 *                                    gray shortcut uses for absorption too (–)
 * @param lowerUm                     short end of the wavelength range carrying most of the difference (µm)
 * @param upperUm                     long end of that range (µm; +∞ allowed)
 * @param shareOfDifference           share of Σ_k |ε_k − ε| G_k that range carries (–)
 */
public record GrayCause(double effectiveAbsorptivity, double emissivityAtOwnTemperature, double lowerUm,
                        double upperUm, double shareOfDifference) {
}
