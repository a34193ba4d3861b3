package org.exitance.conduction;

/** The conduction through a wall did not converge (a temperature step too large for Newton). */
public final class WallSolveException extends RuntimeException {
    public WallSolveException(String message) {
        super(message);
    }
}
