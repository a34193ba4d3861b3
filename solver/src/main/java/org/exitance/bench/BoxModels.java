package org.exitance.bench;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.BandSet;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Material;
import org.exitance.model.RadiationCase;
import org.exitance.model.SolverSettings;
import org.exitance.model.ViewFactorMatrix;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;

/**
 * Closed-box models for benchmarks of the solver alone (invented data: {@code exitance bench} and
 * the benchmark beside the tests). A unit cube with c × c
 * square cells on each face, N = 6c² facets. The view factors are synthetic but exactly reciprocal
 * and closed: the point-to-point kernel between cell centres, {@code S_ij = A_i A_j cosθ_i cosθ_j /
 * (π r²)} (Siegel &amp; Howell, 5th ed., the differential view factor between two small areas;
 * r² floored at one cell area, zero within a face), balanced symmetrically, {@code S'_ij =
 * d_i S_ij d_j} with Σ_j S'_ij = A_i (a few fixed-point sweeps), and {@code F_ij = S'_ij / A_i}.
 * Not the geometry's exact view factors: the solver's cost and accuracy do not depend on that.
 *
 * <p>Every third facet (index ≡ 0 mod 3) has an unknown temperature (adiabatic), the rest fixed
 * temperatures from 400 K to 1200 K across the box; the material is non-gray (a step in ε at
 * 2–8 µm), so several bands differ.
 */
public final class BoxModels {
    private BoxModels() {
    }

    /** Cells per face edge for about n facets. */
    public static int cellsFor(int facets) {
        return Math.max(1, (int) Math.round(Math.sqrt(facets / 6.0)));
    }

    /**
     * The view factors of the box (row-major, a new array of (6c²)² entries), closed to about 1e-12.
     *
     * @param c  cells per face edge
     * @param area  receives the facet areas (m²); length 6c², modified
     */
    public static double[] viewFactors(int c, double[] area) {
        int n = 6 * c * c;
        double[][] p = new double[n][];
        double[][] nrm = new double[n][];
        double h = 1.0 / c;
        int k = 0;
        for (int face = 0; face < 6; face++) {
            int axis = face / 2;
            double side = face % 2 == 0 ? 0.0 : 1.0;
            for (int u = 0; u < c; u++) {
                for (int v = 0; v < c; v++) {
                    double[] x = new double[3];
                    x[axis] = side;
                    x[(axis + 1) % 3] = (u + 0.5) * h;
                    x[(axis + 2) % 3] = (v + 0.5) * h;
                    double[] nv = new double[3];
                    nv[axis] = face % 2 == 0 ? 1.0 : -1.0; // inward
                    p[k] = x;
                    nrm[k] = nv;
                    area[k] = h * h;
                    k++;
                }
            }
        }
        double[] s = new double[Math.multiplyExact(n, n)];
        java.util.stream.IntStream.range(0, n).parallel().forEach(i -> {
            for (int j = 0; j < n; j++) {
                double dx = p[j][0] - p[i][0];
                double dy = p[j][1] - p[i][1];
                double dz = p[j][2] - p[i][2];
                double r2 = dx * dx + dy * dy + dz * dz;
                double ci = (nrm[i][0] * dx + nrm[i][1] * dy + nrm[i][2] * dz);
                double cj = -(nrm[j][0] * dx + nrm[j][1] * dy + nrm[j][2] * dz);
                if (ci <= 1e-12 || cj <= 1e-12) {
                    continue; // same face, or facing away
                }
                double rr = Math.max(r2, h * h);
                s[i * n + j] = area[i] * area[j] * ci * cj / (Math.PI * rr * r2);
            }
        });
        double[] d = new double[n];
        java.util.Arrays.fill(d, 1.0);
        double[] sd = new double[n];
        for (int sweep = 0; sweep < 200; sweep++) {
            java.util.stream.IntStream.range(0, n).parallel().forEach(i -> {
                double sum = 0;
                int row = i * n;
                for (int j = 0; j < n; j++) {
                    sum += s[row + j] * d[j];
                }
                sd[i] = sum; // each row one sum in a fixed order: the same whatever the threads
            });
            double worst = 0;
            for (int i = 0; i < n; i++) {
                worst = Math.max(worst, Math.abs(d[i] * sd[i] / area[i] - 1));
            }
            if (worst < 1e-13) {
                break;
            }
            for (int i = 0; i < n; i++) {
                d[i] = Math.sqrt(d[i] * area[i] / sd[i]);
            }
        }
        java.util.stream.IntStream.range(0, n).parallel().forEach(i -> {
            int row = i * n;
            for (int j = 0; j < n; j++) {
                s[row + j] = d[i] * s[row + j] * d[j] / area[i];
            }
        });
        return s;
    }

    /**
     * The benchmark case.
     *
     * @param facets  about this many facets (6c²)
     * @param bands   1 (gray) or more: that many bands with edges spread over 1–20 µm
     */
    public static RadiationCase box(int facets, int bands) {
        int c = cellsFor(facets);
        int n = 6 * c * c;
        double[] area = new double[n];
        double[] f = viewFactors(c, area);
        SpectralEmissivity eps = new TabulatedEmissivity(new double[] {2, 8}, new double[] {0.3, 0.85});
        Material m = new Material("invented step coating", eps, "invented: ε 0.3 below 2 µm, 0.85 above 8 µm");
        List<EnclosureSurface> surfaces = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            BoundaryCondition bc = i % 3 == 0 ? new BoundaryCondition.Adiabatic()
                    : new BoundaryCondition.FixedTemperature(400 + 800.0 * (i % 97) / 96);
            surfaces.add(new EnclosureSurface("f" + i, m, area[i], bc, Double.NaN));
        }
        Enclosure e = new Enclosure(surfaces, ViewFactorMatrix.adopt(f, n), null, List.of());
        return new RadiationCase("invented closed box, " + n + " facets", "invented benchmark data", List.of(m), e,
                bandSet(bands), SolverSettings.DEFAULT);
    }

    /** One gray band, or that many bands with edges spread geometrically over 1–20 µm. */
    static BandSet bandSet(int bands) {
        if (bands <= 1) {
            return BandSet.gray("benchmark");
        }
        double[] edges = new double[bands - 1];
        for (int k = 0; k < edges.length; k++) {
            edges[k] = Math.pow(20.0, (k + 1.0) / bands);
        }
        return new BandSet(edges, "benchmark");
    }
}
