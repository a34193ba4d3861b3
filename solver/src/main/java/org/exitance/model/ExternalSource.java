package org.exitance.model;

import java.util.Map;
import java.util.Objects;
import org.exitance.spectral.source.IrradiationSource;

/**
 * Radiation arriving from outside the enclosure's surfaces: the sun or a distant lamp
 * (collimated), a planet's infrared emission or its albedo (diffuse). Surface i receives
 * {@code irradiance × incidence_i} W/m², where the incidence factor in [0, 1] is, for a
 * collimated source, cos θ_i times the lit fraction of the surface, and for a diffuse source, the
 * surface's view factor to it. The spectrum decides how the power splits over bands and how
 * much each surface absorbs; the rest is reflected diffusely into the enclosure.
 *
 * @param name              name used in reports
 * @param spectrum          spectral shape (a blackbody or a tabulated spectrum)
 * @param irradianceWPerM2  irradiance on a surface facing the source squarely (W/m²), ≥ 0
 * @param incidence         incidence factor per surface name, in [0, 1]; absent names receive nothing
 */
public record ExternalSource(String name, IrradiationSource spectrum, double irradianceWPerM2,
                             Map<String, Double> incidence) {
    public ExternalSource {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(spectrum, "spectrum");
        if (!(irradianceWPerM2 >= 0) || !Double.isFinite(irradianceWPerM2)) {
            throw new IllegalArgumentException("irradiance must be finite and >= 0: " + irradianceWPerM2);
        }
        incidence = Map.copyOf(incidence);
        for (Map.Entry<String, Double> e : incidence.entrySet()) {
            if (!(e.getValue() >= 0 && e.getValue() <= 1)) {
                throw new IllegalArgumentException("incidence factor for " + e.getKey() + " must lie in [0, 1]: "
                        + e.getValue());
            }
        }
    }

    /** Irradiance arriving at the named surface (W/m²), all bands together. */
    public double irradianceOn(String surface) {
        return irradianceWPerM2 * incidence.getOrDefault(surface, 0.0);
    }
}
