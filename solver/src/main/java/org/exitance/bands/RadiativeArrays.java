package org.exitance.bands;

import java.util.List;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.ExternalSource;
import org.exitance.network.RadiationOperator;

/**
 * The arrays of an enclosure that the band loop reads, derived once per solve. Units: areas in
 * m², temperatures in K, view factors dimensionless.
 *
 * <p>Ownership: {@link #viewFactors} is the enclosure's own row-major array, shared and read
 * only (never copied: 8·N² bytes); the other arrays belong to this object and are not modified
 * after construction.
 */
public final class RadiativeArrays {
    /** The enclosure the arrays come from. */
    public final Enclosure enclosure;
    /** N. */
    public final int n;
    /**
     * F, N×N row-major; shared with {@link Enclosure#matrix()}, read only. Null when the
     * enclosure holds its view factors compressed: then only {@link #operator} exists, and only
     * the iterative paths can solve it.
     */
    public final double[] viewFactors;
    /**
     * F as the operator the iterative band solves use ({@link RadiationOperator}): the dense
     * {@link #viewFactors} wrapped, not copied, or the compressed operator. One per solve, so its
     * pass count is the solve's.
     */
    public final RadiationOperator operator;
    /** A_i (m²). */
    public final double[] area;
    /** F_i,env = max(0, 1 − Σ_j F_ij) with an environment, else 0. */
    public final double[] environmentFactor;
    /** Environment temperature (K), 0 without an environment. */
    public final double environmentK;
    /** Per surface: the other face of its window, or −1. */
    public final int[] otherFace;
    /** External sources (sun, lamps, planet). */
    public final List<ExternalSource> sources;

    /**
     * @param enclosure  the enclosure
     * @param sources    its external sources
     */
    public RadiativeArrays(Enclosure enclosure, List<ExternalSource> sources) {
        this.enclosure = enclosure;
        this.n = enclosure.size();
        if (enclosure.matrix().isDense()) {
            this.viewFactors = enclosure.matrix().sharedRowMajor();
            this.operator = RadiationOperator.dense(viewFactors, n);
        } else {
            this.viewFactors = null;
            this.operator = new CompressedRadiationOperator(enclosure.matrix().products());
        }
        this.area = new double[n];
        this.environmentFactor = new double[n];
        for (int i = 0; i < n; i++) {
            area[i] = enclosure.surface(i).areaM2();
            environmentFactor[i] = enclosure.environmentFactor(i);
        }
        this.environmentK = enclosure.environment() == null ? 0.0 : enclosure.environment().temperatureK();
        this.otherFace = enclosure.otherFaceIndices();
        this.sources = List.copyOf(sources);
    }

    /** Surface i. */
    public EnclosureSurface surface(int i) {
        return enclosure.surface(i);
    }
}
