package org.exitance.support;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.Material;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;

/**
 * Random but physically consistent enclosures for property tests: the view factors come from a
 * random symmetric matrix of exchange areas S_ij = A_i F_ij, so reciprocity holds exactly and
 * rows sum to 1 (closed) or less (open, with an environment).
 */
public final class RandomEnclosures {
    private RandomEnclosures() {
    }

    /** A random spectral material: steps at 1–10 µm, or gray. */
    public static SpectralEmissivity randomEmissivity(Random r) {
        if (r.nextInt(4) == 0) {
            return new GrayEmissivity(0.05 + 0.9 * r.nextDouble());
        }
        int nodes = 2 + r.nextInt(4);
        double[] w = new double[nodes];
        double[] e = new double[nodes];
        double x = 0.5 + r.nextDouble();
        for (int i = 0; i < nodes; i++) {
            w[i] = x;
            e[i] = 0.05 + 0.9 * r.nextDouble();
            x *= 1.5 + 2 * r.nextDouble();
        }
        return new TabulatedEmissivity(w, e);
    }

    /**
     * The same enclosure with a perturbed matrix, still reciprocal and with no row above 1: the
     * exchange area A_i F_ij = A_j F_ji of surfaces 0 and 1 grows by half the smaller of their
     * shares to the environment (an open enclosure, where both have some).
     *
     * @return the perturbed enclosure, or null when surface 0 or 1 sends less than 1 % to the environment
     */
    public static Enclosure nudged(Enclosure e) {
        double[][] f = e.viewFactors();
        double a0 = e.surface(0).areaM2();
        double a1 = e.surface(1).areaM2();
        double s = 0.5 * Math.min(a0 * e.environmentFactor(0), a1 * e.environmentFactor(1));
        if (e.environment() == null || s < 0.01 * Math.min(a0, a1)) {
            return null;
        }
        f[0][1] += s / a0;
        f[1][0] += s / a1;
        return new Enclosure(e.surfaces(), f, e.environment());
    }

    /**
     * @param n            surfaces
     * @param open         whether part of each row goes to an environment at 250–350 K
     * @param unknownShare probability that a surface (other than the first) has an unknown temperature
     */
    public static Enclosure random(Random r, int n, boolean open, double unknownShare) {
        double[][] s = new double[n][n];
        double[] area = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = i; j < n; j++) {
                double v = r.nextDouble() < 0.2 ? 0 : r.nextDouble();
                if (i == j) {
                    v *= 0.3; // a concave surface sees itself
                }
                s[i][j] = v;
                s[j][i] = v;
            }
        }
        for (int i = 0; i < n; i++) {
            s[i][(i + 1) % n] += 0.05; // keep every surface connected
            s[(i + 1) % n][i] = s[i][(i + 1) % n];
        }
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int j = 0; j < n; j++) {
                sum += s[i][j];
            }
            area[i] = open ? sum * (1.0 + 0.5 * r.nextDouble()) : sum;
        }
        double[][] f = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                f[i][j] = s[i][j] / area[i];
            }
        }
        List<EnclosureSurface> surfaces = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Material m = new Material("m" + i, randomEmissivity(r), "");
            BoundaryCondition bc;
            if (i > 0 && r.nextDouble() < unknownShare) {
                bc = switch (r.nextInt(3)) {
                    case 0 -> new BoundaryCondition.Adiabatic();
                    // positive demands (dissipation) are always feasible; an absorption demand may not be
                    case 1 -> new BoundaryCondition.FixedNetHeat(area[i] * 2000 * r.nextDouble());
                    default -> new BoundaryCondition.FixedNetFlux(3000 * r.nextDouble());
                };
            } else {
                bc = new BoundaryCondition.FixedTemperature(300 + 1200 * r.nextDouble());
            }
            surfaces.add(new EnclosureSurface("s" + i, m, area[i], bc, Double.NaN));
        }
        Environment env = open ? new Environment("surroundings", 250 + 100 * r.nextDouble()) : null;
        return new Enclosure(surfaces, f, env);
    }
}
