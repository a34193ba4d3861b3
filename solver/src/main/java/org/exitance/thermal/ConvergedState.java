package org.exitance.thermal;

import java.util.List;
import org.ejml.data.DMatrixRMaj;
import org.exitance.bands.BandLoop;
import org.exitance.model.Band;
import org.exitance.network.BandNetwork;
import org.exitance.network.BandState;
import org.exitance.result.SolveResult;

/**
 * The converged state of a solve, kept for linearisations around it (sensitivities): the band
 * networks with their properties, the solved band states, the temperatures, and the Jacobian of
 * the node heat balances. Indices are surfaces of the enclosure; "nodes" are the unknown
 * temperatures (a surface, or a window's two faces).
 */
public final class ConvergedState {
    private final Problem p;
    private final BandLoop loop;
    private final BandState[] states;
    private final double[] t;
    private final SolveResult result;

    ConvergedState(Problem p, BandLoop loop, BandState[] states, double[] t, SolveResult result) {
        this.p = p;
        this.loop = loop;
        this.states = states;
        this.t = t;
        this.result = result;
    }

    /** The result of the solve (per surface of the enclosure). */
    public SolveResult result() {
        return result;
    }

    /** The bands. */
    public List<Band> bands() {
        return loop.bands();
    }

    /** Number of surfaces N. */
    public int size() {
        return t.length;
    }

    /** Area of surface i (m²). */
    public double areaM2(int i) {
        return p.area[i];
    }

    /** The surfaces carrying the unknown temperatures, one per node (a new array). */
    public int[] unknownSurfaces() {
        return p.unknown.clone();
    }

    /** The faces of unknown node a: the surface alone, or a window's two faces (a new array). */
    public int[] faces(int a) {
        return p.faces[a].clone();
    }

    /** The prepared network of band k. */
    public BandNetwork network(int k) {
        return loop.network(k);
    }

    /** The solved state of band k. */
    public BandState state(int k) {
        return states[k];
    }

    /** Band emissive powers at the converged temperatures (W/m²), [band][surface]; a new array. */
    public double[][] emissivePowers() {
        return loop.emissivePowers(t);
    }

    /** Their temperature derivatives (W/(m²·K)), [band][surface]; a new array. */
    public double[][] emissivePowerDerivatives() {
        return loop.emissivePowerDerivatives(t);
    }

    /** ∂q_i/∂E_v per band and unknown node v (dimensionless), [band][node][surface]; a new array. */
    public double[][][] nodeSensitivities() {
        return Jacobian.nodeSensitivities(p, loop);
    }

    /**
     * The Jacobian ∂R_a/∂T_b (W/K) of the unknown nodes' heat balances at the converged state.
     *
     * @param sens  {@link #nodeSensitivities()}; not modified
     */
    public DMatrixRMaj jacobian(double[][][] sens) {
        return Jacobian.of(p, sens, emissivePowerDerivatives(), p.pathDerivativesWPerK(t));
    }
}
