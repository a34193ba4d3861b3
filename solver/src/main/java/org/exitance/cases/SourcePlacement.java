package org.exitance.cases;

import org.exitance.geometry.Vec3;

/**
 * Where an external source lands, as the case says it: incidence factors given per surface, or
 * (for a geometry case) a direction or a planet, whose incidence the pipeline computes from the
 * geometry (docs/case-format.md, "sources").
 */
public sealed interface SourcePlacement {
    /** The incidence factors are given in the case. */
    SourcePlacement GIVEN = new Given();

    /** Incidence factors given per surface; nothing to compute. */
    record Given() implements SourcePlacement {
    }

    /**
     * A collimated source (sun, distant lamp): incidence is cos θ times the lit fraction.
     *
     * @param direction unit vector toward the source
     */
    record Collimated(Vec3 direction) implements SourcePlacement {
    }

    /**
     * A planet's diffuse emission or albedo: incidence is the view factor to a sphere.
     *
     * @param toward    unit vector toward the planet's centre
     * @param altitudeM altitude above its surface (m)
     * @param radiusM   its radius (m)
     * @param shadowing whether the geometry shadows itself from the planet (ray casting)
     */
    record Planet(Vec3 toward, double altitudeM, double radiusM, boolean shadowing) implements SourcePlacement {
    }
}
