package org.exitance.timeline;

import org.exitance.conduction.HeatCapacity;
import org.exitance.conduction.WallGrid;
import org.exitance.thermal.SurfacePaths;

/**
 * The extra heat paths of one implicit time step (BDF of order 1 or 2 in the form
 * {@code E(T) − β = γ h · (heat in)}, Hairer and Wanner, Solving Ordinary Differential Equations II,
 * 2nd ed., §III.1 and §V.1): each node's storage {@code r (E(T) − β_E)} with r = 1/(γh) and its
 * energy E counted by its heat capacity, and its wall solved for the new surface temperature with
 * the same r ({@link WallGrid#solve}), the cells eliminated. A rate of +∞ holds every wall's cells
 * (the start: the surface then sees a wall whose cells have not yet moved).
 */
final class StepPaths implements SurfacePaths {
    private final HeatCapacity[] capacity;
    private final WallGrid[] grids;
    private final double[] area;
    private final double rate;
    private final double[] betaEnergy;
    private final double[][] betaCells;
    private final double[][] work;
    private final double[] scratch = new double[2];

    /**
     * @param capacity    per surface, its node's heat capacity or null; not modified
     * @param grids       per surface, its wall's grid or null; not modified
     * @param area        per surface (m²); not modified
     * @param rate        r (1/s), or +∞ for walls held
     * @param betaEnergy  per surface β_E (J); not modified
     * @param betaCells   per surface β of its wall's cells (K), or null; not modified
     * @param work        per surface its wall's state (K), the start of the wall solve; modified: the
     *                    solution at the last temperature asked
     */
    StepPaths(HeatCapacity[] capacity, WallGrid[] grids, double[] area, double rate, double[] betaEnergy,
              double[][] betaCells, double[][] work) {
        this.capacity = capacity;
        this.grids = grids;
        this.area = area;
        this.rate = rate;
        this.betaEnergy = betaEnergy;
        this.betaCells = betaCells;
        this.work = work;
    }

    @Override
    public void heat(int i, double tK, double[] out) {
        out[0] = 0;
        out[1] = 0;
        if (capacity[i] != null && Double.isFinite(rate)) {
            out[0] += rate * (capacity[i].energyJ(tK) - betaEnergy[i]);
            out[1] += rate * capacity[i].jPerK(tK);
        }
        if (grids[i] != null) {
            if (Double.isFinite(rate)) {
                grids[i].solve(tK, work[i], betaCells[i], rate, scratch);
            } else {
                grids[i].frozenFlux(tK, work[i], scratch);
            }
            out[0] += area[i] * scratch[0];
            out[1] += area[i] * scratch[1];
        }
    }
}
