package org.exitance.bands;

import java.util.List;
import org.exitance.model.Band;
import org.exitance.model.MemoryBudget;
import org.exitance.network.BandNetwork;
import org.exitance.network.BandState;
import org.exitance.network.NetworkGroup;
import org.exitance.network.RadiositySolver;
import org.exitance.network.WindowCoupling;
import org.exitance.spectral.Planck;

/**
 * The loop over bands at one property update: every band's band-mean ε and τ, its external
 * irradiation and its prepared radiosity network are computed once here; after that each
 * temperature vector costs one band emissive power per surface and band and one solve per band.
 *
 * <p>Band emissive power {@code E_ik = f_k(T_i) σT_i⁴} and its derivative come from the closed
 * series of {@link Planck} (Siegel &amp; Howell, 5th ed., §1.3; Modest, 3rd ed., §1.7).
 */
public final class BandLoop {
    private final List<Band> bands;
    private final double[][] emissivity;
    private final BandNetwork[] networks;
    private final ExternalIrradiation[] external;
    private int maxIterations;
    private double maxRelativeResidual;
    private final int[] bandIterations;

    private BandLoop(List<Band> bands, double[][] emissivity, BandNetwork[] networks, ExternalIrradiation[] external) {
        this.bandIterations = new int[networks.length];
        this.bands = bands;
        this.emissivity = emissivity;
        this.networks = networks;
        this.external = external;
    }

    /**
     * Prepares every band's network at the temperatures of a property update.
     *
     * @param r           the enclosure's arrays (view factors shared, not copied)
     * @param bands       the bands
     * @param emissivity  band-mean ε, [band][surface], as {@link BandProperties#emissivities}; kept, not modified
     * @param t           surface temperatures (K) at which τ and external absorptivities are weighted; not modified
     * @param absorption  how external irradiation is absorbed
     * @param solver      the linear strategy
     */
    public static BandLoop prepare(RadiativeArrays r, List<Band> bands, double[][] emissivity, double[] t,
                                   ExternalAbsorption absorption, RadiositySolver solver) {
        MemoryBudget.require("the radiosity operators of " + bands.size() + " band" + (bands.size() == 1 ? "" : "s")
                + " over " + r.n + " surfaces", MemoryBudget.saturatedProduct(bands.size(), solver.preparedBytes(r.n)));
        double[][] tau = BandProperties.transmissivities(r.enclosure.surfaces(), bands, t);
        BandNetwork[] nets = new BandNetwork[bands.size()];
        ExternalIrradiation[] external = new ExternalIrradiation[bands.size()];
        for (int k = 0; k < nets.length; k++) {
            ExternalIrradiation h = ExternalIrradiation.of(r, bands.get(k), absorption, emissivity[k], tau[k], t);
            external[k] = h;
            nets[k] = new BandNetwork(r.operator, r.viewFactors, r.area, emissivity[k],
                    new WindowCoupling(tau[k], r.otherFace), h.irradiance(), h.leaving(), h.retained(),
                    h.retainedMagnitude(), solver);
        }
        return new BandLoop(List.copyOf(bands), emissivity, nets, external);
    }

    /**
     * Solves every band at temperatures {@code t} (K, not modified).
     *
     * @return one solved state per band, in band order
     */
    public BandState[] solve(double[] t) {
        double[][] e = emissivePowers(t);
        // all bands at once: side by side, or iterating together over one pass of F per iteration
        BandState[] states = NetworkGroup.solve(networks, e);
        for (int k = 0; k < networks.length; k++) {
            maxIterations = Math.max(maxIterations, states[k].iterations());
            bandIterations[k] = Math.max(bandIterations[k], states[k].iterations());
            maxRelativeResidual = Math.max(maxRelativeResidual, states[k].relativeResidual());
        }
        return states;
    }

    /**
     * The net-flux change of the given surfaces in every band for emissive-power changes δE at the
     * loop's fixed properties (one band solve per band, all bands at once; {@link NetworkGroup}).
     *
     * @param delta  δE per band and surface (W/m²), not modified
     * @param rows   the surfaces wanted, not modified
     * @param relax  factor on the conjugate-gradient tolerance of the responses (ignored by LU)
     * @return δq per band, in the order of rows (W/m²)
     */
    public double[][] fluxResponses(double[][] delta, int[] rows, double relax) {
        return NetworkGroup.fluxResponses(networks, delta, rows, relax);
    }

    /**
     * Starts this loop's iterative band solves from the last radiosities of another loop over the
     * same enclosure and bands (the previous property update): they differ only by the property
     * change. Nothing happens when the band counts differ or a band was not solved iteratively.
     *
     * @param previous  the earlier loop (not modified; its arrays are shared read only)
     * @return this loop
     */
    public BandLoop warmStartFrom(BandLoop previous) {
        if (previous != null && previous.networks.length == networks.length) {
            for (int k = 0; k < networks.length; k++) {
                NetworkGroup.warmStart(networks[k], previous.networks[k]);
            }
        }
        return this;
    }

    /** Per band, the most linear-solver iterations of any solve so far (a new array). */
    public int[] iterationsPerBand() {
        return bandIterations.clone();
    }

    /** Band emissive powers E_ik (W/m²), [band][surface], at temperatures t (K, not modified). */
    public double[][] emissivePowers(double[] t) {
        double[][] e = new double[bands.size()][t.length];
        for (int k = 0; k < e.length; k++) {
            Band b = bands.get(k);
            for (int i = 0; i < t.length; i++) {
                e[k][i] = Planck.bandEmissivePower(b.lowerUm(), b.upperUm(), t[i]);
            }
        }
        return e;
    }

    /** dE_ik/dT_i (W/(m²·K)), [band][surface], at temperatures t (K, not modified). */
    public double[][] emissivePowerDerivatives(double[] t) {
        double[][] d = new double[bands.size()][t.length];
        for (int k = 0; k < d.length; k++) {
            for (int i = 0; i < t.length; i++) {
                d[k][i] = BandProperties.emissivePowerDerivative(bands.get(k), t[i]);
            }
        }
        return d;
    }

    /** The bands. */
    public List<Band> bands() {
        return bands;
    }

    /** Band-mean ε, [band][surface]; shared, do not modify. */
    public double[][] emissivity() {
        return emissivity;
    }

    /** The prepared network of band k. */
    public BandNetwork network(int k) {
        return networks[k];
    }

    /** The external irradiation of band k, as its network uses it. */
    public ExternalIrradiation external(int k) {
        return external[k];
    }

    /** Most linear-solver iterations of any band solve so far. */
    public int maxIterations() {
        return maxIterations;
    }

    /** Largest relative linear residual of any band solve so far. */
    public double maxRelativeResidual() {
        return maxRelativeResidual;
    }
}
