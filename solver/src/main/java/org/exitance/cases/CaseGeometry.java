package org.exitance.cases;

import java.util.List;
import org.exitance.geometry.Scene;
import org.exitance.geometry.viewfactor.ViewFactorOptions;

/**
 * The {@code geometry} of a case, parsed: building the scene of named surfaces is cheap; its
 * view factors are not computed here.
 *
 * @param scene         the surfaces and their facets (lengths in m)
 * @param options       how to compute view factors
 * @param notes         what mesh import repaired or noticed, one line each
 * @param solveOnFacets whether the case is solved facet by facet ({@code "resolution": "facets"})
 */
public record CaseGeometry(Scene scene, ViewFactorOptions options, List<String> notes, boolean solveOnFacets) {
    public CaseGeometry {
        notes = List.copyOf(notes);
    }
}
