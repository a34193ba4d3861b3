package org.exitance.model;

import java.util.Objects;

/**
 * A conductive path between two surfaces (through a bracket, a lining, a bolted joint) with a
 * conductance G in W/K: heat flowing from A to B is {@code G (T_A − T_B)}.
 *
 * @param surfaceA           one end (surface name)
 * @param surfaceB           the other end (surface name, different from A)
 * @param conductanceWPerK   G, W/K, positive
 */
public record ConductiveLink(String surfaceA, String surfaceB, double conductanceWPerK) {
    public ConductiveLink {
        Objects.requireNonNull(surfaceA, "surfaceA");
        Objects.requireNonNull(surfaceB, "surfaceB");
        if (surfaceA.equals(surfaceB)) {
            throw new IllegalArgumentException("a conductive link needs two different surfaces: " + surfaceA);
        }
        if (!(conductanceWPerK > 0) || !Double.isFinite(conductanceWPerK)) {
            throw new IllegalArgumentException("conductance must be positive and finite: " + conductanceWPerK);
        }
    }
}
