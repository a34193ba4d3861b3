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
 */
public record SolverReport(String linearSolver, int newtonIterations, int propertyIterations,
                           double residualW, double lastTemperatureStepK, int maxLinearIterations,
                           double maxLinearResidual) {
}
