package org.exitance.audit;

import java.util.List;

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
 * @param kind                        whether the surface's own spectrum carries the difference, or
 *                                    the surface is gray and only the others are not
 * @param nonGraySurfaces             with {@link Kind#OTHER_SURFACES}: the surfaces that are not gray
 *                                    (in case order), whose spectra change what reaches this one
 */
public record GrayCause(double effectiveAbsorptivity, double emissivityAtOwnTemperature, double lowerUm,
                        double upperUm, double shareOfDifference, Kind kind, List<String> nonGraySurfaces) {

    /** Where a gray error comes from. */
    public enum Kind {
        /** The surface's own ε varies over the spectrum it receives: α ≠ ε. */
        OWN_SPECTRUM,
        /**
         * The surface is gray (α = ε for any spectrum), so it has no cause of its own: its answer
         * moves only because other surfaces are not gray and change what reaches it.
         */
        OTHER_SURFACES
    }

    public GrayCause {
        nonGraySurfaces = List.copyOf(nonGraySurfaces);
    }
}
