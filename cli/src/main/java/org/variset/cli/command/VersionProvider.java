package org.variset.cli.command;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** Reads the version written into the jar at build time. */
public final class VersionProvider implements IVersionProvider {

    /** The version of this build, or {@code unknown} when run from unpackaged classes without resources. */
    public static String version() {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("/org/variset/cli/version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            return "unknown";
        }
        return p.getProperty("version", "unknown");
    }

    @Override
    public String[] getVersion() {
        return new String[] {"variset " + version(), "Java " + System.getProperty("java.version")};
    }
}
