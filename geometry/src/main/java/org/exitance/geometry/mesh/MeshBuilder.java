package org.exitance.geometry.mesh;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.exitance.geometry.Facet;
import org.exitance.geometry.GeometryException;
import org.exitance.geometry.Surface;
import org.exitance.geometry.Vec3;

/**
 * Collects polygons into named surfaces, validating and repairing each: zero-area polygons are
 * dropped and counted; planar convex polygons become one facet; non-planar or non-convex ones
 * are split into triangles by ear clipping (Meisters, "Polygons have ears", Amer. Math. Monthly
 * 82, 1975) in the plane of their Newell normal, and counted.
 */
final class MeshBuilder {

    private final String file;
    private final Map<String, List<Facet>> groups = new LinkedHashMap<>();
    int dropped;
    int split;
    int normalConflicts;

    MeshBuilder(String file) {
        this.file = file;
    }

    /** Adds a polygon (vertices counter-clockwise from the radiating side, m) to a group. */
    void add(String group, List<Vec3> poly, String where) throws MeshFormatException {
        List<Facet> target = groups.computeIfAbsent(group, g -> new ArrayList<>());
        Vec3 n = newell(poly);
        double diam = 0;
        for (Vec3 a : poly) {
            for (Vec3 b : poly) {
                diam = Math.max(diam, a.distance(b));
            }
        }
        if (!(n.length() > 2e-12 * diam * diam)) {
            dropped++;
            return;
        }
        try {
            target.add(Facet.of(poly));
            return;
        } catch (GeometryException e) {
            if (poly.size() == 3) {
                dropped++; // a triangle only fails when degenerate (e.g. a repeated vertex)
                return;
            }
        }
        List<Vec3[]> tris = earClip(poly, n.normalized(), where);
        split++;
        for (Vec3[] t : tris) {
            try {
                target.add(Facet.of(t));
            } catch (GeometryException e) {
                dropped++;
            }
        }
    }

    static Vec3 newell(List<Vec3> p) {
        double x = 0, y = 0, z = 0;
        for (int k = 0; k < p.size(); k++) {
            Vec3 a = p.get(k), b = p.get((k + 1) % p.size());
            x += (a.y() - b.y()) * (a.z() + b.z());
            y += (a.z() - b.z()) * (a.x() + b.x());
            z += (a.x() - b.x()) * (a.y() + b.y());
        }
        return new Vec3(x, y, z);
    }

    private List<Vec3[]> earClip(List<Vec3> poly, Vec3 n, String where) throws MeshFormatException {
        List<Vec3> rest = new ArrayList<>(poly);
        List<Vec3[]> out = new ArrayList<>();
        int guard = 0;
        while (rest.size() > 3) {
            boolean found = false;
            for (int k = 0; k < rest.size() && !found; k++) {
                Vec3 a = rest.get((k + rest.size() - 1) % rest.size()), b = rest.get(k), c = rest.get((k + 1) % rest.size());
                if (b.minus(a).cross(c.minus(b)).dot(n) <= 0) {
                    continue; // reflex or straight
                }
                boolean empty = true;
                for (Vec3 v : rest) {
                    if (v != a && v != b && v != c && inside(v, a, b, c, n)) {
                        empty = false;
                        break;
                    }
                }
                if (empty) {
                    out.add(new Vec3[] {a, b, c});
                    rest.remove(k);
                    found = true;
                }
            }
            if (!found || ++guard > 10 * poly.size()) {
                throw new MeshFormatException(file, where, "self-intersecting polygon with " + poly.size()
                        + " vertices cannot be split into triangles");
            }
        }
        out.add(rest.toArray(new Vec3[0]));
        return out;
    }

    private static boolean inside(Vec3 p, Vec3 a, Vec3 b, Vec3 c, Vec3 n) {
        return b.minus(a).cross(p.minus(a)).dot(n) >= 0 && c.minus(b).cross(p.minus(b)).dot(n) >= 0
                && a.minus(c).cross(p.minus(c)).dot(n) >= 0;
    }

    MeshImport build(String kind) throws MeshFormatException {
        List<Surface> surfaces = new ArrayList<>();
        for (Map.Entry<String, List<Facet>> e : groups.entrySet()) {
            if (!e.getValue().isEmpty()) {
                surfaces.add(new Surface(e.getKey(), e.getValue()));
            }
        }
        if (surfaces.isEmpty()) {
            throw new MeshFormatException(file, "whole file", "no usable " + kind + " facets");
        }
        List<String> notes = new ArrayList<>();
        if (dropped > 0) {
            notes.add(file + ": dropped " + dropped + " zero-area facet(s)");
        }
        if (split > 0) {
            notes.add(file + ": split " + split + " non-planar or non-convex polygon(s) into triangles");
        }
        if (normalConflicts > 0) {
            notes.add(file + ": " + normalConflicts + " facet(s) whose stored normal opposed the winding");
        }
        return new MeshImport(surfaces, dropped, normalConflicts, split, notes);
    }
}
