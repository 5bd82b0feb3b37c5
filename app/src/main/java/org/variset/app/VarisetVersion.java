package org.variset.app;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The version of this build, written into the jar at build time. */
public final class VarisetVersion {
    private VarisetVersion() {}

    /** The version, or {@code unknown} when run from classes without their resources. */
    public static String current() {
        Properties p = new Properties();
        try (InputStream in = VarisetVersion.class.getResourceAsStream("/org/variset/app/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return p.getProperty("version", "unknown");
    }
}
