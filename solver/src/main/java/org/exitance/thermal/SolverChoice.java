package org.exitance.thermal;

import java.util.Locale;
import org.exitance.network.ConjugateGradientRadiositySolver;
import org.exitance.network.DirectRadiositySolver;
import org.exitance.network.RadiositySolver;

/**
 * How a temperature solve does its linear algebra: the band solves and the Newton step.
 *
 * <ul>
 *   <li>{@link #DIRECT} ("direct"): each band factored once per property update (LU); the
 *       Jacobian of the m unknown nodes from one blocked solve per band for all their columns
 *       (about one more factorization's work, 2N²m flops), reused in every Newton step; the Newton
 *       step by LU of the m×m Jacobian. Memory: F, one N² factor per band, an N×m block.</li>
 *   <li>{@link #NEWTON_KRYLOV} ("newton-krylov"): the same band factors; the Newton step by GMRES
 *       on the unknowns, preconditioned by the diagonal (emission A ε dE/dT plus convection and
 *       links), each Jacobian–vector product one band solve per band (Kelley, Solving Nonlinear
 *       Equations with Newton's Method, SIAM 2003, ch. 3). No m×m matrix.</li>
 *   <li>{@link #ITERATIVE} ("iterative"): Newton–Krylov with conjugate-gradient band solves on the
 *       symmetric form, no N² array besides F (opaque enclosures only).</li>
 * </ul>
 *
 * <p><b>The default rule</b> ({@link #forCase}), from the benchmark in docs/performance.md (closed
 * box, a third of the facets unknown): direct up to {@link #DIRECT_LIMIT} facets, where the three
 * cost about the same and the exact Jacobian is the most robust; above it iterative, whatever the
 * number of bands: since its passes over F were cut (warm starts, forcing terms, products from the
 * iterations' own recurrences) it is the cheapest path from one band on (1,944 facets, 1 band: 1.6
 * CPU s against 4.2 for newton-krylov; 4,056 facets: 4.2 against 24.7; 8 bands: 7.2 against
 * about 37 at 1,944). An enclosure with a window never gets iterative (conjugate gradients cannot
 * solve its coupling): direct up to the limit, newton-krylov above. When the chosen path's memory
 * estimate ({@link MemoryEstimate}) exceeds the heap, iterative is chosen if the case allows it.
 */
public enum SolverChoice {
    DIRECT("direct"),
    NEWTON_KRYLOV("newton-krylov"),
    ITERATIVE("iterative");

    /** Above this many surfaces (facets) the default rule leaves the direct path. */
    public static final int DIRECT_LIMIT = 500;
    /** Relative (per-surface, in watts) tolerance of the conjugate-gradient band solves. */
    static final double CG_TOLERANCE = 1e-13;

    private final String label;

    SolverChoice(String label) {
        this.label = label;
    }

    /** The name used on the command line and in reports. */
    public String label() {
        return label;
    }

    /** Whether the Newton step is found by GMRES on Jacobian–vector products. */
    public boolean jacobianFree() {
        return this != DIRECT;
    }

    /** The band-solve strategy of this choice for N surfaces. */
    public RadiositySolver radiositySolver(int n) {
        return this == ITERATIVE ? new ConjugateGradientRadiositySolver(CG_TOLERANCE, 10 * n + 1000)
                : new DirectRadiositySolver();
    }

    /**
     * The choice named {@code label} ("direct", "newton-krylov", "iterative").
     *
     * @throws IllegalArgumentException for another name, listing the valid ones
     */
    public static SolverChoice of(String label) {
        for (SolverChoice c : values()) {
            if (c.label.equals(label.toLowerCase(Locale.ROOT))) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown solver '" + label + "' (use direct, newton-krylov or iterative)");
    }

    /**
     * The default rule of the class doc.
     *
     * @param n          surfaces (facets)
     * @param unknown    unknown-temperature nodes
     * @param bands      bands
     * @param windows    whether some surface is a window face
     * @param heapBytes  memory available to the solve (bytes), e.g. {@code Runtime.maxMemory()}
     */
    public static SolverChoice forCase(int n, int unknown, int bands, boolean windows, long heapBytes) {
        SolverChoice c;
        if (n <= DIRECT_LIMIT) {
            c = DIRECT;
        } else if (windows) {
            c = NEWTON_KRYLOV;
        } else {
            c = ITERATIVE;
        }
        if (!windows && MemoryEstimate.bytes(n, unknown, bands, c) > heapBytes) {
            c = ITERATIVE;
        }
        return c;
    }
}
