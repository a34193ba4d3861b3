package org.exitance.geometry.external;

import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;

/**
 * View factors from the facets of a scene to a planet, with the planet partly hidden by the
 * scene's own parts (a panel between a radiator and the planet, the inner faces of a cavity).
 *
 * <p>The planet is far compared with the scene, so every facet sees it as the same cone of
 * directions about the unit vector a toward its centre, half-angle γ with sin γ = R/h = 1/H. For
 * a uniform diffuse sphere, the view factor of an element is its projected solid angle over π
 * (Siegel &amp; Howell, <i>Thermal Radiation Heat Transfer</i>, 4th ed., §4.3, from memory):
 * F = (1/π) ∫_cone max(0, n·ω) V(ω) dω with V the visibility. The unobstructed value is the
 * closed form of {@link PlanetViewFactor#differentialElement}; the visible share is estimated by
 * rays, as in the view-factor module's visibility quadrature:
 *
 * <pre>  F_f ≈ F_f,closed · Σ_k Σ_ω w_k max(0, n·ω) V_kω / Σ_k Σ_ω w_k max(0, n·ω) </pre>
 *
 * with points k the stratified grid of the facet (order {@code pointOrder}, as in
 * {@link CollimatedIncidence}) and directions ω the cell centres of a q × 2q grid of the cone,
 * uniform in cos(polar angle) ∈ [cos γ, 1] (equal solid angle) and in azimuth — deterministic, the
 * same for every facet. Exact when every ray agrees (no shadow: the closed form; full shadow: 0).
 * When no sampled direction is above the facet's plane (grazing), the closed form is kept.
 *
 * <p>Rays start ε off the facet along its normal and skip the facet's own triangles (see
 * {@link CollimatedIncidence}). Results are identical for any thread count. Immutable; thread-safe.
 */
public final class ShadowedPlanetView {

    /** Default q: q × 2q directions over the planet's cone. */
    public static final int DEFAULT_CONE_ORDER = 8;
    /** Default sampling order of facet points (m × m per quadrilateral). */
    public static final int DEFAULT_POINT_ORDER = 2;

    private final ShadowRays rays;

    /**
     * Prepares the scene (builds the BVH over all facets).
     *
     * @param scene the geometry
     */
    public ShadowedPlanetView(Scene scene) {
        this.rays = new ShadowRays(scene);
    }

    /**
     * With the default orders on all processors.
     *
     * @see #compute(Vec3, double, double, int, int, int)
     */
    public IncidenceResult compute(Vec3 towardPlanet, double altitudeM, double planetRadiusM) {
        return compute(towardPlanet, altitudeM, planetRadiusM, DEFAULT_POINT_ORDER, DEFAULT_CONE_ORDER, 0);
    }

    /**
     * @param towardPlanet direction from the scene to the planet's centre (any length &gt; 0)
     * @param altitudeM height of the scene above the planet's surface (m), ≥ 0
     * @param planetRadiusM planet radius (m)
     * @param pointOrder facet sampling order m in [1, {@value CollimatedIncidence#MAX_ORDER}]
     * @param coneOrder q in [1, 256]: q × 2q directions
     * @param threads worker threads (0 = all processors); does not change the result
     * @return shadowed factors per facet and per surface, and the number of rays cast
     */
    public IncidenceResult compute(Vec3 towardPlanet, double altitudeM, double planetRadiusM, int pointOrder,
            int coneOrder, int threads) {
        if (pointOrder < 1 || pointOrder > CollimatedIncidence.MAX_ORDER) {
            throw new IllegalArgumentException("point order must be in [1, " + CollimatedIncidence.MAX_ORDER + "], got "
                    + pointOrder);
        }
        if (coneOrder < 1 || coneOrder > 256) {
            throw new IllegalArgumentException("cone order must be in [1, 256], got " + coneOrder);
        }
        double hh = PlanetViewFactor.distanceRatio(altitudeM, planetRadiusM);
        double[] dirs = coneDirections(towardPlanet.normalized(), hh, coneOrder);
        int nd = dirs.length / 3;
        Vec3 a = towardPlanet.normalized();
        PackedFacets table = rays.table;
        double[] facet = new double[table.count];
        long cast = FacetParallel.forEach(table.count, threads, () -> new FacetParallel.Worker() {
            private final ShadowRays.Probe probe = rays.new Probe();

            @Override
            public long run(int f) {
                double nx = table.normal[3 * f], ny = table.normal[3 * f + 1], nz = table.normal[3 * f + 2];
                double closed = PlanetViewFactor.differentialElement(hh, nx * a.x() + ny * a.y() + nz * a.z());
                facet[f] = closed;
                if (closed == 0) {
                    return 0;
                }
                int np = probe.sample(f, pointOrder);
                double all = 0, seen = 0;
                long n = 0;
                for (int j = 0; j < nd; j++) {
                    double dx = dirs[3 * j], dy = dirs[3 * j + 1], dz = dirs[3 * j + 2];
                    double cos = nx * dx + ny * dy + nz * dz;
                    if (!(cos > 0)) {
                        continue;
                    }
                    for (int k = 0; k < np; k++) {
                        double w = probe.pts[4 * k + 3] * cos;
                        all += w;
                        n++;
                        if (probe.escapes(f, k, dx, dy, dz)) {
                            seen += w;
                        }
                    }
                }
                if (all > 0) {
                    facet[f] = closed * (seen / all);
                }
                return n;
            }
        });
        return new IncidenceResult(table.surfaceNames, facet, table.surfaceAverages(facet), cast);
    }

    /**
     * @return packed unit directions (3 per direction): q rings equal in solid angle between the
     *     axis and the cone's edge (sin γ = 1/H), 2q azimuths each, at the cell centres
     */
    static double[] coneDirections(Vec3 axis, double hh, int q) {
        double cosGamma = Math.sqrt((hh - 1) * (hh + 1)) / hh;
        Vec3 e1 = Vec3.anyPerpendicular(axis), e2 = axis.cross(e1);
        double[] out = new double[3 * q * 2 * q];
        int k = 0;
        for (int i = 0; i < q; i++) {
            double u = cosGamma + (1 - cosGamma) * (i + 0.5) / q;
            double s = Math.sqrt(Math.max(0, 1 - u * u));
            for (int j = 0; j < 2 * q; j++) {
                double phi = Math.PI * (j + 0.5) / q;
                double c = s * Math.cos(phi), t = s * Math.sin(phi);
                out[k++] = u * axis.x() + c * e1.x() + t * e2.x();
                out[k++] = u * axis.y() + c * e1.y() + t * e2.y();
                out[k++] = u * axis.z() + c * e1.z() + t * e2.z();
            }
        }
        return out;
    }
}
