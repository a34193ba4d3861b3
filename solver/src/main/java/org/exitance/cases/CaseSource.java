package org.exitance.cases;

import org.exitance.model.ExternalSource;

/**
 * An external source as read from a case.
 *
 * @param source    name, spectrum and irradiance; its incidence factors are final for
 *                  {@link SourcePlacement#GIVEN} and empty otherwise (the pipeline computes them)
 * @param placement how its incidence is found
 */
public record CaseSource(ExternalSource source, SourcePlacement placement) {
    public String name() {
        return source.name();
    }
}
