package org.exitance.network;

/** An iterative radiosity solve stopped before reaching its tolerance. */
public final class NetworkConvergenceException extends RuntimeException {
    private final int iterations;
    private final double relativeResidual;

    public NetworkConvergenceException(String message, int iterations, double relativeResidual) {
        super(message);
        this.iterations = iterations;
        this.relativeResidual = relativeResidual;
    }

    public int iterations() {
        return iterations;
    }

    public double relativeResidual() {
        return relativeResidual;
    }
}
