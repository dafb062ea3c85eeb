package org.beamfolio.results;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The tool's version, from the build. */
public final class Version {
    private static final String VERSION = load();

    private Version() {}

    public static String get() {
        return VERSION;
    }

    private static String load() {
        Properties p = new Properties();
        try (InputStream in = Version.class.getResourceAsStream("/org/beamfolio/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return p.getProperty("version", "unknown");
    }
}
