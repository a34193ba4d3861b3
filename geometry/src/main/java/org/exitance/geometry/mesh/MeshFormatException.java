package org.exitance.geometry.mesh;

import java.io.IOException;

/** A mesh file that cannot be read: names the file, the place in it and the problem. */
public class MeshFormatException extends IOException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final String location;
    private final String problem;

    /**
     * @param file file name
     * @param location e.g. "line 12" or "facet 7"
     * @param problem what is wrong
     */
    public MeshFormatException(String file, String location, String problem) {
        super(file + ": " + location + ": " + problem);
        this.file = file;
        this.location = location;
        this.problem = problem;
    }

    /** @return the file name */
    public String file() {
        return file;
    }

    /** @return where in the file */
    public String location() {
        return location;
    }

    /** @return what is wrong */
    public String problem() {
        return problem;
    }
}
