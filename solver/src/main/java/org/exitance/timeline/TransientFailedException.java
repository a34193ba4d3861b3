package org.exitance.timeline;

/** A step had to be cut below the floor: the run has no answer of the stated accuracy. */
public final class TransientFailedException extends RuntimeException {
    public TransientFailedException(String message) {
        super(message);
    }
}
