package org.exitance.conduction;

/**
 * One layer of a wall, from the inner face outwards.
 *
 * @param thicknessM            thickness (m), positive
 * @param conductivity          thermal conductivity k(T) (W/(m·K))
 * @param densityKgPerM3        density (kg/m³), positive
 * @param specificHeatJPerKgK   specific heat (J/(kg·K)), positive, constant
 * @param cells                 finite-volume cells through the layer, or 0 for the rule of {@link WallGrid}
 */
public record Layer(double thicknessM, PropertyTable conductivity, double densityKgPerM3,
                    double specificHeatJPerKgK, int cells) {
    public Layer {
        if (!(thicknessM > 0) || !(densityKgPerM3 > 0) || !(specificHeatJPerKgK > 0) || cells < 0) {
            throw new IllegalArgumentException("a layer needs positive thickness, density and specific heat");
        }
    }

    /** Thermal diffusivity k/(ρc) at temperature t (m²/s). */
    public double diffusivityM2PerS(double t) {
        return conductivity.at(t) / (densityKgPerM3 * specificHeatJPerKgK);
    }
}
