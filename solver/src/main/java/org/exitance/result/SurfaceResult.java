package org.exitance.result;

/**
 * The solved state of one surface. Net heat is the net radiative power leaving the surface
 * (W), positive when it loses heat by radiation.
 *
 * @param name               surface name
 * @param areaM2             area (m²)
 * @param boundary           label of its boundary condition
 * @param temperatureK       temperature (K), given or solved
 * @param temperatureSolved  true where the temperature was an unknown
 * @param netHeatW           net radiative heat leaving (W)
 * @param netFluxWPerM2      net radiative flux leaving (W/m²)
 * @param bandNetHeatW       net heat per band (W); do not modify
 * @param bandEmissivity     band-mean emissivity per band at the solved temperature; do not modify
 * @param convectionW        heat leaving by convection to its fluid (W); 0 without convection
 * @param conductionW        heat leaving through conductive links (W); 0 without links
 * @param wallW              heat leaving into the wall behind the surface (W), 0 without a wall; in a
 *                           time step also the heat its node stores
 * @param heatSuppliedW      heat that must be supplied from outside the model to hold this state:
 *                           radiation + convection + conduction + wall (W)
 * @param bandIncidentW      radiation arriving on the surface per band, A·G_k (W); do not modify
 * @param bandRadiosityWPerM2 radiosity per band, J_k (W/m²), as the band solve returned it; for a
 *                           surface reported from facets the area-weighted mean of the facets'; do
 *                           not modify
 */
public record SurfaceResult(String name, double areaM2, String boundary, double temperatureK,
                            boolean temperatureSolved, double netHeatW, double netFluxWPerM2,
                            double[] bandNetHeatW, double[] bandEmissivity, double convectionW,
                            double conductionW, double wallW, double heatSuppliedW, double[] bandIncidentW,
                            double[] bandRadiosityWPerM2) {
}
