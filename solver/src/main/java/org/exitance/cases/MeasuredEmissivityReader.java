package org.exitance.cases;

import java.util.List;
import org.exitance.spectral.DirectionalEmissivity;
import org.exitance.spectral.GrayEmissivity;
import org.exitance.spectral.SpectralEmissivity;
import org.exitance.spectral.TabulatedEmissivity;

/**
 * Opaque materials given as instruments deliver them, turned into hemispherical emissivity
 * (docs/case-format.md, "Measured data"):
 * <ul>
 *   <li>{@code "opaqueReflectivity": 0.3} or {@code "spectralOpaqueReflectivity": {"wavelength_um",
 *       "reflectivity"}}: an opaque, diffuse sample, ε_λ = α_λ = 1 − ρ_λ (Kirchhoff; Siegel &amp;
 *       Howell, 5th ed., §3.4);</li>
 *   <li>{@code "normalEmissivity"} (a number, or {"wavelength_um", "emissivity"}) with
 *       {@code "normalToHemispherical": "dielectric" | "metal"}: converted by Fresnel's equations
 *       for a smooth dielectric or a metal with n = k ({@link DirectionalEmissivity#fromNormal});</li>
 *   <li>{@code "directionalEmissivity": {"angle_deg", "emissivity"}} (total), or with
 *       {@code "wavelength_um"} and one row of emissivities per wavelength: each row integrated over
 *       the hemisphere ({@link DirectionalEmissivity#hemispherical}).</li>
 * </ul>
 */
final class MeasuredEmissivityReader {
    /** The material keys this reader handles. */
    static final List<String> KEYS = List.of("opaqueReflectivity", "spectralOpaqueReflectivity", "normalEmissivity",
            "normalToHemispherical", "directionalEmissivity");

    private MeasuredEmissivityReader() {
    }

    /** True when the material object gives its emissivity as measured data. */
    static boolean applies(JsonCursor m) {
        return m.has("opaqueReflectivity") || m.has("spectralOpaqueReflectivity") || m.has("normalEmissivity")
                || m.has("directionalEmissivity");
    }

    /** The hemispherical spectral emissivity the measured data give. */
    static SpectralEmissivity read(JsonCursor m) throws CaseException {
        String which = m.exactlyOneOf("emissivity", "spectralEmissivity", "opaqueReflectivity",
                "spectralOpaqueReflectivity", "normalEmissivity", "directionalEmissivity");
        if (m.has("normalToHemispherical") && !which.equals("normalEmissivity")) {
            throw m.field("normalToHemispherical").error("goes with \"normalEmissivity\" only");
        }
        switch (which) {
            case "opaqueReflectivity":
                return new GrayEmissivity(1 - m.field("opaqueReflectivity").fraction());
            case "spectralOpaqueReflectivity": {
                TabulatedEmissivity r = MaterialReader.table(m.field("spectralOpaqueReflectivity")
                        .allowOnly("wavelength_um", "bandEdges_um", "reflectivity"), "reflectivity");
                double[] w = r.wavelengthsUm();
                double[] e = new double[w.length];
                for (int i = 0; i < w.length; i++) {
                    e[i] = 1 - r.at(w[i], 300);
                }
                return new TabulatedEmissivity(w, e);
            }
            case "normalEmissivity":
                return normal(m);
            default:
                return directional(m.field("directionalEmissivity"));
        }
    }

    private static SpectralEmissivity normal(JsonCursor m) throws CaseException {
        JsonCursor how = m.field("normalToHemispherical");
        String model = how.text();
        DirectionalEmissivity.Conversion c;
        if (model.equals("dielectric")) {
            c = DirectionalEmissivity.Conversion.DIELECTRIC;
        } else if (model.equals("metal")) {
            c = DirectionalEmissivity.Conversion.METAL;
        } else {
            throw how.error("must be \"dielectric\" or \"metal\", got '" + model + "'");
        }
        JsonCursor n = m.field("normalEmissivity");
        if (n.isNumber()) {
            return new GrayEmissivity(convert(n, n.fraction(), c));
        }
        TabulatedEmissivity t = MaterialReader.table(n.allowOnly("wavelength_um", "bandEdges_um", "emissivity"),
                "emissivity");
        double[] w = t.wavelengthsUm();
        double[] e = new double[w.length];
        for (int i = 0; i < w.length; i++) {
            e[i] = convert(n.field("emissivity"), t.at(w[i], 300), c);
        }
        return new TabulatedEmissivity(w, e);
    }

    private static double convert(JsonCursor where, double en, DirectionalEmissivity.Conversion c) throws CaseException {
        if (en == 0) {
            return 0;
        }
        try {
            return DirectionalEmissivity.fromNormal(en, c);
        } catch (IllegalArgumentException e) {
            throw where.error(e.getMessage());
        }
    }

    private static SpectralEmissivity directional(JsonCursor d) throws CaseException {
        d.allowOnly("angle_deg", "emissivity", "wavelength_um");
        JsonCursor ac = d.field("angle_deg");
        List<JsonCursor> a = ac.elementsWithin(Limits.TABLE_POINTS);
        if (a.isEmpty()) {
            throw ac.error("needs at least one angle");
        }
        double[] deg = new double[a.size()];
        for (int i = 0; i < deg.length; i++) {
            deg[i] = a.get(i).number();
            if (!(deg[i] >= 0 && deg[i] <= 90) || i > 0 && !(deg[i] > deg[i - 1])) {
                throw a.get(i).error("angles must increase within 0–90°, got " + deg[i]);
            }
        }
        JsonCursor ec = d.field("emissivity");
        if (!d.has("wavelength_um")) {
            return new GrayEmissivity(DirectionalEmissivity.hemispherical(deg, row(ec, deg.length)));
        }
        JsonCursor wc = d.field("wavelength_um");
        List<JsonCursor> w = wc.elementsWithin(Limits.TABLE_POINTS);
        List<JsonCursor> rows = ec.elements();
        if (w.isEmpty() || rows.size() != w.size()) {
            throw ec.error("needs one row of " + deg.length + " values per wavelength (" + w.size() + "), got "
                    + rows.size() + " rows");
        }
        double[] wl = new double[w.size()];
        double[] e = new double[w.size()];
        for (int i = 0; i < wl.length; i++) {
            wl[i] = w.get(i).positiveWithin(Limits.WAVELENGTH_UM);
            if (i > 0 && !(wl[i] > wl[i - 1])) {
                throw w.get(i).error("wavelengths must increase: " + wl[i] + " µm after " + wl[i - 1] + " µm");
            }
            e[i] = DirectionalEmissivity.hemispherical(deg, row(rows.get(i), deg.length));
        }
        return new TabulatedEmissivity(wl, e);
    }

    private static double[] row(JsonCursor r, int n) throws CaseException {
        List<JsonCursor> cells = r.elements();
        if (cells.size() != n) {
            throw r.error("has " + cells.size() + " values for " + n + " angles");
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = cells.get(i).fraction();
        }
        return out;
    }
}
