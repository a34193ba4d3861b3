package org.exitance.model;

import java.util.List;
import java.util.Objects;

/**
 * A pack of thin opaque layers covering one face of a surface: a multilayer insulation blanket on
 * a spacecraft panel, a shield pack in a vacuum furnace. Either N layers, each a thin two-sided
 * shield whose two faces use that layer's material (one shared material, or one per layer; the
 * outermost face uses {@code outerMaterial}), solved exactly as N shields in series with F = 1
 * across every gap (infinite parallel sheets);
 * or a stated effective emittance ε* of the whole pack, Q = ε* A σ(T_wall⁴ − T_outer⁴), with one
 * outer sheet (Siegel &amp; Howell, 5th ed., §6.3, radiation shields; the effective emittance of
 * insulation blankets is common practice among spacecraft analysts).
 *
 * @param layerMaterials      the material of each layer, from the covered surface outward (both faces
 *                            of the layer, except the outermost face); empty with an effective
 *                            emittance (copied)
 * @param outerMaterial       the material of the face that sees the enclosure
 * @param effectiveEmittance  ε* in (0, 1], or NaN for layers solved one by one
 */
public record Cover(List<Material> layerMaterials, Material outerMaterial, double effectiveEmittance) {
    public Cover {
        Objects.requireNonNull(outerMaterial, "outerMaterial");
        layerMaterials = List.copyOf(layerMaterials);
        boolean effective = !Double.isNaN(effectiveEmittance);
        if (effective ? !layerMaterials.isEmpty() || !(effectiveEmittance > 0 && effectiveEmittance <= 1)
                : layerMaterials.isEmpty()) {
            throw new IllegalArgumentException("a cover has layers with materials, or an effective emittance in (0, 1]");
        }
    }

    /** {@code layers} layers of one shared material. */
    public Cover(int layers, Material layerMaterial, Material outerMaterial) {
        this(java.util.Collections.nCopies(layers, Objects.requireNonNull(layerMaterial, "layerMaterial")),
                outerMaterial, Double.NaN);
    }

    /** A pack of effective emittance ε* with one outer sheet. */
    public static Cover effective(double effectiveEmittance, Material outerMaterial) {
        return new Cover(List.of(), outerMaterial, effectiveEmittance);
    }

    /** Number of layers; 0 with an effective emittance. */
    public int layers() {
        return layerMaterials.size();
    }

    /** The material of layer k, 1 ≤ k ≤ {@link #layers()} (counted from the covered surface). */
    public Material layerMaterial(int k) {
        return layerMaterials.get(k - 1);
    }

    /** True when every layer uses the same material. */
    public boolean sharedLayerMaterial() {
        return layerMaterials.stream().map(Material::name).distinct().count() <= 1;
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
