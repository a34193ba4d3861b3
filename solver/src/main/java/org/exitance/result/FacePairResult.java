package org.exitance.result;

/**
 * One thermal node with two faces after a solve: a window (semi-transparent: what one face
 * receives and transmits leaves the other) or a two-sided opaque plate (a shield, a fin, a shelf:
 * each face with its own coating, seeing its own side). Each face is also reported as a surface
 * with its own net heat; the totals here are the node's.
 *
 * @param face           the face that carries the node's boundary condition
 * @param otherFace      the other face
 * @param window         true for a window, false for a two-sided opaque plate
 * @param temperatureK   the node's temperature (both faces), K
 * @param netHeatW       net radiative heat leaving both faces together (W): emitted minus absorbed
 * @param heatSuppliedW  heat that must be supplied to hold the node in this state: radiation,
 *                       convection and conduction of both faces (W)
 */
public record FacePairResult(String face, String otherFace, boolean window, double temperatureK, double netHeatW,
                             double heatSuppliedW) {
}
