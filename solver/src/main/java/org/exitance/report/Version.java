package org.exitance.report;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The program version, from a resource filtered by Maven at build time. */
public final class Version {
    private static final String VERSION = load();

    private Version() {
    }

    public static String get() {
        return VERSION;
    }

    private static String load() {
        try (InputStream in = Version.class.getResourceAsStream("/exitance-version.properties")) {
            if (in == null) {
                return "dev";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "dev");
        } catch (IOException e) {
            return "dev";
        }
    }
}
