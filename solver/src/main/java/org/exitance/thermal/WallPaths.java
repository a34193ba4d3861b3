package org.exitance.thermal;

import java.util.Map;
import org.exitance.conduction.Wall;
import org.exitance.conduction.WallGrid;
import org.exitance.conduction.WallSolveException;
import org.exitance.model.Enclosure;

/**
 * The steady conduction through the walls of an enclosure ({@link Enclosure#walls()}): for a
 * surface temperature, each wall is solved through its thickness ({@link WallGrid}, its last
 * solution the next start) and gives the heat into it and its derivative.
 */
final class WallPaths implements SurfacePaths {
    private final WallGrid[] grids;
    private final double[][] states;
    private final double[] area;

    WallPaths(Enclosure enc) {
        int n = enc.size();
        grids = new WallGrid[n];
        states = new double[n][];
        area = new double[n];
        for (Map.Entry<String, Wall> e : enc.walls().entrySet()) {
            int i = enc.indexOf(e.getKey());
            grids[i] = new WallGrid(e.getValue(), Double.NaN);
            area[i] = enc.surface(i).areaM2();
        }
    }

    /** The steady paths of the enclosure's walls, or {@link SurfacePaths#NONE} without walls. */
    static SurfacePaths of(Enclosure enc) {
        return enc.walls().isEmpty() ? NONE : new WallPaths(enc);
    }

    @Override
    public void heat(int i, double tK, double[] out) {
        if (grids[i] == null) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        if (states[i] == null) {
            states[i] = grids[i].uniformState(tK);
        }
        try {
            grids[i].solve(tK, states[i], null, 0.0, out);
        } catch (WallSolveException e) {
            states[i] = null;
            throw new SolveFailedException(e.getMessage(), 0, Double.NaN);
        }
        out[0] *= area[i];
        out[1] *= area[i];
    }
}
