package org.exitance.cases;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.exitance.geometry.Vec3;
import org.exitance.geometry.external.PlanetViewFactor;
import org.exitance.model.ExternalSource;
import org.exitance.spectral.source.BlackbodySource;
import org.exitance.spectral.source.IrradiationSource;
import org.exitance.spectral.source.SourceSpectrum;

/**
 * Reads the {@code sources} array of a case: external irradiation with a spectrum (a blackbody
 * temperature or a CSV spectrum beside the case), an irradiance, and where it lands: an incidence
 * factor per surface, or, for a geometry case, the direction of a collimated source or a
 * planet's direction and altitude. The incidence of the last two (lit fractions by ray casting,
 * view factor to a sphere) is computed later, by the pipeline, from the geometry.
 */
final class SourceReader {
    private SourceReader() {
    }

    /** {@code {"direction": [x, y, z], "altitude_m": h, "radius_m": R, "shadowing": false}}. */
    private static SourcePlacement.Planet planet(JsonCursor p) throws CaseException {
        p.allowOnly("direction", "altitude_m", "radius_m", "shadowing");
        Vec3 toward = direction(p.field("direction"));
        double altitude = p.field("altitude_m").positiveWithin(Limits.ALTITUDE_M);
        double radius = p.has("radius_m") ? p.field("radius_m").positiveWithin(Limits.PLANET_RADIUS_M) : PlanetViewFactor.EARTH_RADIUS_M;
        boolean shadowing = p.has("shadowing") && p.field("shadowing").bool();
        return new SourcePlacement.Planet(toward, altitude, radius, shadowing);
    }

    private static Vec3 direction(JsonCursor c) throws CaseException {
        return GeometryNumbers.direction(c).normalized();
    }

    /**
     * @param geometry whether the case has a geometry (without one, only {@code incidence} can place
     *                 a source)
     * @return the sources with their placements; incidence from the geometry is not computed here
     */
    static List<CaseSource> read(JsonCursor arr, Set<String> surfaceNames, Path caseDir, boolean geometry)
            throws CaseException {
        List<CaseSource> out = new ArrayList<>();
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
                spectrum = new BlackbodySource(spec.field("blackbody_K").positiveWithin(Limits.SOURCE_TEMPERATURE_K));
                irradiance = s.field("irradiance_W_m2").nonNegativeWithin(Limits.IRRADIANCE_W_M2);
            } else {
                JsonCursor ref = spec.field("csv");
                Path csv = caseDir.resolve(ref.nonEmptyText()).normalize();
                if (!Files.isRegularFile(csv)) {
                    throw ref.error("spectrum file not found: " + csv);
                }
                SourceSpectrum table = SourceSpectrumCsvReader.read(csv);
                irradiance = s.has("irradiance_W_m2") ? s.field("irradiance_W_m2").nonNegativeWithin(Limits.IRRADIANCE_W_M2)
                        : table.totalIrradianceWM2();
                if (!Limits.IRRADIANCE_W_M2.contains(irradiance)) {
                    throw ref.error("the spectrum in " + csv.getFileName() + " integrates to "
                            + Limits.number(irradiance) + " W/m²; an irradiance must lie "
                            + Limits.IRRADIANCE_W_M2.describe() + " (see Limits in docs/case-format.md)");
                }
                spectrum = table;
            }
            Map<String, Double> incidence = Map.of();
            SourcePlacement where = SourcePlacement.GIVEN;
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
            } else if (!geometry) {
                throw s.field(placement).error("\"" + placement + "\" needs a case with \"geometry\"; with a"
                        + " view-factor matrix give \"incidence\" per surface");
            } else if (placement.equals("direction")) {
                where = new SourcePlacement.Collimated(direction(s.field("direction")));
            } else {
                where = planet(s.field("planet"));
            }
            out.add(new CaseSource(new ExternalSource(name, spectrum, irradiance, incidence), where));
        }
        return out;
    }
}
