package org.exitance.model;

import java.util.Objects;

/**
 * A pack of thin opaque layers covering one face of a surface: a multilayer insulation blanket on
 * a spacecraft panel, a shield pack in a vacuum furnace. Either {@code layers} layers, each a thin
 * two-sided shield whose faces use {@code layerMaterial} (the outermost face {@code outerMaterial}),
 * solved exactly as N shields in series with F = 1 across every gap (infinite parallel sheets);
 * or a stated effective emittance ε* of the whole pack, Q = ε* A σ(T_wall⁴ − T_outer⁴), with one
 * outer sheet (Siegel &amp; Howell, 5th ed., §6.3, radiation shields; the effective emittance of
 * insulation blankets is common practice among spacecraft analysts).
 *
 * @param layers              number of layers, ≥ 1; 0 with an effective emittance
 * @param layerMaterial       the material of every layer face (null with an effective emittance)
 * @param outerMaterial       the material of the face that sees the enclosure
 * @param effectiveEmittance  ε* in (0, 1], or NaN for layers solved one by one
 */
public record Cover(int layers, Material layerMaterial, Material outerMaterial, double effectiveEmittance) {
    public Cover {
        Objects.requireNonNull(outerMaterial, "outerMaterial");
        boolean effective = !Double.isNaN(effectiveEmittance);
        if (effective ? layers != 0 || !(effectiveEmittance > 0 && effectiveEmittance <= 1)
                : layers < 1 || layerMaterial == null) {
            throw new IllegalArgumentException("a cover has layers with a material, or an effective emittance in (0, 1]");
        }
    }

    /** True for a pack given by its effective emittance. */
    public boolean effective() {
        return !Double.isNaN(effectiveEmittance);
    }

    /** The name of the face that sees the enclosure, for a covered surface of this name. */
    public static String outerFace(String surface) {
        return surface + ".outer";
    }
}
