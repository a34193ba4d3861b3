package org.exitance.pipeline;

import java.util.List;
import org.exitance.cases.CaseDescription;
import org.exitance.cases.CaseException;
import org.exitance.model.EnclosureSurface;

/** A view-factor matrix the case gives, made consistent for the solve ({@link ConsistentViewFactors}). */
final class GivenViewFactors {
    private GivenViewFactors() {
    }

    /**
     * @param warnings receives a line when the matrix is changed (modified)
     * @return F[i][j] in case order: the given array when consistent, else a new one
     * @throws CaseException at {@code $.viewFactors.matrix} when no consistent matrix lies near it
     */
    static double[][] consistent(CaseDescription d, List<String> warnings) throws CaseException {
        double[][] f = d.viewFactors();
        List<EnclosureSurface> s = d.surfaces();
        int n = s.size();
        double[] flat = new double[n * n];
        double[] area = new double[n];
        for (int i = 0; i < n; i++) {
            area[i] = s.get(i).areaM2();
            System.arraycopy(f[i], 0, flat, i * n, n);
        }
        String changed;
        try {
            changed = ConsistentViewFactors.repair(flat, n, area, d.environment() != null);
        } catch (ConsistentViewFactors.Unrepairable e) {
            throw new CaseException(d.file(), "$.viewFactors.matrix", e.getMessage() + ": check the areas against the"
                    + " matrix");
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
}
