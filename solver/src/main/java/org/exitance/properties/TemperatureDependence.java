package org.exitance.properties;

import java.util.TreeSet;
import org.exitance.model.Material;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TemperatureTabulatedEmissivity;

/**
 * Which of a material's ε, ρ and τ change with temperature. ρ = 1 − ε − τ (α = ε, Kirchhoff;
 * α + ρ + τ = 1; Incropera et al., 6th ed., Sec. 12.7, from memory), so ρ may stay constant while
 * ε and τ change (a window given ρ and τ(T)), or change with ε alone (an opaque material). Every
 * model is linear in λ between its nodes and in T between its tables, so ρ is bilinear on the
 * grid of the union of ε's and τ's nodes and tables, and comparing it at those nodes decides
 * exactly.
 *
 * @param emissivity      ε depends on temperature
 * @param reflectivity    ρ depends on temperature
 * @param transmissivity  τ depends on temperature (false for an opaque material)
 */
public record TemperatureDependence(boolean emissivity, boolean reflectivity, boolean transmissivity) {
    /** Largest change of ρ between tables taken as rounding of equal values. */
    static final double ROUNDING = 1e-12;

    public static TemperatureDependence of(Material m) {
        SpectralEmissivity e = m.emissivity();
        SpectralEmissivity t = m.transmissivity();
        boolean eps = e.dependsOnTemperature();
        boolean tau = t != null && t.dependsOnTemperature();
        if (!eps && !tau) {
            return new TemperatureDependence(false, false, false);
        }
        TreeSet<Double> temps = new TreeSet<>();
        TreeSet<Double> nodes = new TreeSet<>();
        for (SpectralEmissivity p : new SpectralEmissivity[] {e, t}) {
            if (p == null) {
                continue;
            }
            if (p instanceof TemperatureTabulatedEmissivity tt) {
                for (double v : tt.temperaturesK()) {
                    temps.add(v);
                }
            } else if (p.dependsOnTemperature()) {
                return new TemperatureDependence(eps, true, tau); // a model without tables: assume ρ follows
            }
            for (double w : p.breakpointsUm()) {
                nodes.add(w);
            }
        }
        if (nodes.isEmpty()) {
            nodes.add(1.0);
        }
        double first = temps.first();
        for (double temp : temps) {
            for (double w : nodes) {
                if (Math.abs(rho(m, w, temp) - rho(m, w, first)) > ROUNDING) {
                    return new TemperatureDependence(eps, true, tau);
                }
            }
        }
        return new TemperatureDependence(eps, false, tau);
    }

    private static double rho(Material m, double lambdaUm, double tK) {
        return 1 - m.emissivity().at(lambdaUm, tK) - (m.transmissivity() == null ? 0 : m.transmissivity().at(lambdaUm, tK));
    }
}
