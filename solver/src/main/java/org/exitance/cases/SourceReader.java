package org.exitance.cases;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.external.CollimatedIncidence;
import org.exitance.geometry.external.IncidenceResult;
import org.exitance.geometry.external.PlanetViewFactor;
import org.exitance.geometry.external.ShadowedPlanetView;
import org.exitance.model.ExternalSource;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * Reads the {@code sources} array of a case: external irradiation with a spectrum (a blackbody
 * temperature or a CSV spectrum beside the case), an irradiance, and where it lands: an incidence
 * factor per surface, or, for a geometry case, the direction of a collimated source (lit
 * fractions by ray casting) or a planet's direction and altitude (view factor to a sphere).
 */
final class SourceReader {
    private SourceReader() {
    }

    /** Per-surface (or, with facet names, per-facet) factors of a geometry computation. */
    private static Map<String, Double> factors(IncidenceResult r, List<String> facetNames) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (facetNames != null) {
            for (int f = 0; f < facetNames.size(); f++) {
                out.put(facetNames.get(f), Math.min(1.0, Math.max(0.0, r.facetFactors()[f])));
            }
            return out;
        }
        for (int i = 0; i < r.surfaceNames().size(); i++) {
            out.put(r.surfaceNames().get(i), Math.min(1.0, Math.max(0.0, r.surfaceFactors()[i])));
        }
        return out;
    }

    /** {@code {"direction": [x, y, z], "altitude_m": h, "radius_m": R, "shadowing": false}}. */
    private static Map<String, Double> planet(JsonCursor p, Scene scene, List<String> facetNames) throws CaseException {
        p.allowOnly("direction", "altitude_m", "radius_m", "shadowing");
        Vec3 toward = direction(p.field("direction"));
        double altitude = p.field("altitude_m").positive();
        double radius = p.has("radius_m") ? p.field("radius_m").positive() : PlanetViewFactor.EARTH_RADIUS_M;
        boolean shadowing = p.has("shadowing") && p.field("shadowing").bool();
        return factors(shadowing ? new ShadowedPlanetView(scene).compute(toward, altitude, radius)
                : PlanetViewFactor.compute(scene, toward, altitude, radius), facetNames);
    }

    private static Vec3 direction(JsonCursor c) throws CaseException {
        double[] v = c.numbers();
        if (v.length != 3) {
            throw c.error("expected three numbers [x, y, z], got " + v.length);
        }
        Vec3 d = new Vec3(v[0], v[1], v[2]);
        if (!(d.length() > 0)) {
            throw c.error("a direction must not be zero");
        }
        return d.normalized();
    }

    /**
     * @param scene the case's geometry, or null for a case that gives its view factors as a matrix
     *              (then only {@code incidence} can place a source)
     */
    static List<ExternalSource> read(JsonCursor arr, Set<String> surfaceNames, Path caseDir, Scene scene)
            throws CaseException {
        return read(arr, surfaceNames, caseDir, scene, null);
    }

    /**
     * @param facetNames for a case solved on facets, the facets' names in scene order: a source placed
     *                   by the geometry then gets a factor per facet; null to get one per surface
     */
    static List<ExternalSource> read(JsonCursor arr, Set<String> surfaceNames, Path caseDir, Scene scene,
                                     List<String> facetNames) throws CaseException {
        List<ExternalSource> out = new ArrayList<>();
        Set<String> names = new java.util.HashSet<>();
        for (JsonCursor s : arr.elements()) {
            s.allowOnly("name", "spectrum", "irradiance_W_m2", "incidence", "direction", "planet", "description");
            JsonCursor nameCursor = s.field("name");
            String name = nameCursor.nonEmptyText();
            if (!names.add(name)) {
                throw nameCursor.error("duplicate source name '" + name + "'");
            }
            JsonCursor spec = s.field("spectrum").allowOnly("blackbody_K", "csv");
            String which = spec.exactlyOneOf("blackbody_K", "csv");
            IrradiationSource spectrum;
            double irradiance;
            if (which.equals("blackbody_K")) {
                spectrum = new BlackbodySource(spec.field("blackbody_K").positive());
                irradiance = s.field("irradiance_W_m2").nonNegative();
            } else {
                JsonCursor ref = spec.field("csv");
                Path csv = caseDir.resolve(ref.nonEmptyText()).normalize();
                if (!Files.isRegularFile(csv)) {
                    throw ref.error("spectrum file not found: " + csv);
                }
                SourceSpectrum table = SourceSpectrumCsvReader.read(csv);
                irradiance = s.has("irradiance_W_m2") ? s.field("irradiance_W_m2").nonNegative()
                        : table.totalIrradianceWM2();
                spectrum = table;
            }
            Map<String, Double> incidence;
            String placement = s.exactlyOneOf("incidence", "direction", "planet");
            if (placement.equals("incidence")) {
                incidence = new LinkedHashMap<>();
                JsonCursor inc = s.field("incidence");
                for (Map.Entry<String, JsonCursor> e : inc.entries()) {
                    if (!surfaceNames.contains(e.getKey())) {
                        throw e.getValue().error("no surface named '" + e.getKey() + "'");
                    }
                    incidence.put(e.getKey(), e.getValue().fraction());
                }
            } else if (scene == null) {
                throw s.field(placement).error("\"" + placement + "\" needs a case with \"geometry\"; with a"
                        + " view-factor matrix give \"incidence\" per surface");
            } else if (placement.equals("direction")) {
                incidence = factors(new CollimatedIncidence(scene).compute(direction(s.field("direction"))), facetNames);
            } else {
                incidence = planet(s.field("planet"), scene, facetNames);
            }
            out.add(new ExternalSource(name, spectrum, irradiance, incidence));
        }
        return out;
    }
}
