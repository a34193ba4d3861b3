package org.exitance.bands;

/** How a surface absorbs irradiation from outside the surfaces (the environment, sources). */
public enum ExternalAbsorption {
    /**
     * With the band absorptivity weighted by the source's own spectrum (a cold sink's blackbody,
     * the sun's spectrum): the accurate choice and the default.
     */
    SOURCE_SPECTRUM,
    /**
     * With the surface's own band-mean emissivity, as if α = ε for every spectrum: with one band,
     * the classic gray shortcut. Used by the gray-body audit.
     */
    OWN_EMISSIVITY
}
