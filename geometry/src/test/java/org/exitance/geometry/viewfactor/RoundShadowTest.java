package org.exitance.geometry.viewfactor;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The exact shadow of a round body seen from a point ({@link RoundOccluder}, {@link ConeContour}):
 * the contour form over its arcs against quadrature, and the factor of the hidden part against
 * closed forms.
 */
class RoundShadowTest {

    /**
     * The closed form of an arc's contour term (Gradshteyn &amp; Ryzhik 2.553.3, 2.554.3) against
     * adaptive Gauss–Legendre quadrature of n·(R × R′)/|R|² by Commons Math, for random circles and
     * points, near ones included.
     */
    @Test
    void arcTermsMatchQuadrature() {
        Random rnd = new Random(7);
        for (int trial = 0; trial < 300; trial++) {
            double[] c = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
            double[] a = unit(new double[] {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()});
            double r = 0.1 + rnd.nextDouble();
            double[] u = new double[3], w = new double[3];
            across(a, u, w);
            for (int k = 0; k < 3; k++) {
                u[k] *= r;
                w[k] *= r;
            }
            double scale = trial % 3 == 0 ? 0.05 : 2; // every third point close to the circle
            double phi = rnd.nextDouble() * 2 * Math.PI;
            double[] x = new double[3];
            for (int k = 0; k < 3; k++) {
                x[k] = c[k] + Math.cos(phi) * u[k] + Math.sin(phi) * w[k] + scale * rnd.nextGaussian();
            }
            if (trial % 10 == 1) {
                // on the circle's axis: the closed form's own cancellation is avoided by quadrature
                double along = 0.3 + rnd.nextDouble();
                for (int k = 0; k < 3; k++) {
                    x[k] = c[k] + along * a[k];
                }
            }
            double[] n = unit(new double[] {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()});
            double f0 = rnd.nextDouble() * 8 - 4, f1 = f0 + (rnd.nextDouble() * 2 - 1) * Math.PI;
            ConeContour cc = new ConeContour();
            cc.clear();
            cc.arc(c, u, w, f0, f1, 1);
            double term = cc.factor(x[0], x[1], x[2], n[0], n[1], n[2]) * 2 * Math.PI;
            IterativeLegendreGaussIntegrator q = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-13);
            double ref = Math.abs(q.integrate(1_000_000, f -> {
                double cs = Math.cos(f), sn = Math.sin(f);
                double[] rr = new double[3], dr = new double[3];
                for (int k = 0; k < 3; k++) {
                    rr[k] = c[k] + cs * u[k] + sn * w[k] - x[k];
                    dr[k] = -sn * u[k] + cs * w[k];
                }
                double[] cr = cross(rr, dr);
                return dot(n, cr) / dot(rr, rr);
            }, Math.min(f0, f1), Math.max(f0, f1)));
            assertThat(term).as("trial %d", trial).isCloseTo(ref, within(1e-10 * Math.max(1, ref)));
        }
    }

    /**
     * From a point on the axis below a closed cylinder, the cone it hides is the one over its base
     * rim; on a parallel plane above, the shadow is a disc of the rim's radius scaled by the
     * projection. Factor from an element to a coaxial parallel disc of radius R at distance H:
     * R²/(H² + R²) (Howell's catalogue, case B-13, from memory; Siegel &amp; Howell 4th ed.,
     * appendix C). The receiver is a square larger than the shadow, so nothing is cut.
     */
    @Test
    void onAxisShadowIsADisc() {
        RoundOccluder bar = RoundOccluder.cylinder(new double[] {0, 0, 1}, new double[] {0, 0, 1}, 0.3, 0.5);
        ConeContour cc = new ConeContour();
        assertThat(bar.silhouette(0, 0, 0, cc, 1e-12)).isTrue();
        double big = 2.0, shadow = 0.3 * big / 1.0; // the rim at height 1 projected to height 2
        double hidden = shadow * shadow / (big * big + shadow * shadow);
        assertThat(cc.factor(0, 0, 0, 0, 0, 1)).isCloseTo(hidden, within(1e-14));
        Poly square = square(-5, 5, 2);
        VisiblePartHarness h = new VisiblePartHarness();
        assertThat(h.hidden(bar, new double[] {0, 0, 0}, new double[] {0, 0, 1}, square)).isCloseTo(hidden, within(1e-14));
        // a sphere of radius 0.3 centred at height 1: the tangent cone has half-angle asin(0.3)
        RoundOccluder ball = RoundOccluder.sphere(new double[] {0, 0, 1}, 0.3);
        double s2 = 0.3 * 0.3; // sin² of the half-angle: the factor of a cone about the normal
        assertThat(h.hidden(ball, new double[] {0, 0, 0}, new double[] {0, 0, 1}, square)).isCloseTo(s2, within(1e-14));
    }

    /**
     * A cut shadow: the same on-axis cylinder over a receiver that is only the quarter x, y ≥ 0
     * of the plane above: by symmetry the hidden part is a quarter of the disc.
     */
    @Test
    void aQuarterReceiverHidesAQuarterOfTheDisc() {
        RoundOccluder bar = RoundOccluder.cylinder(new double[] {0, 0, 1}, new double[] {0, 0, 1}, 0.3, 0.5);
        double shadow = 0.6, hidden = shadow * shadow / (4 + shadow * shadow);
        Poly quarter = new Poly();
        quarter.set(new double[] {0, 0, 2, 0, 5, 2, 5, 5, 2, 5, 0, 2}, 4, 0, 0, -1);
        VisiblePartHarness h = new VisiblePartHarness();
        assertThat(h.hidden(bar, new double[] {0, 0, 0}, new double[] {0, 0, 1}, quarter)).isCloseTo(hidden / 4, within(1e-14));
    }

    /**
     * The production shadow (silhouette arcs and generators cut to the receiver's pyramid, the
     * contour form in closed form) against the independent reference of
     * {@link RoundShadowReference}: JTS hull of many outline points projected onto the receiver,
     * cut by JTS overlay, Richardson-extrapolated (estimated error below 1e-10), in the invented
     * box configurations of {@link RoundShadowConfigurations}.
     */
    @Test
    void theExactShadowMatchesTheIndependentReference() {
        double[][] rows = RoundShadowConfigurations.configurations();
        VisiblePartHarness h = new VisiblePartHarness();
        for (int k = 0; k < rows.length; k++) {
            double[] c = rows[k];
            double[] x = {c[0], c[1], c[2]}, n = {c[3], c[4], c[5]};
            double[] v = java.util.Arrays.copyOfRange(c, 6, 18);
            Poly q = new Poly();
            q.set(v, 4, 0, 0, 1);
            double[] cq = {q.cx - x[0], q.cy - x[1], q.cz - x[2]};
            double[] e1 = {v[3] - v[0], v[4] - v[1], v[5] - v[2]}, e2 = {v[9] - v[0], v[10] - v[1], v[11] - v[2]};
            double[] qn = unit(cross(e1, e2));
            if (dot(qn, cq) > 0) {
                qn = new double[] {-qn[0], -qn[1], -qn[2]}; // facing x
            }
            q.set(v, 4, qn[0], qn[1], qn[2]);
            int b = RoundShadowConfigurations.BODY;
            RoundOccluder body = c[RoundShadowConfigurations.KIND] == RoundShadowConfigurations.CYLINDER
                    ? RoundOccluder.cylinder(new double[] {c[b], c[b + 1], c[b + 2]}, new double[] {c[b + 3], c[b + 4], c[b + 5]}, c[b + 6], c[b + 7])
                    : RoundOccluder.sphere(new double[] {c[b], c[b + 1], c[b + 2]}, c[b + 3]);
            double all = PointFactor.toPolygon(x[0], x[1], x[2], n[0], n[1], n[2], orientedToward(q, x));
            double visible = all - h.hidden(body, x, n, q);
            assertThat(visible).as(RoundShadowConfigurations.names()[k]).isCloseTo(RoundShadowConfigurations.reference(c), within(1e-9));
        }
    }

    /** q with its vertices counter-clockwise about the normal that faces x, as {@link PointFactor} wants. */
    private static Poly orientedToward(Poly q, double[] x) {
        double[] a = {q.xyz[3] - q.xyz[0], q.xyz[4] - q.xyz[1], q.xyz[5] - q.xyz[2]};
        double[] b = {q.xyz[6] - q.xyz[0], q.xyz[7] - q.xyz[1], q.xyz[8] - q.xyz[2]};
        double[] m = cross(a, b);
        double[] toX = {x[0] - q.xyz[0], x[1] - q.xyz[1], x[2] - q.xyz[2]};
        Poly o = new Poly();
        if (dot(m, toX) > 0) {
            o.copyFrom(q);
            return o;
        }
        double[] rev = new double[3 * q.n];
        for (int k = 0; k < q.n; k++) {
            System.arraycopy(q.xyz, 3 * (q.n - 1 - k), rev, 3 * k, 3);
        }
        o.set(rev, q.n, q.nx, q.ny, q.nz);
        return o;
    }

    /** A square at height z facing down, [lo, hi]². */
    static Poly square(double lo, double hi, double z) {
        Poly p = new Poly();
        p.set(new double[] {lo, lo, z, lo, hi, z, hi, hi, z, hi, lo, z}, 4, 0, 0, -1);
        return p;
    }

    /** The factor of the part of a receiver polygon a body hides from a point, as the shadow code forms it. */
    static final class VisiblePartHarness {
        private final ConeContour outline = new ConeContour(), cut = new ConeContour();
        private final double[] planes = new double[4 * Poly.MAX_VERTICES];

        double hidden(RoundOccluder body, double[] x, double[] n, Poly q) {
            assertThat(body.silhouette(x[0], x[1], x[2], outline, 1e-12)).isTrue();
            cut.copyFrom(outline);
            int m = pyramid(x, q);
            for (int e = 0; e < m; e++) {
                cut.cut(planes[4 * e], planes[4 * e + 1], planes[4 * e + 2], planes[4 * e + 3], 16 + e, 1e-12);
            }
            return cut.factor(x[0], x[1], x[2], n[0], n[1], n[2]);
        }

        private int pyramid(double[] x, Poly q) {
            double ix = 0, iy = 0, iz = 0;
            for (int k = 0; k < q.n; k++) {
                ix += q.xyz[3 * k] / q.n;
                iy += q.xyz[3 * k + 1] / q.n;
                iz += q.xyz[3 * k + 2] / q.n;
            }
            for (int k = 0; k < q.n; k++) {
                int l = (k + 1) % q.n;
                double[] a = {q.xyz[3 * k] - x[0], q.xyz[3 * k + 1] - x[1], q.xyz[3 * k + 2] - x[2]};
                double[] b = {q.xyz[3 * l] - x[0], q.xyz[3 * l + 1] - x[1], q.xyz[3 * l + 2] - x[2]};
                double[] m = unit(cross(a, b));
                double d = dot(m, x);
                if (m[0] * ix + m[1] * iy + m[2] * iz - d < 0) {
                    m = new double[] {-m[0], -m[1], -m[2]};
                    d = -d;
                }
                planes[4 * k] = m[0];
                planes[4 * k + 1] = m[1];
                planes[4 * k + 2] = m[2];
                planes[4 * k + 3] = d;
            }
            return q.n;
        }
    }

    static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    static double[] unit(double[] v) {
        double n = Math.sqrt(dot(v, v));
        return new double[] {v[0] / n, v[1] / n, v[2] / n};
    }

    static void across(double[] a, double[] u, double[] w) {
        double[] t = Math.abs(a[0]) < 0.6 ? new double[] {1, 0, 0} : new double[] {0, 1, 0};
        double[] v = unit(cross(a, t));
        double[] v2 = cross(a, v);
        System.arraycopy(v, 0, u, 0, 3);
        System.arraycopy(v2, 0, w, 0, 3);
    }
}
