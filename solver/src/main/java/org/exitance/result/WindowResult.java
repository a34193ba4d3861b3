package org.exitance.result;

/**
 * A window after a solve: one thermal node with two faces. Each face is also reported as a
 * surface with its own net heat; the totals here are the window's.
 *
 * @param face           the face that carries the window's boundary condition
 * @param otherFace      the other face
 * @param temperatureK   the window's temperature (both faces), K
 * @param netHeatW       net radiative heat leaving both faces together (W): emitted minus absorbed
 * @param heatSuppliedW  heat that must be supplied to hold the window in this state: radiation,
 *                       convection and conduction of both faces (W)
 */
public record WindowResult(String face, String otherFace, double temperatureK, double netHeatW,
                           double heatSuppliedW) {
}
