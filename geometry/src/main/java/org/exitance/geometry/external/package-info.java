/**
 * External irradiation geometry: per-facet and per-surface incidence factors in [0, 1] for a
 * collimated source ({@link org.exitance.geometry.external.CollimatedIncidence}, with shadows by
 * ray casting) and the diffuse view factor to a planet
 * ({@link org.exitance.geometry.external.PlanetViewFactor}, closed forms for a differential planar
 * element to a sphere). The solver multiplies a factor by the source irradiance (W/m²) to get the
 * irradiation of a surface. Results are collected in
 * {@link org.exitance.geometry.external.IncidenceResult}. See docs/view-factors.md, section
 * "External irradiation geometry".
 */
package org.exitance.geometry.external;
