package org.exitance.thermal;

/**
 * The temperature solve did not converge. Carries what a user needs to judge it: iterations and
 * the heat residual reached. The command line maps it to exit code 3; no number is reported as a
 * result.
 */
public final class SolveFailedException extends RuntimeException {
    private final int iterations;
    private final double residualW;

    public SolveFailedException(String message, int iterations, double residualW) {
        super(message);
        this.iterations = iterations;
        this.residualW = residualW;
    }

    public int iterations() {
        return iterations;
    }

    public double residualW() {
        return residualW;
    }
}
