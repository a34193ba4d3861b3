package org.exitance.thermal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Random;
import org.ejml.data.DMatrixRMaj;
import org.exitance.bands.BandLoop;
import org.exitance.bands.BandProperties;
import org.exitance.bands.ExternalAbsorption;
import org.exitance.model.Band;
import org.exitance.model.RadiationCase;
import org.exitance.network.DirectRadiositySolver;
import org.exitance.network.RadiositySolver;
import org.exitance.support.RandomEnclosures;
import org.exitance.support.Cases;
import org.exitance.model.BandSet;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The Jacobian of the node heat balances, from the blocked band solves, and the Newton–Krylov
 * product J·v both agree with central finite differences of the residual (common practice: the
 * band networks are linear in E, so the differences err only by the O(h²) curvature of E(T),
 * and with links and convection of their linear terms not at all).
 */
class JacobianTest {

    @ParameterizedTest
    @ValueSource(booleans = {false, true})
    void jacobianAndProductsMatchFiniteDifferences(boolean conjugateGradients) {
        RadiationCase c = SolverPathsTest.withLinksAndConvection(Cases.of(RandomEnclosures.random(new Random(5), 30,
                true, 0.5), new BandSet(new double[] {3.0, 9.0}, "test")));
        Problem p = new Problem(c.enclosure(), c.sources());
        List<Band> bands = c.bands().bands();
        double[] t = new double[p.area.length];
        Random r = new Random(9);
        for (int i = 0; i < t.length; i++) {
            t[i] = c.enclosure().surface(i).boundary().temperatureUnknown() ? 400 + 600 * r.nextDouble()
                    : ((org.exitance.model.BoundaryCondition.FixedTemperature) c.enclosure().surface(i).boundary())
                            .temperatureK();
        }
        RadiositySolver band = conjugateGradients ? SolverChoice.ITERATIVE.radiositySolver(t.length)
                : new DirectRadiositySolver();
        BandLoop loop = BandLoop.prepare(p.radiative, bands, BandProperties.emissivities(c.enclosure().surfaces(), bands,
                t), t, ExternalAbsorption.SOURCE_SPECTRUM, band);
        DMatrixRMaj jac = Jacobian.compact(p, Jacobian.nodeHeatSensitivities(p, loop), loop.emissivePowerDerivatives(t),
                p.pathDerivativesWPerK(t));
        int m = p.unknown.length;
        double h = 1e-2; // K
        KrylovStep krylov = new KrylovStep(p, loop);
        double[] v = new double[m];
        for (int b = 0; b < m; b++) {
            v[b] = r.nextDouble() - 0.5;
        }
        // the products at the tightest forcing term's band-solve tolerance
        double[] jv = krylov.product(v, loop.emissivePowerDerivatives(t),
                KrylovStep.innerTolerance(KrylovStep.RELATIVE) / SolverChoice.CG_TOLERANCE);
        double scale = 0;
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < m; b++) {
                scale = Math.max(scale, Math.abs(jac.get(a, b)));
            }
        }
        for (int b = 0; b < m; b++) {
            double[] up = t.clone();
            double[] dn = t.clone();
            for (int i : p.faces[b]) {
                up[i] += h;
                dn[i] -= h;
            }
            double[] ru = NodeBalance.of(p, loop.solve(up), up, 1e-12).residualW();
            double[] rd = NodeBalance.of(p, loop.solve(dn), dn, 1e-12).residualW();
            for (int a = 0; a < m; a++) {
                assertThat(jac.get(a, b)).as("∂R_%d/∂T_%d", a, b).isCloseTo((ru[a] - rd[a]) / (2 * h),
                        within(1e-7 * scale));
            }
        }
        for (int a = 0; a < m; a++) {
            double s = 0;
            for (int b = 0; b < m; b++) {
                s += jac.get(a, b) * v[b];
            }
            assertThat(jv[a]).isCloseTo(s, within(1e-9 * scale * m));
        }
    }
}
