package org.exitance.geometry.mesh;

/** Number parsing shared by the mesh readers; errors name the file and the place. */
final class MeshNumbers {
    private MeshNumbers() {
    }

    /** A finite number, or a {@link MeshFormatException} naming file and location. */
    static double parse(String s, String file, String where) throws MeshFormatException {
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new MeshFormatException(file, where, "not a finite number: '" + s + "'");
        }
    }
}
