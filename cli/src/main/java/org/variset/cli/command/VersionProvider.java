package org.variset.cli.command;

import org.variset.app.VarisetVersion;
import picocli.CommandLine.IVersionProvider;

/** The version picocli prints for {@code --version}. */
public final class VersionProvider implements IVersionProvider {

    /** The version of this build, or {@code unknown} when run from classes without their resources. */
    public static String version() {
        return VarisetVersion.current();
    }

    @Override
    public String[] getVersion() {
        return new String[] {"variset " + version(), "Java " + System.getProperty("java.version")};
    }
}
