package org.exitance.timeline;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.BoundaryCondition;
import org.exitance.model.Enclosure;
import org.exitance.model.EnclosureSurface;
import org.exitance.model.Environment;
import org.exitance.model.ExternalSource;
import org.exitance.model.RadiationCase;

/**
 * The steady model as it stands at one instant: scheduled dissipations and temperatures in the
 * surfaces' conditions, thermostat heaters on or off, sources scaled, the environment at its
 * scheduled temperature. The view factors are shared, never copied.
 */
final class CaseAtTime {
    private final TransientCase c;

    CaseAtTime(TransientCase c) {
        this.c = c;
    }

    /**
     * @param t   time (s)
     * @param on  per thermostat of the drivers, whether its heater is on; not modified
     */
    RadiationCase at(double t, boolean[] on) {
        RadiationCase m = c.model();
        Drivers d = c.drivers();
        Enclosure enc = m.enclosure();
        List<EnclosureSurface> surfaces = new ArrayList<>(enc.size());
        for (EnclosureSurface s : enc.surfaces()) {
            BoundaryCondition bc = s.boundary();
            Schedule p = d.power().get(s.name());
            Schedule temp = d.temperature().get(s.name());
            if (p != null) {
                bc = new BoundaryCondition.HeatInput(p.at(t));
            } else if (temp != null) {
                bc = new BoundaryCondition.FixedTemperature(temp.at(t));
            }
            for (int k = 0; k < d.thermostats().size(); k++) {
                Drivers.Thermostat th = d.thermostats().get(k);
                if (th.heater().equals(s.name())) {
                    double base = bc instanceof BoundaryCondition.HeatInput h ? h.powerW() : 0.0;
                    bc = new BoundaryCondition.HeatInput(base + (on[k] ? th.powerW() : 0.0));
                }
            }
            surfaces.add(bc == s.boundary() ? s : s.withBoundary(bc, s.initialTemperatureK()));
        }
        Enclosure e = enc.withSurfaces(surfaces);
        if (d.environmentK() != null && enc.environment() != null) {
            e = e.withEnvironment(new Environment(enc.environment().name(), Math.max(0, d.environmentK().at(t))));
        }
        List<ExternalSource> sources = new ArrayList<>();
        for (ExternalSource s : m.sources()) {
            Schedule f = d.sourceScale().get(s.name());
            sources.add(f == null ? s : new ExternalSource(s.name(), s.spectrum(),
                    s.irradianceWPerM2() * Math.max(0, f.at(t)), s.incidence()));
        }
        return new RadiationCase(m.title(), m.notes(), m.materials(), e, m.bands(), m.settings(), sources,
                List.of(), m.facetGroups());
    }

    /** Every time in (from, to] where a schedule has a point: the integrator restarts there (s). */
    List<Double> knotsIn(double from, double to) {
        Drivers d = c.drivers();
        List<Double> out = new ArrayList<>();
        for (Schedule s : d.power().values()) {
            out.addAll(s.knotsIn(from, to));
        }
        for (Schedule s : d.temperature().values()) {
            out.addAll(s.knotsIn(from, to));
        }
        for (Schedule s : d.sourceScale().values()) {
            out.addAll(s.knotsIn(from, to));
        }
        if (d.environmentK() != null) {
            out.addAll(d.environmentK().knotsIn(from, to));
        }
        out.sort(Double::compare);
        return out;
    }
}
