package org.exitance.geometry.mesh;

/**
 * Reading options.
 *
 * @param scale factor from file units to metres (e.g. 0.001 for a file in mm), &gt; 0
 * @param normalPolicy STL normal/winding conflicts
 */
public record MeshOptions(double scale, NormalPolicy normalPolicy) {

    /** @throws IllegalArgumentException for a non-positive scale */
    public MeshOptions {
        if (!(scale > 0) || Double.isInfinite(scale)) {
            throw new IllegalArgumentException("scale must be positive and finite, got " + scale);
        }
        if (normalPolicy == null) {
            throw new IllegalArgumentException("normalPolicy must be given");
        }
    }

    /** @return scale 1 (file in m), STRICT */
    public static MeshOptions defaults() {
        return new MeshOptions(1, NormalPolicy.STRICT);
    }

    /** @return a copy with another scale */
    public MeshOptions withScale(double s) {
        return new MeshOptions(s, normalPolicy);
    }

    /** @return a copy with another normal policy */
    public MeshOptions withNormalPolicy(NormalPolicy p) {
        return new MeshOptions(scale, p);
    }
}
