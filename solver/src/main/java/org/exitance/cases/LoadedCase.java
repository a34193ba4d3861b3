package org.exitance.cases;

import java.nio.file.Path;
import java.util.List;
import org.exitance.model.RadiationCase;

/**
 * A case as read from disk: the model, notes the reader wants the user to see, and the expected
 * values of a validation case (or null).
 *
 * @param file      where it came from
 * @param model     the validated model
 * @param warnings  non-fatal findings (e.g. small reciprocity errors), one line each
 * @param expected  reference values, or null for an ordinary case
 * @param viewFactors  view factors computed from the case's geometry, or null when the case gives a matrix
 */
public record LoadedCase(Path file, RadiationCase model, List<String> warnings, ExpectedValues expected,
                         ComputedViewFactors viewFactors) {
    public LoadedCase {
        warnings = List.copyOf(warnings);
    }
}
