package org.shapetrail.store;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** This build's version, as the pom states it (a resource Maven fills in). */
public final class AppVersion {
    private static final String VERSION = read();

    private AppVersion() {
    }

    /** e.g. "0.1.0". */
    public static String current() {
        return VERSION;
    }

    /** "Shapetrail 0.1.0": what {@code --version} prints and what a file records as its writer. */
    public static String named() {
        return "Shapetrail " + VERSION;
    }

    private static String read() {
        try (InputStream in = AppVersion.class.getResourceAsStream("version.properties")) {
            if (in == null) {
                throw new IllegalStateException("version.properties is missing from this build");
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "");
            if (v.isBlank() || v.contains("${")) {
                throw new IllegalStateException("version.properties was not filled in by the build: " + v);
            }
            return v.strip();
        } catch (IOException e) {
            throw new IllegalStateException("version.properties cannot be read", e);
        }
    }
}
