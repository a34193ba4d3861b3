package org.exitance.thermal;

/**
 * The memory a temperature solve needs, estimated before it starts from the sizes alone (bytes).
 * The view-factor matrix F is held once (model/ViewFactorMatrix) and shared by every layer; the
 * rest depends on the {@link SolverChoice}:
 *
 * <ul>
 *   <li>F: 8N², or the compressed operator's bytes;</li>
 *   <li>direct and newton-krylov: one LU factor per band, 8N² each (all bands' factors live
 *       while the band loop of a property update does);</li>
 *   <li>direct: the blocked right-hand sides of one band, 8N·m, and the node sensitivities of
 *       every band, 8m² each, plus the m×m Jacobian and its LU, 16m²;</li>
 *   <li>newton-krylov and iterative: the GMRES basis, 8m·(restart + 2);</li>
 *   <li>vectors per band and surface (states, emissive powers, properties, the conjugate-gradient
 *       vectors of the fused solves and the warm starts kept from the last solve and property
 *       update): about 48 doubles each, 384·N·B, and a fixed 64 MB for the JVM's own needs.</li>
 * </ul>
 *
 * <p>The figure is the live data: a heap of that size suffices (the benchmark runs the box at
 * {@code -Xmx} equal to the estimate; docs/performance.md). The JVM's measured peak heap
 * ({@code SolverReport.peakHeapBytes}) can be higher when there is room, because the previous
 * property update's band factors stay on the heap until the collector needs the space.
 */
public final class MemoryEstimate {
    private static final long FIXED = 64L << 20;

    private MemoryEstimate() {
    }

    /**
     * @param n        surfaces (facets) N
     * @param unknown  unknown-temperature nodes m
     * @param bands    bands B
     * @param choice   the linear algebra of the solve
     * @return the estimated peak bytes of the solve, F included
     */
    public static long bytes(int n, int unknown, int bands, SolverChoice choice) {
        return bytes(n, unknown, bands, choice, 8L * n * n);
    }

    /**
     * As {@link #bytes(int, int, int, SolverChoice)} with F held in {@code viewFactorBytes} (a
     * compressed operator's own size instead of 8N²).
     */
    public static long bytes(int n, int unknown, int bands, SolverChoice choice, long viewFactorBytes) {
        long nn = (long) n * n;
        long mm = (long) unknown * unknown;
        long total = viewFactorBytes + FIXED + 384L * n * bands;
        switch (choice) {
            case DIRECT -> total += 8 * nn * bands + 8L * n * unknown + 8 * mm * bands + 16 * mm;
            case NEWTON_KRYLOV -> total += 8 * nn * bands + 8L * unknown * (KrylovStep.RESTART + 2);
            case ITERATIVE -> total += 8L * unknown * (KrylovStep.RESTART + 2);
            default -> throw new IllegalStateException();
        }
        return total;
    }
}
