package org.exitance.geometry.viewfactor;

import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Vec3;

/**
 * View factors between two unobstructed planar polygons, written for the tests and sharing no code
 * with the calculator: F_ij = (1/A_i) ∫_{A_i} F_{dA→j} dA, the inner factor from a differential
 * element to a polygon in closed form, F_{dA→j} = (1/2π) Σ_k γ_k n·(a_k × a_{k+1})/|a_k × a_{k+1}|
 * with a_k the vectors from the element to the polygon's vertices and γ_k the angle between a_k
 * and a_{k+1} (Siegel &amp; Howell, Thermal Radiation Heat Transfer, 5th ed., §4.3, contour form for
 * a differential element, from memory), the outer integral by Gauss–Legendre rules of Commons Math
 * on each triangle of a fan, mapped from the square by the collapsed (Duffy) map
 * x = A + u (B − A) + u v (C − B), dA = 2 |ABC| u du dv (common practice).
 *
 * <p>F_ij computed this way integrates over facet i; F_ji integrates over facet j with other points:
 * two independent evaluations, so A_i F_ij = A_j F_ji is a check, not a construction.
 */
final class IndependentFactor {
    private IndependentFactor() {
    }

    /** F from an element at p with unit normal n to the polygon (the polygon wholly in front of it). */
    static double elementToPolygon(Vec3 p, Vec3 n, List<Vec3> polygon) {
        double sum = 0;
        int m = polygon.size();
        for (int k = 0; k < m; k++) {
            Vec3 a = polygon.get(k).minus(p);
            Vec3 b = polygon.get((k + 1) % m).minus(p);
            Vec3 c = a.cross(b);
            double len = c.length();
            if (len == 0) {
                continue;
            }
            double gamma = Math.atan2(len, a.dot(b));
            sum += gamma * n.dot(c) / len;
        }
        return Math.abs(sum) / (2 * Math.PI);
    }

    /** F_ij of two facets with an order-{@code order} rule in each direction of every triangle. */
    static double factor(Facet from, Facet to, int order) {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(order, 0, 1);
        List<Vec3> v = from.vertices();
        List<Vec3> target = to.vertices();
        Vec3 n = from.normal();
        double integral = 0;
        for (int t = 1; t + 1 < v.size(); t++) {
            Vec3 a = v.get(0);
            Vec3 ab = v.get(t).minus(a);
            Vec3 bc = v.get(t + 1).minus(v.get(t));
            double twiceArea = ab.cross(v.get(t + 1).minus(a)).length();
            for (int i = 0; i < rule.getNumberOfPoints(); i++) {
                double u = rule.getPoint(i);
                for (int j = 0; j < rule.getNumberOfPoints(); j++) {
                    double w = rule.getPoint(j);
                    Vec3 x = a.plus(ab.times(u)).plus(bc.times(u * w));
                    integral += rule.getWeight(i) * rule.getWeight(j) * twiceArea * u * elementToPolygon(x, n, target);
                }
            }
        }
        return integral / from.area();
    }

    /** True when the facets share a vertex (then the integrand is not smooth and the rule above is slow). */
    static boolean touch(Facet a, Facet b) {
        for (Vec3 p : a.vertices()) {
            for (Vec3 q : b.vertices()) {
                if (p.minus(q).length() < 1e-9) {
                    return true;
                }
            }
        }
        return false;
    }
}
