package org.exitance.result;

/**
 * What an external source delivered in a solve.
 *
 * @param name        source name
 * @param spectrum    label of its spectrum
 * @param incidentW   power arriving on all surfaces (W)
 * @param absorbedW   the part absorbed where it first arrives (W); the rest is reflected into the enclosure
 */
public record SourceResult(String name, String spectrum, double incidentW, double absorbedW) {
}
