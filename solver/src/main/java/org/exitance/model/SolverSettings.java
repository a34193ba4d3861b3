package org.exitance.model;

/**
 * Convergence settings of the temperature solve.
 *
 * @param temperatureToleranceK   the property loop stops when no temperature moves more than this
 *                                between property updates, and Newton's step test asks that the
 *                                last step move none by more than this (K)
 * @param relativeHeatTolerance   Newton's heat test: every node's residual below this fraction of
 *                                the heat flowing through the node by every path, plus its rounding
 *                                floor (–); see thermal/NodeBalance
 * @param maxNewtonIterations     Newton iterations allowed per property update
 * @param maxPropertyIterations   outer updates of temperature-dependent band properties allowed
 */
public record SolverSettings(double temperatureToleranceK, double relativeHeatTolerance,
                             int maxNewtonIterations, int maxPropertyIterations) {
    public static final SolverSettings DEFAULT = new SolverSettings(1e-6, 1e-12, 100, 50);

    public SolverSettings {
        if (!(temperatureToleranceK > 0) || !(relativeHeatTolerance > 0)
                || maxNewtonIterations < 1 || maxPropertyIterations < 1) {
            throw new IllegalArgumentException("solver settings must be positive");
        }
    }
}
