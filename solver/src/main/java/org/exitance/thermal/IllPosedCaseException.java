package org.exitance.thermal;

/**
 * The case is readable but has no physical solution as posed (for example no surface fixes the
 * temperature level, or a surface with zero emissivity in every band has an unknown temperature).
 * The command line maps it to exit code 2.
 */
public final class IllPosedCaseException extends RuntimeException {
    public IllPosedCaseException(String message) {
        super(message);
    }
}
