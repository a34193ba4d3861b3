package org.exitance.geometry.external;

import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.bvh.TriangleBvh;

/**
 * Incidence factors of a collimated source (the sun, a distant lamp) on the facets and surfaces
 * of a scene, with shadows.
 *
 * <p>For a unit direction d from the scene toward the source, facet f receives the irradiance
 * S · φ_f with (Lambert's cosine law; Siegel &amp; Howell, <i>Thermal Radiation Heat Transfer</i>,
 * 4th ed., ch. 1–2; Modest, <i>Radiative Heat Transfer</i>, 3rd ed., ch. 1; common practice for
 * collimated irradiation)
 *
 * <pre>  φ_f = max(0, n_f · d) · L_f,   L_f = Σ_k w_k V_k / A_f </pre>
 *
 * where L_f is the lit fraction: the points k of a deterministic stratified grid on the facet
 * (m × m cell centres of a quadrilateral's bilinear parameterisation, or
 * the m² sub-triangle centroids of each fan triangle; order m configurable, default
 * {@value #DEFAULT_ORDER}), each casting one ray toward the source; V_k = 1 when the ray
 * (o_k + t d, t ∈ [0, ∞)) meets no facet of the scene. Every facet is an occluder whichever way it
 * faces (the watertight ray/triangle test of Woop, Benthin &amp; Wald, JCGT 2(1), 2013, used by
 * {@link TriangleBvh}, is two-sided), so both faces of a thin two-sided plate cast shadows, and
 * concave shapes shadow themselves. Facets with n · d ≤ 0 get 0 without rays.
 *
 * <p>Origin offset: each ray starts at the sample point moved along the facet normal by
 * ε = 1e-9 · (scene bounding-box diagonal) + 16 ulp(largest |coordinate|) ({@link #originOffsetM()}),
 * and the facet's own triangles are skipped. As the ray leaves the facet's plane (n · d &gt; 0) it
 * cannot re-hit that plane: coplanar neighbours and the twin face of a two-sided plate are not hit
 * by mistake; an occluder closer than ε to the facet is missed.
 *
 * <p>Surface factor: Σ_f A_f φ_f / A_S. Per-facet results depend only on the facet and the
 * scene, computed in 64 fixed chunks of facets: identical bit for bit for any thread count. Error: the
 * midpoint rule on a stratification, so only cells cut by a shadow edge can be misclassified;
 * the lit-fraction error is at most the parameter area of those cells (≤ (ℓ_u + ℓ_v) m + 3 cells
 * of 1/m² for a straight edge spanning ℓ_u × ℓ_v of the unit parameter square), exact when the
 * edges run along cell sides (measured values in docs/view-factors.md).
 *
 * <p>Immutable after construction (the BVH over the scene is built once, so many source
 * directions — orbit positions — can be evaluated cheaply); thread-safe.
 */
public final class CollimatedIncidence {

    /** Default sampling order m (m × m points per quadrilateral, m² per fan triangle). */
    public static final int DEFAULT_ORDER = 4;
    /** Largest accepted sampling order. */
    public static final int MAX_ORDER = 256;

    private final ShadowRays rays;

    /**
     * Prepares the scene (builds the BVH over all facets).
     *
     * @param scene the geometry
     */
    public CollimatedIncidence(Scene scene) {
        this.rays = new ShadowRays(scene);
    }

    /** @return the ray-origin offset ε along the facet normal (m) */
    public double originOffsetM() {
        return rays.offset;
    }

    /**
     * Factors with the default order on all processors.
     *
     * @param towardSource direction from the scene toward the source (any length &gt; 0)
     * @return factors per facet and per surface
     */
    public IncidenceResult compute(Vec3 towardSource) {
        return compute(towardSource, DEFAULT_ORDER, 0);
    }

    /**
     * @param towardSource direction from the scene toward the source (any length &gt; 0; normalised here)
     * @param order sampling order m in [1, {@value #MAX_ORDER}]
     * @param threads worker threads (0 = all processors); does not change the result
     * @return factors per facet and per surface, and the number of rays cast
     */
    public IncidenceResult compute(Vec3 towardSource, int order, int threads) {
        if (order < 1 || order > MAX_ORDER) {
            throw new IllegalArgumentException("sampling order must be in [1, " + MAX_ORDER + "], got " + order);
        }
        Vec3 d = towardSource.normalized();
        double dx = d.x(), dy = d.y(), dz = d.z();
        PackedFacets table = rays.table;
        double[] facet = new double[table.count];
        long cast = FacetParallel.forEach(table.count, threads, () -> new FacetParallel.Worker() {
            private final ShadowRays.Probe probe = rays.new Probe();

            @Override
            public long run(int f) {
                double cos = table.normal[3 * f] * dx + table.normal[3 * f + 1] * dy + table.normal[3 * f + 2] * dz;
                if (!(cos > 0)) {
                    facet[f] = 0;
                    return 0;
                }
                int np = probe.sample(f, order);
                double lit = 0, all = 0;
                for (int k = 0; k < np; k++) {
                    double w = probe.pts[4 * k + 3];
                    all += w;
                    if (probe.escapes(f, k, dx, dy, dz)) {
                        lit += w;
                    }
                }
                facet[f] = cos * (lit / all);
                return np;
            }
        });
        return new IncidenceResult(table.surfaceNames, facet, table.surfaceAverages(facet), cast);
    }
}
