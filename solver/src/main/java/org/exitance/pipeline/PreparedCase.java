package org.exitance.pipeline;

import java.nio.file.Path;
import java.util.List;
import org.exitance.cases.CaseDescription;
import org.exitance.model.RadiationCase;

/**
 * A case ready to solve: what the file says, the model the solver takes, and the view factors
 * of its geometry.
 *
 * @param description the case as read
 * @param model       the validated model (for a case solved on facets, an enclosure of facets)
 * @param warnings    non-fatal findings of reading and of the view-factor stage, one line each
 * @param viewFactors view factors computed from the case's geometry (or its cache), or null when
 *                    the case gives a matrix
 * @param shortfall   why the view factors miss the case's view-factor tolerance, one line, or
 *                    null when they meet it (or the case gives a matrix)
 * @param viewFactorTolerance the view-factor tolerance the geometry was computed to (NaN without
 *                    a geometry)
 */
public record PreparedCase(CaseDescription description, RadiationCase model, List<String> warnings,
                           ComputedViewFactors viewFactors, String shortfall, double viewFactorTolerance) {
    public PreparedCase {
        warnings = List.copyOf(warnings);
    }

    /** The case file. */
    public Path file() {
        return description.file();
    }
}
