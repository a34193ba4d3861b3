package org.exitance.geometry.viewfactor;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;

/**
 * Measures the error of the far-pair rules against the contour integral on random facet pairs
 * (triangles, squares, long parallelograms; random orientations, both facets fully in front of
 * each other), as a function of ρ = r / (R_p + R_q). Prints the table recorded in
 * docs/view-factors.md. Run: java -cp ... org.exitance.geometry.viewfactor.ProximityCalibration
 */
public final class ProximityCalibration {

    private ProximityCalibration() {
    }

    static Facet randomFacet(Random rnd, Vec3 c, Vec3 n) {
        Vec3 u = Vec3.anyPerpendicular(n);
        Vec3 v = n.normalized().cross(u);
        double phi = rnd.nextDouble() * 2 * Math.PI;
        Vec3 e1 = u.times(Math.cos(phi)).plus(v.times(Math.sin(phi)));
        Vec3 e2 = n.normalized().cross(e1);
        int kind = rnd.nextInt(3);
        if (kind == 0) {
            return Facet.of(c.plus(e1), c.plus(e1.times(-0.5)).plus(e2.times(0.866)), c.plus(e1.times(-0.5)).plus(e2.times(-0.866)));
        }
        double a = kind == 1 ? 1 : 1.9, b = kind == 1 ? 1 : 0.3;
        double sk = rnd.nextDouble() * 0.5;
        Vec3 p = e1.times(a).plus(e2.times(sk)), q = e2.times(b);
        return Facet.of(c.minus(p).minus(q), c.plus(p).minus(q), c.plus(p).plus(q), c.minus(p).plus(q));
    }

    static Vec3 randomUnit(Random rnd) {
        while (true) {
            Vec3 v = new Vec3(2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1, 2 * rnd.nextDouble() - 1);
            double l = v.length();
            if (l > 0.1 && l <= 1) {
                return v.times(1 / l);
            }
        }
    }

    /** @return max over samples of |error| / (A_p A_q / (π r²)) for orders 1..maxOrder, index 0 unused */
    static double[] maxError(double rho, int samples, int maxOrder, long seed) {
        Random rnd = new Random(seed);
        double[] worst = new double[maxOrder + 1];
        int done = 0;
        ContourIntegral ci = new ContourIntegral();
        while (done < samples) {
            Vec3 np = randomUnit(rnd);
            Facet p = randomFacet(rnd, Vec3.ZERO, np);
            Vec3 dir = randomUnit(rnd);
            if (dir.dot(np) < 0.05) {
                continue;
            }
            Vec3 nq = randomUnit(rnd);
            if (nq.dot(dir) > -0.05) {
                continue;
            }
            Facet q0 = randomFacet(rnd, Vec3.ZERO, nq);
            double r = rho * (p.circumradius() + q0.circumradius());
            Facet q;
            try {
                q = randomFacet(new Random(seed + done), dir.times(r), nq);
            } catch (GeometryException e) {
                continue;
            }
            r = p.centroid().distance(q.centroid());
            double rhoActual = r / (p.circumradius() + q.circumradius());
            if (Math.abs(rhoActual - rho) > 0.02 * rho || !inFront(p, q) || !inFront(q, p)) {
                continue;
            }
            Scene s = Scene.builder().add(new Surface("p", List.of(p))).add(new Surface("q", List.of(q))).build();
            FacetTable t = new FacetTable(s, maxOrder);
            Poly pp = new Poly(), qq = new Poly();
            pp.load(t, 0);
            qq.load(t, 1);
            double ref = ci.exchangeArea(pp, qq, 10);
            double scale = p.area() * q.area() / (Math.PI * r * r);
            AreaQuadrature aq = new AreaQuadrature(t);
            for (int m = 1; m <= maxOrder; m++) {
                worst[m] = Math.max(worst[m], Math.abs(aq.exchangeArea(pp, qq, m) - ref) / scale);
            }
            done++;
        }
        return worst;
    }

    static boolean inFront(Facet a, Facet b) {
        for (Vec3 v : b.vertices()) {
            if (v.minus(a.centroid()).dot(a.normal()) <= 0) {
                return false;
            }
        }
        return true;
    }

    /** @param args optional sample count */
    public static void main(String[] args) {
        int samples = args.length > 0 ? Integer.parseInt(args[0]) : 400;
        List<String> lines = new ArrayList<>();
        System.out.println("rho | max error / (A_p A_q/(pi r^2)) for area-quadrature order m = 1..6");
        for (double rho : new double[] {1.5, 2, 3, 4, 6, 8, 12, 16, 24, 32, 64}) {
            double[] w = maxError(rho, samples, 6, 12345);
            StringBuilder sb = new StringBuilder(String.format("%5.1f", rho));
            for (int m = 1; m <= 6; m++) {
                sb.append(String.format(" | %.1e", w[m]));
            }
            System.out.println(sb);
            lines.add(sb.toString());
        }
    }
}
