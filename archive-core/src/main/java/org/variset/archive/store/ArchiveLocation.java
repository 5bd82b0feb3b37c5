package org.variset.archive.store;

import java.nio.file.Path;
import java.util.Map;

/**
 * Where the archive lives, and why there. Precedence (README, "Where the archive lives"):
 * the {@code --archive DIR} option, else the environment variable {@code VARISET_ARCHIVE}, else
 * {@code $XDG_DATA_HOME/variset}, else {@code ~/.local/share/variset}.
 *
 * @param dir the archive folder, absolute
 * @param source how it was chosen, for messages ({@code --archive}, {@code VARISET_ARCHIVE}, ...)
 */
public record ArchiveLocation(Path dir, String source) {

    /** The environment variable that names the archive folder. */
    public static final String ENV = "VARISET_ARCHIVE";

    /**
     * Resolves the archive folder.
     *
     * @param option the {@code --archive} value, or null
     * @param env the process environment
     * @param home the user's home folder
     */
    public static ArchiveLocation resolve(Path option, Map<String, String> env, Path home) {
        if (option != null) {
            return new ArchiveLocation(option.toAbsolutePath().normalize(), "--archive");
        }
        String fromEnv = env.get(ENV);
        if (fromEnv != null && !fromEnv.isBlank()) {
            return new ArchiveLocation(Path.of(fromEnv).toAbsolutePath().normalize(), ENV);
        }
        String xdg = env.get("XDG_DATA_HOME");
        if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return new ArchiveLocation(Path.of(xdg, "variset").normalize(), "XDG_DATA_HOME");
        }
        return new ArchiveLocation(home.resolve(".local/share/variset").toAbsolutePath().normalize(),
                "the default location");
    }
}
