package org.exitance.result;

/**
 * How the solve went.
 *
 * @param linearSolver           the radiosity solver used ("direct LU" or "conjugate gradients")
 * @param newtonIterations       Newton iterations in total (0 when no temperature was unknown)
 * @param propertyIterations     outer updates of the temperature-dependent band properties
 * @param residualW              largest heat-balance residual of an unknown-temperature surface (W)
 * @param lastTemperatureStepK   largest temperature change in the last Newton step (K)
 * @param maxLinearIterations    largest iteration count of a band's linear solve
 * @param maxLinearResidual      largest relative residual of a band's linear solve
 * @param strategy               the linear algebra of the whole solve ("direct", "newton-krylov",
 *                               "iterative"; thermal.SolverChoice), or "" when not recorded
 * @param bandIterations         per band of the final band set, the most iterations of any of its
 *                               linear solves (1 for a direct solve); copied, never null
 * @param krylovProducts         Jacobian–vector products of Newton–Krylov in total (0 for direct)
 * @param operatorPasses         passes over the view-factor operator by the iterative F products
 *                               (a product of all N rows counts 1, whatever the number of bands; the
 *                               LU paths' triangular solves are not counted)
 * @param estimatedBytes         the memory estimated before the solve (bytes; 0 when not recorded)
 * @param peakHeapBytes          the JVM's peak heap use measured during the solve (bytes; 0 when
 *                               not recorded): the whole JVM's, so other work in the same process counts
 */
public record SolverReport(String linearSolver, int newtonIterations, int propertyIterations,
                           double residualW, double lastTemperatureStepK, int maxLinearIterations,
                           double maxLinearResidual, String strategy, int[] bandIterations, int krylovProducts,
                           double operatorPasses, long estimatedBytes, long peakHeapBytes) {

    public SolverReport {
        bandIterations = bandIterations == null ? new int[0] : bandIterations.clone();
        strategy = strategy == null ? "" : strategy;
    }

    /** A report without the strategy, per-band and memory figures. */
    public SolverReport(String linearSolver, int newtonIterations, int propertyIterations, double residualW,
                        double lastTemperatureStepK, int maxLinearIterations, double maxLinearResidual) {
        this(linearSolver, newtonIterations, propertyIterations, residualW, lastTemperatureStepK, maxLinearIterations,
                maxLinearResidual, "", new int[0], 0, 0, 0, 0);
    }

    /** Per-band iteration counts (a copy). */
    @Override
    public int[] bandIterations() {
        return bandIterations.clone();
    }

    /** This report with the strategy, per-band iterations, products and memory figures set. */
    public SolverReport withRun(String strategy, int[] bandIterations, int krylovProducts, double operatorPasses,
                                long estimatedBytes, long peakHeapBytes) {
        return new SolverReport(linearSolver, newtonIterations, propertyIterations, residualW, lastTemperatureStepK,
                maxLinearIterations, maxLinearResidual, strategy, bandIterations, krylovProducts, operatorPasses,
                estimatedBytes, peakHeapBytes);
    }
}
