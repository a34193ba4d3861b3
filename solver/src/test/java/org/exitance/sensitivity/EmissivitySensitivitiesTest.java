package org.exitance.sensitivity;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.spectral.TabulatedEmissivity;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.thermal.TemperatureSolver;
import org.junit.jupiter.api.Test;

/**
 * Tangent-linear emissivity sensitivities against central finite differences of the full solve
 * (the independent check the method is usually verified by; common practice). The materials are
 * constant inside each band, where the method is exact.
 */
class EmissivitySensitivitiesTest {
    private static final double[] EDGES = {2, 5};

    private static TabulatedEmissivity steps(double[] values) {
        double[] nodes = new double[2 * EDGES.length];
        double[] v = new double[2 * EDGES.length];
        for (int i = 0; i < EDGES.length; i++) {
            nodes[2 * i] = EDGES[i];
            v[2 * i] = values[i];
            nodes[2 * i + 1] = Math.nextUp(EDGES[i]);
            v[2 * i + 1] = values[i + 1];
        }
        return new TabulatedEmissivity(nodes, v);
    }

    private static RadiationCase build(double[][] eps) {
        double[] area = {1.0, 0.6, 0.8, 1.2};
        double[][] s = {{0, 0.2, 0.25, 0.3}, {0.2, 0.05, 0.1, 0.15}, {0.25, 0.1, 0, 0.2}, {0.3, 0.15, 0.2, 0.2}};
        double[][] f = new double[4][4];
        for (int i = 0; i < 4; i++) {
            for (int j = 0; j < 4; j++) {
                f[i][j] = s[i][j] / area[i]; // reciprocal by construction; the rest goes to the environment
            }
        }
        BoundaryCondition[] bc = {new BoundaryCondition.FixedTemperature(1100), new BoundaryCondition.Adiabatic(),
            new BoundaryCondition.HeatInput(300), new BoundaryCondition.FixedTemperature(350)};
        List<EnclosureSurface> list = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            list.add(new EnclosureSurface("s" + i, new Material("m" + i, steps(eps[i]), ""), area[i], bc[i], Double.NaN));
        }
        Enclosure e = new Enclosure(list, f, new Environment("room", 290));
        ExternalSource lamp = new ExternalSource("lamp", new BlackbodySource(3000), 2000, Map.of("s1", 0.7, "s2", 0.3));
        return new RadiationCase("t", "", List.of(), e, null, SolverSettings.DEFAULT, List.of(lamp));
    }

    @Test
    void tangentSensitivitiesMatchCentralFiniteDifferences() {
        Random r = new Random(7);
        double[][] eps = new double[4][3];
        for (double[] row : eps) {
            for (int k = 0; k < 3; k++) {
                row[k] = 0.15 + 0.7 * r.nextDouble();
            }
        }
        BandSet bands = new BandSet(EDGES, "t");
        EmissivitySensitivities sens = TangentLinear.compute(build(eps), bands);
        double h = 1e-5;
        // below these, a difference quotient is Newton's stopping noise over 2h, not a derivative
        double floorQ = 1e-7 * sens.solved().energyScaleW();
        double floorT = 1e-2;
        for (int j = 0; j < 4; j++) {
            for (int k = 0; k < 3; k++) {
                double[][] up = deepCopy(eps);
                double[][] dn = deepCopy(eps);
                up[j][k] += h;
                dn[j][k] -= h;
                var a = new TemperatureSolver(build(up)).solve(bands);
                var b = new TemperatureSolver(build(dn)).solve(bands);
                for (int i = 0; i < 4; i++) {
                    double fdQ = (a.surfaces().get(i).netHeatW() - b.surfaces().get(i).netHeatW()) / (2 * h);
                    double fdT = (a.surfaces().get(i).temperatureK() - b.surfaces().get(i).temperatureK()) / (2 * h);
                    double q = sens.netHeat()[i][j][k];
                    double t = sens.temperature()[i][j][k];
                    assertThat(Math.abs(q - fdQ)).as("dQ%d/deps%d,%d: %s vs %s", i, j, k, q, fdQ)
                            .isLessThanOrEqualTo(1e-4 * Math.max(Math.abs(fdQ), floorQ));
                    assertThat(Math.abs(t - fdT)).as("dT%d/deps%d,%d: %s vs %s", i, j, k, t, fdT)
                            .isLessThanOrEqualTo(1e-4 * Math.max(Math.abs(fdT), floorT));
                }
            }
        }
    }

    private static double[][] deepCopy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }
}
