package org.exitance.pipeline;

import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseReader;
import org.exitance.model.EnclosureSurface;
import org.exitance.geometry.viewfactor.ExchangeAreaSmoother;
import org.exitance.geometry.viewfactor.Smoothing;
import org.exitance.geometry.viewfactor.SmoothingReport;

/**
 * The view factors a solve uses are reciprocal, and their rows sum to 1 (closed enclosure) or
 * to at most 1 (with an environment), to within {@value #CONSISTENT}: otherwise no energy balance
 * over them can close. A matrix given in a case (tables give three or four digits) or computed
 * from a geometry with the closure left as computed is, when its errors exceed that, replaced by
 * the nearest consistent matrix with the same zero entries: the least-squares smoothing of
 * exchange areas of Larsen &amp; Howell (J. Heat Transfer 108, 1986, 239–242; geometry's
 * ExchangeAreaSmoother). A consistent matrix is used exactly as it is.
 */
final class ConsistentViewFactors {
    /** Largest relative reciprocity or row-sum error of a matrix used as it is. */
    static final double CONSISTENT = 1e-9;
    /** Largest such error of a repaired matrix. */
    static final double REPAIRED = 1e-9;

    private ConsistentViewFactors() {
    }

    /** No consistent matrix lies near the given one. */
    static final class Unrepairable extends Exception {
        private static final long serialVersionUID = 1L;

        Unrepairable(String message) {
            super(message);
        }
    }

    /**
     * The surface matrix a solve uses, made consistent.
     *
     * @param f        F[i][j] in the order of {@code surfaces}; not modified
     * @param jsonPath where an unrepairable matrix is reported ({@code $.viewFactors.matrix}, {@code $.geometry})
     * @param warnings receives a line when the matrix is changed (modified)
     * @return f itself when consistent, else a new array
     * @throws CaseException when no consistent matrix lies near f
     */
    static double[][] forSolve(double[][] f, List<EnclosureSurface> surfaces, boolean open, Path file,
                               String jsonPath, List<String> warnings) throws CaseException {
        int n = surfaces.size();
        double[] flat = new double[n * n];
        double[] area = new double[n];
        for (int i = 0; i < n; i++) {
            area[i] = surfaces.get(i).areaM2();
            System.arraycopy(f[i], 0, flat, i * n, n);
        }
        String changed;
        try {
            changed = repair(flat, n, area, open);
        } catch (Unrepairable e) {
            throw new CaseException(file, jsonPath, e.getMessage() + ": check the areas against the view factors");
        }
        if (changed == null) {
            return f;
        }
        warnings.add(changed);
        double[][] out = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(flat, i * n, out[i], 0, n);
        }
        return out;
    }

    /**
     * @param f    row-major n × n view factors; modified when they are not consistent
     * @param area areas (m²); not modified
     * @param open whether an environment receives what the rows leave
     * @return a warning line when f was changed, null when it was consistent
     * @throws Unrepairable when no reciprocal matrix with these zero entries has rows that close
     */
    static String repair(double[] f, int n, double[] area, boolean open) throws Unrepairable {
        double before = worstError(f, n, area, open);
        if (before <= CONSISTENT) {
            return null;
        }
        SmoothingReport r;
        try {
            r = ExchangeAreaSmoother.smooth(f, n, area, open ? Smoothing.OPEN : Smoothing.CLOSED);
        } catch (RuntimeException e) { // the least-squares problem has no solution: its iteration does not settle
            r = null;
        }
        if (r == null || !(worstError(f, n, area, open) <= REPAIRED)) {
            throw new Unrepairable("no reciprocal" + (open ? "" : ", closed") + " set of view factors with the same"
                    + " zero entries lies near these for these areas (largest reciprocity or row-sum error "
                    + CaseReader.fmt(before) + ")");
        }
        return "view factors: made reciprocal" + (open ? "" : " and closed") + " for the solve (least-squares smoothing"
                + " of exchange areas): largest reciprocity or row-sum error " + CaseReader.fmt(before)
                + ", largest change of a view factor " + CaseReader.fmt(r.maxChange());
    }

    /** Largest relative reciprocity error and row-sum error (excess only, when open); f not modified. */
    static double worstError(double[] f, int n, double[] area, boolean open) {
        double worst = 0;
        for (int i = 0; i < n; i++) {
            double sum = 0;
            for (int j = 0; j < n; j++) {
                double fij = f[i * n + j];
                sum += fij;
                double a = area[i] * fij;
                double b = area[j] * f[j * n + i];
                if (Math.max(a, b) > 0) {
                    worst = Math.max(worst, Math.abs(a - b) / Math.max(a, b));
                }
            }
            worst = Math.max(worst, open ? sum - 1 : Math.abs(sum - 1));
        }
        return worst;
    }
}
