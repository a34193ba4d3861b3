package org.exitance.network;

/**
 * The solved state of one band. Arrays are per surface, in W/m²; callers must not modify them.
 *
 * @param radiosity             J_i
 * @param irradiation           G_i
 * @param netFlux               q_i = J_i − G_i, positive when surface i loses energy
 * @param throughput            the sum of the magnitudes of the terms of q_i: emitted, absorbed or
 *                              transmitted, and external (W/m²); the scale of q_i's heat test
 * @param iterations            linear-solver iterations (1 for direct)
 * @param relativeResidual      linear-solver relative residual
 */
public record BandState(double[] radiosity, double[] irradiation, double[] netFlux, double[] throughput,
                        int iterations, double relativeResidual) {
}
