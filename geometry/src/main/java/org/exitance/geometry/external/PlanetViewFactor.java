package org.exitance.geometry.external;

import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;

/**
 * Diffuse view factor from a flat facet to a planet (a sphere of radius R whose centre is at
 * distance h = R + altitude from the facet), for planetary infrared emission and albedo.
 *
 * <p>Closed forms for a differential planar element to a sphere, with H = h / R ≥ 1 and β the
 * angle between the element normal and the direction to the sphere's centre (Howell, <i>A Catalog
 * of Radiation Heat Transfer Configuration Factors</i>, differential planar element to a sphere,
 * element plane tilted relative to the line to the centre; Siegel &amp; Howell, <i>Thermal
 * Radiation Heat Transfer</i>, 4th ed., Appendix C; both cited from memory, case numbers not
 * re-checked; the formulas are verified in the tests against a direct quadrature of the
 * definition over the sphere's visible cap):
 * <ul>
 *   <li>sphere wholly in front of the element's plane, H cos β ≥ 1:
 *       <pre>  F = cos β / H² </pre></li>
 *   <li>sphere cut by the element's plane, |H cos β| &lt; 1, with X = √(H² − 1):
 *       <pre>  F = 1/2 − (1/π) asin( X / (H sin β) )
 *    + 1/(π H²) [ cos β · acos( −X cot β ) − X √(1 − H² cos² β) ] </pre></li>
 *   <li>sphere wholly behind the plane, H cos β ≤ −1: F = 0.</li>
 * </ul>
 * The pieces join continuously (at H cos β = 1 the second form gives 1/H³ = cos β / H²; at
 * H cos β = −1 it gives 0). At H = 1 (element on the surface) the second form reduces to
 * (1 + cos β)/2, the factor of a plane tilted by β to an infinite ground plane.
 *
 * <p>The planet is far compared with the scene, so all facets share H and the planet direction;
 * only β varies, with the facet normal. <b>No shadowing</b>: the factor of each facet ignores other
 * parts of the scene that may hide part of the planet (a concave body's inner faces are
 * over-estimated); {@link ShadowedPlanetView} adds shadowing by ray sampling of the planet.
 */
public final class PlanetViewFactor {

    /** Mean radius of the Earth (m), 6,371 km (common practice). */
    public static final double EARTH_RADIUS_M = 6.371e6;

    private PlanetViewFactor() {
    }

    /**
     * View factor from a differential planar element to a sphere.
     *
     * @param distanceRatio H = (distance from the element to the sphere's centre) / radius, ≥ 1
     * @param cosBeta cosine of the angle between the element normal and the direction to the centre
     * @return F in [0, 1]
     * @throws IllegalArgumentException if H &lt; 1 or not finite, or cos β outside [−1, 1] (beyond 1e-12)
     */
    public static double differentialElement(double distanceRatio, double cosBeta) {
        double h = distanceRatio;
        if (!(h >= 1) || Double.isInfinite(h)) {
            throw new IllegalArgumentException("distance ratio H = h/R must be finite and ≥ 1, got " + h);
        }
        if (!(Math.abs(cosBeta) <= 1 + 1e-12)) {
            throw new IllegalArgumentException("cos β must be in [−1, 1], got " + cosBeta);
        }
        double c = Math.max(-1, Math.min(1, cosBeta));
        double hc = h * c;
        if (hc >= 1) {
            return c / (h * h);
        }
        if (hc <= -1) {
            return 0;
        }
        double s = Math.sqrt((1 - c) * (1 + c)); // sin β > 0 here
        double x = Math.sqrt((h - 1) * (h + 1));
        double root = Math.sqrt(Math.max(0, (1 - hc) * (1 + hc)));
        double asinArg = Math.min(1, x / (h * s));
        double acosArg = Math.max(-1, Math.min(1, -x * c / s));
        double f = 0.5 - Math.asin(asinArg) / Math.PI
                + (c * Math.acos(acosArg) - x * root) / (Math.PI * h * h);
        return Math.max(0, Math.min(1, f));
    }

    /**
     * @param normal the element's unit normal (radiating side)
     * @param towardPlanet direction from the element to the planet's centre (any length &gt; 0)
     * @param altitudeM height above the planet's surface (m), ≥ 0
     * @param planetRadiusM planet radius (m), &gt; 0
     * @return the view factor from the element to the planet
     */
    public static double ofElement(Vec3 normal, Vec3 towardPlanet, double altitudeM, double planetRadiusM) {
        return differentialElement(distanceRatio(altitudeM, planetRadiusM),
                normal.normalized().dot(towardPlanet.normalized()));
    }

    /**
     * Per-facet factors (normal of each facet, same H for all) and area-weighted surface factors.
     * No shadowing by the scene (see class notes); {@link IncidenceResult#raysCast()} is 0.
     *
     * @param scene the geometry
     * @param towardPlanet direction from the scene to the planet's centre (any length &gt; 0)
     * @param altitudeM height of the scene above the planet's surface (m), ≥ 0
     * @param planetRadiusM planet radius (m), e.g. {@link #EARTH_RADIUS_M}
     * @return factors per facet and per surface
     */
    public static IncidenceResult compute(Scene scene, Vec3 towardPlanet, double altitudeM, double planetRadiusM) {
        double h = distanceRatio(altitudeM, planetRadiusM);
        Vec3 d = towardPlanet.normalized();
        PackedFacets t = new PackedFacets(scene);
        double[] facet = new double[t.count];
        for (int f = 0; f < t.count; f++) {
            double c = t.normal[3 * f] * d.x() + t.normal[3 * f + 1] * d.y() + t.normal[3 * f + 2] * d.z();
            facet[f] = differentialElement(h, c);
        }
        return new IncidenceResult(t.surfaceNames, facet, t.surfaceAverages(facet), 0);
    }

    /**
     * @param altitudeM height above the surface (m), ≥ 0
     * @param planetRadiusM radius (m), &gt; 0
     * @return H = (R + altitude) / R
     */
    public static double distanceRatio(double altitudeM, double planetRadiusM) {
        if (!(planetRadiusM > 0) || Double.isInfinite(planetRadiusM)) {
            throw new IllegalArgumentException("planet radius must be positive and finite, got " + planetRadiusM);
        }
        if (!(altitudeM >= 0) || Double.isInfinite(altitudeM)) {
            throw new IllegalArgumentException("altitude must be ≥ 0 and finite, got " + altitudeM);
        }
        return (planetRadiusM + altitudeM) / planetRadiusM;
    }
}
