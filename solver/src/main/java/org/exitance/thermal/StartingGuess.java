package org.exitance.thermal;

import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.spectral.PhysicalConstants;

/**
 * Starting temperatures of a solve: given ones, initial guesses, else the area-weighted
 * fourth-power mean of the fixed temperatures (or the environment's), raised for surfaces that
 * must emit a net flux q or that receive external irradiation S: {@code T⁴ = T_ref⁴ + (max(q, 0) + S)/σ}.
 */
final class StartingGuess {
    private static final double SIGMA = PhysicalConstants.STEFAN_BOLTZMANN_W_M2_K4;

    private StartingGuess() {
    }

    /** @return a new array of temperatures (K), one per surface */
    static double[] temperatures(Problem p, List<ExternalSource> sources) {
        Enclosure enc = p.enc;
        int n = enc.size();
        double sumA = 0;
        double sumAT4 = 0;
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            if (enc.surface(i).boundary() instanceof BoundaryCondition.FixedTemperature ft) {
                t[i] = ft.temperatureK();
                sumA += p.area[i];
                sumAT4 += p.area[i] * Math.pow(t[i], 4);
            }
        }
        double ref4;
        if (sumA > 0) {
            ref4 = sumAT4 / sumA;
        } else {
            ref4 = Math.pow(Math.max(p.envT, 3.0), 4);
        }
        if (p.envT > 0 && sumA == 0) {
            ref4 = Math.pow(p.envT, 4);
        }
        for (int a = 0; a < p.unknown.length; a++) {
            int i = p.unknown[a];
            EnclosureSurface s = enc.surface(i);
            if (Double.isFinite(s.initialTemperatureK())) {
                t[i] = s.initialTemperatureK();
            } else {
                double q = p.target[a] / p.area[i];
                double arriving = 0;
                for (int face : p.faces[a]) {
                    for (ExternalSource src : sources) {
                        arriving += src.irradianceOn(enc.surface(face).name());
                    }
                }
                t[i] = Math.max(Math.pow(ref4 + (Math.max(q, 0) + arriving) / SIGMA, 0.25), 1.0);
            }
        }
        // the face of a window without a condition takes the temperature of the face that has it
        for (int i = 0; i < n; i++) {
            if (enc.surface(i).boundary() instanceof BoundaryCondition.OnOtherFace) {
                t[i] = t[p.other[i]];
            }
        }
        return t;
    }
}
