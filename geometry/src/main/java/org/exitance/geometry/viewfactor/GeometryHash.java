package org.exitance.geometry.viewfactor;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import org.exitance.geometry.Facet;
import org.exitance.geometry.Scene;
import org.exitance.geometry.Surface;

/**
 * SHA-256 of everything that determines a view-factor result: a format tag, the surface names,
 * facet counts and the exact bits of every vertex coordinate, and the options other than the
 * thread count. Equal hashes mean equal inputs, so a cached result can be reused.
 */
public final class GeometryHash {

    /** Changes whenever the algorithm changes results. */
    static final String FORMAT = "exitance-viewfactor-6"; // 2: shadow projection; 3: exact curved patches; 4: round solids in the way; 5: round solids ending between a pair's heights; 6: round bodies cast exact shadows

    private GeometryHash() {
    }

    /**
     * @param scene the geometry
     * @param o the options
     * @return lowercase hex SHA-256
     */
    public static String of(Scene scene, ViewFactorOptions o) {
        try {
            MessageDigest md = MessageDigest.getInstance("SHA-256");
            md.update(FORMAT.getBytes(StandardCharsets.UTF_8));
            for (Surface s : scene.surfaces()) {
                byte[] name = s.name().getBytes(StandardCharsets.UTF_8);
                md.update(ByteBuffer.allocate(4).putInt(name.length).array());
                md.update(name);
                md.update(ByteBuffer.allocate(4).putInt(s.facets().size()).array());
                for (Facet f : s.facets()) {
                    ByteBuffer b = ByteBuffer.allocate(4 + 24 * f.vertexCount());
                    b.putInt(f.vertexCount());
                    for (double c : f.coordinates()) {
                        b.putLong(Double.doubleToLongBits(c));
                    }
                    md.update(b.array());
                    if (f.patch() != null) {
                        double[] pp = f.patch().parameters();
                        ByteBuffer c = ByteBuffer.allocate(8 * pp.length);
                        for (double v : pp) {
                            c.putLong(Double.doubleToLongBits(v));
                        }
                        md.update(c.array());
                    }
                }
            }
            String opts = o.pairTolerance() + "|" + o.contourOrder() + "|" + o.visibilityOrder() + "|"
                    + o.obstruction() + "|" + o.smoothing();
            md.update(opts.getBytes(StandardCharsets.UTF_8));
            StringBuilder sb = new StringBuilder();
            for (byte x : md.digest()) {
                sb.append(String.format("%02x", x));
            }
            return sb.toString();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java platform", e);
        }
    }
}
