package org.exitance.cases;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.section.Section;
import org.exitance.geometry.section.SectionElement;

/**
 * Reads the {@code section} of a case: a 2-D cross-section of an infinitely long geometry (a
 * tunnel kiln, radiant tubes over a strip, a long duct) with a length along the axis
 * (docs/case-format.md, "section"). Each part is a straight segment, a circular arc or a full
 * circle belonging to a named surface; several parts may make one surface (a row of rollers).
 * Reading computes no view factors: it builds the section and the surfaces' areas (perimeter ×
 * length).
 *
 * @param section  the section, one element per part, named {@code surface#k} when a surface has
 *                 several parts
 * @param surfaceOfPart  the case surface of each part, in part order
 * @param areasM2  each surface's area (m²): its parts' perimeter times the length
 */
public record CaseSection(Section section, List<String> surfaceOfPart, Map<String, Double> areasM2) {

    public CaseSection {
        surfaceOfPart = List.copyOf(surfaceOfPart);
        areasM2 = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(areasM2));
    }

    /** Reads {@code $.section}. */
    static CaseSection read(JsonCursor s) throws CaseException {
        s.allowOnly("length_m", "parts", "description");
        double length = s.field("length_m").positiveWithin(Limits.LENGTH_M);
        JsonCursor partsCursor = s.field("parts");
        List<JsonCursor> parts = partsCursor.elementsWithin(Limits.FACETS);
        if (parts.isEmpty()) {
            throw partsCursor.error("needs at least one part");
        }
        Map<String, Integer> count = new LinkedHashMap<>();
        List<String> owner = new ArrayList<>();
        List<SectionElement> elements = new ArrayList<>();
        for (JsonCursor p : parts) {
            p.allowOnly("surface", "segment", "arc", "circle", "description");
            String surface = p.field("surface").nonEmptyText();
            String kind = p.exactlyOneOf("segment", "arc", "circle");
            JsonCursor e = p.field(kind);
            try {
                elements.add(element(kind, e));
            } catch (GeometryException ex) {
                throw e.error(ex.getMessage());
            }
            owner.add(surface);
            count.merge(surface, 1, Integer::sum);
        }
        Section.Builder b = Section.builder(length);
        Map<String, Integer> seen = new LinkedHashMap<>();
        Map<String, Double> areas = new LinkedHashMap<>();
        for (int i = 0; i < elements.size(); i++) {
            String surface = owner.get(i);
            int k = seen.merge(surface, 1, Integer::sum);
            b.add(count.get(surface) == 1 ? surface : surface + "#" + k, elements.get(i));
            areas.merge(surface, elements.get(i).length() * length, Double::sum);
        }
        try {
            return new CaseSection(b.build(), owner, areas);
        } catch (GeometryException ex) {
            throw partsCursor.error(ex.getMessage());
        }
    }

    private static SectionElement element(String kind, JsonCursor e) throws CaseException {
        switch (kind) {
            case "segment": {
                e.allowOnly("from_m", "to_m");
                double[] a = point(e.field("from_m"));
                double[] b = point(e.field("to_m"));
                return new SectionElement.Segment(a[0], a[1], b[0], b[1]);
            }
            case "circle": {
                e.allowOnly("center_m", "radius_m", "radiates");
                double[] c = point(e.field("center_m"));
                return new SectionElement.Circle(c[0], c[1], e.field("radius_m").positiveWithin(Limits.LENGTH_M),
                        side(e, SectionElement.Side.CONVEX));
            }
            default: {
                e.allowOnly("center_m", "radius_m", "start_deg", "sweep_deg", "radiates");
                double[] c = point(e.field("center_m"));
                double start = e.field("start_deg").within(Limits.ANGLE_DEG);
                double sweep = e.field("sweep_deg").within(Limits.ANGLE_DEG);
                if (!(sweep > 0 && sweep < 360)) {
                    throw e.field("sweep_deg").error("must lie between 0° and 360° (a full turn is a circle), got " + sweep);
                }
                if (!e.has("radiates")) {
                    throw e.error("an arc needs \"radiates\": \"outward\" (its convex side) or \"inward\" (toward its centre)");
                }
                return new SectionElement.Arc(c[0], c[1], e.field("radius_m").positiveWithin(Limits.LENGTH_M),
                        Math.toRadians(start), Math.toRadians(sweep), side(e, null));
            }
        }
    }

    private static SectionElement.Side side(JsonCursor e, SectionElement.Side dflt) throws CaseException {
        if (!e.has("radiates")) {
            return dflt;
        }
        JsonCursor r = e.field("radiates");
        String v = r.text();
        if (v.equals("outward")) {
            return SectionElement.Side.CONVEX;
        }
        if (v.equals("inward")) {
            return SectionElement.Side.CONCAVE;
        }
        throw r.error("must be \"outward\" or \"inward\", got '" + v + "'");
    }

    private static double[] point(JsonCursor c) throws CaseException {
        List<JsonCursor> xy = c.elements();
        if (xy.size() != 2) {
            throw c.error("needs two coordinates [x, y] in m, got " + xy.size());
        }
        return new double[] {xy.get(0).within(Limits.COORDINATE_M), xy.get(1).within(Limits.COORDINATE_M)};
    }
}
