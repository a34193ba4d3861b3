package org.exitance.thermal;

/**
 * Heat that leaves a surface by paths outside the radiation network, each a function of that
 * surface's own temperature: the conduction into a wall behind it (its cells eliminated, so only
 * the surface's diagonal of the Jacobian changes) and, in a time step, the heat its node stores.
 * It enters the balance of nodes whose condition counts every path (dissipation, adiabatic).
 */
public interface SurfacePaths {
    /**
     * @param surface  the surface index in the enclosure
     * @param tK       its temperature (K)
     * @param out      modified: out[0] the heat leaving (W), out[1] its derivative d/dT (W/K)
     */
    void heat(int surface, double tK, double[] out);

    /** No such paths. */
    SurfacePaths NONE = (surface, tK, out) -> {
        out[0] = 0;
        out[1] = 0;
    };
}
