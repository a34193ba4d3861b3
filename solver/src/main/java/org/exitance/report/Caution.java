package org.exitance.report;

/** The caution every report carries. */
public final class Caution {
    /** One paragraph for text output. */
    public static final String SHORT = "Caution: engineering estimate from an idealized model (diffuse, isothermal"
            + " surfaces; band-mean properties). Check it against test data and margins; furnace, hot-surface and"
            + " flight-hardware decisions rest with local codes, standards and licensed practice.";

    private Caution() {
    }
}
