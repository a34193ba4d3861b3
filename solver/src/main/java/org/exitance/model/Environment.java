package org.exitance.model;

/**
 * The surroundings of an open enclosure (a shop, a room, deep space): a black surface at a
 * fixed temperature that receives the view-factor remainder {@code 1 − Σ_j F_ij} of every
 * surface. Its area never enters: reciprocity gives {@code A_env F_env,i = A_i F_i,env}.
 *
 * @param name          name used in reports
 * @param temperatureK  temperature in K, zero or more (0 K is a perfect sink)
 */
public record Environment(String name, double temperatureK) {
    public Environment {
        if (!(temperatureK >= 0) || !Double.isFinite(temperatureK)) {
            throw new IllegalArgumentException("environment temperature must be finite and >= 0 K: " + temperatureK);
        }
    }
}
