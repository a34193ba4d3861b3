package org.exitance.conduction;

import java.util.List;

/**
 * A layered wall behind a surface: heat conducts in one dimension through its layers, from the
 * surface (the inner face, at the surface's temperature) to the outer face.
 *
 * @param layers   the layers, inner first; at least one
 * @param outside  what the outer face meets
 */
public record Wall(List<Layer> layers, OuterBoundary outside) {
    public Wall {
        layers = List.copyOf(layers);
        if (layers.isEmpty()) {
            throw new IllegalArgumentException("a wall needs at least one layer");
        }
        java.util.Objects.requireNonNull(outside, "outside");
    }

    /** Σ L/k (m²·K/W) with each layer's conductivity at temperature t. */
    public double conductionResistanceM2KPerW(double t) {
        double r = 0;
        for (Layer l : layers) {
            r += l.thicknessM() / l.conductivity().at(t);
        }
        return r;
    }
}
