package org.exitance.pipeline;

import java.util.List;
import org.exitance.cases.CaseDescription;
import org.exitance.cases.CaseException;
import org.exitance.cases.CaseSection;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.section.SectionResult;
import org.exitance.geometry.section.SectionViewFactors;
import org.exitance.model.EnclosureSurface;

/**
 * View factors of a 2-D section (Hottel's crossed strings, geometry/section) in case order. A
 * surface made of several parts gets the perimeter-weighted row of its parts and the sum of
 * their columns, F_SU = Σ_{i∈S} P_i Σ_{j∈U} F_ij / Σ_{i∈S} P_i (the summation and reciprocity
 * rules of view-factor algebra; Siegel &amp; Howell, 5th ed., §4.4).
 */
final class SectionStage {
    private SectionStage() {
    }

    /**
     * @param warnings receives notes on the section (modified)
     * @return F in case order (a new array)
     * @throws CaseException at {@code $.section} when the section is not supported, or when it is open
     *                       and the case has no environment
     */
    static double[][] viewFactors(CaseDescription d, List<String> warnings) throws CaseException {
        CaseSection s = d.section();
        SectionResult r;
        try {
            r = SectionViewFactors.compute(s.section());
        } catch (GeometryException e) {
            throw new CaseException(d.file(), "$.section", e.getMessage());
        }
        List<EnclosureSurface> surfaces = d.surfaces();
        int n = surfaces.size();
        int m = r.size();
        int[] of = new int[m];
        for (int k = 0; k < m; k++) {
            of[k] = indexOf(surfaces, s.surfaceOfPart().get(k));
        }
        double[][] f = new double[n][n];
        double[] perimeter = new double[n];
        for (int i = 0; i < m; i++) {
            double p = r.perimeter_m(i);
            perimeter[of[i]] += p;
            for (int j = 0; j < m; j++) {
                f[of[i]][of[j]] += p * r.viewFactor(i, j);
            }
        }
        for (int a = 0; a < n; a++) {
            double rowSum = 0;
            for (int b = 0; b < n; b++) {
                f[a][b] /= perimeter[a];
                rowSum += f[a][b];
            }
            if (d.environment() == null && 1 - rowSum > GeometryViewFactors.OPEN_GEOMETRY) {
                throw new CaseException(d.file(), "$.section", "the section is open: " + String.format(
                        java.util.Locale.ROOT, "%.6g", 1 - rowSum) + " of the radiation leaving '"
                        + surfaces.get(a).name() + "' escapes; add an \"environment\" to receive it, or close the section");
            }
        }
        warnings.add("section: 2-D, " + String.format(java.util.Locale.ROOT, "%.6g", s.section().axialLength_m())
                + " m long (crossed strings; ends not modelled): heats are for the whole length, divide by it for"
                + " values per metre");
        return f;
    }

    private static int indexOf(List<EnclosureSurface> surfaces, String name) {
        for (int i = 0; i < surfaces.size(); i++) {
            if (surfaces.get(i).name().equals(name)) {
                return i;
            }
        }
        throw new IllegalStateException("section part of unknown surface " + name);
    }
}
