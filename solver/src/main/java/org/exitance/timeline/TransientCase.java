package org.exitance.timeline;

import java.util.Map;
import org.exitance.conduction.HeatCapacity;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.RadiationCase;

/**
 * A case integrated in time: the steady model (surfaces, view factors, walls, sources), the
 * heat capacities of its nodes, what changes with time, and how to integrate.
 *
 * @param model       the steady model at its own conditions (walls in its enclosure)
 * @param capacities  heat capacity by the name of the surface that carries a node's condition
 * @param drivers     schedules and thermostats
 * @param time        integration and output settings
 */
public record TransientCase(RadiationCase model, Map<String, HeatCapacity> capacities, Drivers drivers,
                            TimeSettings time) {
    public TransientCase {
        capacities = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(capacities));
        var enc = model.enclosure();
        for (String s : capacities.keySet()) {
            int i = enc.indexOf(s);
            if (i < 0) {
                throw new IllegalArgumentException("a heat capacity names an unknown surface '" + s + "'");
            }
            BoundaryCondition bc = enc.surface(i).boundary();
            if (!bc.balancesAllPaths()) {
                throw new IllegalArgumentException("surface '" + s + "' carries a heat capacity, so its condition must"
                        + " be a dissipation or adiabatic (it is " + bc.label() + ")");
            }
        }
    }

    /** The starting temperature of surface i (K): its own initial temperature, or the time block's. */
    public double initialK(int i) {
        var enc = model.enclosure();
        EnclosureSurface s = enc.surface(i);
        if (s.boundary() instanceof BoundaryCondition.OnOtherFace) {
            s = enc.surface(enc.indexOf(s.otherFace()));
        }
        return Double.isNaN(s.initialTemperatureK()) ? time.initialK() : s.initialTemperatureK();
    }
}
