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
 * @param tolerance     target of the facet rows of the view factors: the estimated error of every
 *                      row, and for a closed geometry its deviation from 1, must stay within it
 *                      ({@code options.tolerance}, default {@value #DEFAULT_TOLERANCE})
 * @param storage       how the facet view factors are held
 */
public record CaseGeometry(Scene scene, ViewFactorOptions options, List<String> notes, boolean solveOnFacets,
        double tolerance, Storage storage) {

    /**
     * How the facet view factors are held ({@code options.storage}): the dense N×N matrix, a
     * compressed operator (hierarchical low-rank blocks, docs/view-factors.md), or the size rule.
     */
    public enum Storage {
        AUTO, DENSE, COMPRESSED
    }

    /** With the default storage ({@link Storage#AUTO}). */
    public CaseGeometry(Scene scene, ViewFactorOptions options, List<String> notes, boolean solveOnFacets,
            double tolerance) {
        this(scene, options, notes, solveOnFacets, tolerance, Storage.AUTO);
    }

    /** Default view-factor tolerance. */
    public static final double DEFAULT_TOLERANCE = 1e-5;

    public CaseGeometry {
        notes = List.copyOf(notes);
    }

    /**
     * @param tol another view-factor tolerance (the command line's {@code --vf-tolerance})
     * @return a copy with it, the pair tolerance tightened to at most a hundredth of it
     */
    public CaseGeometry withTolerance(double tol) {
        return new CaseGeometry(scene, options.withPairTolerance(Math.min(options.pairTolerance(), Math.max(1e-12, tol / 100))),
                notes, solveOnFacets, tol, storage);
    }
}
