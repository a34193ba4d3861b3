package org.exitance.geometry.section;

import java.util.List;

import org.exitance.geometry.viewfactor.ClosureDiagnostics;

/**
 * View factors of a {@link Section}, in the section's surface order. Immutable: arrays are
 * copied in and out.
 *
 * <p>F_ij is the fraction of the diffuse radiation leaving surface i (per metre of axial length)
 * that reaches surface j directly, for the infinitely long geometry. The environment factor of a
 * row is 1 − Σ_j F_ij: the fraction leaving through the openings of an open section (0 up to
 * rounding for a closed one). Totals for the axial length multiply the per-metre values by it.
 */
public final class SectionResult {
    private final List<String> names;
    private final double[] perimeters;
    private final double[] f;
    private final double axialLength;
    private final ClosureDiagnostics diagnostics;

    /**
     * @param names surface names
     * @param perimeters_m length of each surface in the section (m per m); copied
     * @param viewFactors row-major n × n F_ij; copied
     * @param axialLength_m length along the axis (m)
     * @param diagnostics summation and reciprocity errors
     */
    SectionResult(List<String> names, double[] perimeters_m, double[] viewFactors, double axialLength_m,
            ClosureDiagnostics diagnostics) {
        this.names = List.copyOf(names);
        this.perimeters = perimeters_m.clone();
        this.f = viewFactors.clone();
        this.axialLength = axialLength_m;
        this.diagnostics = diagnostics;
    }

    /** @return the number of surfaces */
    public int size() {
        return names.size();
    }

    /** @return the surface names, in order */
    public List<String> names() {
        return names;
    }

    /** @return F_ij, the fraction of what leaves surface i that reaches surface j directly */
    public double viewFactor(int i, int j) {
        return f[i * names.size() + j];
    }

    /** @return a row-major n × n copy of the view factors */
    public double[] viewFactors() {
        return f.clone();
    }

    /** @return 1 − Σ_j F_ij, the fraction of what leaves surface i that escapes the section */
    public double environmentFactor(int i) {
        int n = names.size();
        double s = 0;
        for (int j = 0; j < n; j++) {
            s += f[i * n + j];
        }
        return 1 - s;
    }

    /** @return the length of surface i in the section plane (m per m of axial length) */
    public double perimeter_m(int i) {
        return perimeters[i];
    }

    /** @return a copy of the surface lengths in the section plane (m per m of axial length) */
    public double[] perimeters_m() {
        return perimeters.clone();
    }

    /** @return the length along the axis (m) */
    public double axialLength_m() {
        return axialLength;
    }

    /** @return the area of surface i over the axial length (m²) */
    public double area_m2(int i) {
        return perimeters[i] * axialLength;
    }

    /** @return the exchange area A_i F_ij over the axial length (m²); symmetric in i and j */
    public double exchangeArea_m2(int i, int j) {
        return area_m2(i) * viewFactor(i, j);
    }

    /** @return closure (row sums) and reciprocity errors, as for 3-D view factors */
    public ClosureDiagnostics diagnostics() {
        return diagnostics;
    }

    /** @return the index of the surface with this name, or −1 */
    public int indexOf(String name) {
        return names.indexOf(name);
    }
}
