package org.variset.archive.location;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Properties;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.server.ServerAddress;

/**
 * Where the archive lives, and why there: an embedded archive in a folder, or a shared one on a PostgreSQL server.
 * Precedence (README, "Where the archive lives"), first found wins:
 * <ol>
 * <li>a folder or a server address given for this run (the command line's {@code --archive} or {@code --db}; not
 * both);</li>
 * <li>the environment variables {@code VARISET_DB} or {@code VARISET_ARCHIVE} (not both);</li>
 * <li>the configuration file {@code $XDG_CONFIG_HOME/variset/variset.properties} (else
 * {@code ~/.config/variset/variset.properties}), key {@code db} or {@code archive};</li>
 * <li>{@code $XDG_DATA_HOME/variset}, else {@code ~/.local/share/variset}.</li>
 * </ol>
 * A shared archive's search index is this client's own, in {@code $XDG_CACHE_HOME/variset/} (else
 * {@code ~/.cache/variset/}), in a folder named after the server and database ({@code .../KEY/index}).
 *
 * @param dir the archive folder, absolute; null for a shared archive
 * @param server the shared archive's server; null for an embedded archive
 * @param indexDir the folder of the search index (the archive folder's {@code index}, or this client's cache)
 * @param origin how it was chosen, for messages
 */
public record ArchiveLocation(Path dir, ServerAddress server, Path indexDir, Origin origin) {

    /**
     * How a location was chosen.
     *
     * @param kind which level of the precedence named it
     * @param name the environment variable or configuration file that did, or empty
     */
    public record Origin(Kind kind, String name) {
        /** The levels of the precedence, first first. */
        public enum Kind {
            /** Given for this run by the front end (the command line's option). */
            GIVEN,
            /** An environment variable. */
            ENVIRONMENT,
            /** The configuration file. */
            CONFIG_FILE,
            /** {@code $XDG_DATA_HOME/variset}. */
            XDG_DATA_HOME,
            /** {@code ~/.local/share/variset}. */
            DEFAULT
        }

        /** The origin in plain words ("the environment variable VARISET_DB"); a front end may say GIVEN its own way. */
        public String describe() {
            return switch (kind) {
                case GIVEN -> "given for this run";
                case ENVIRONMENT -> "the environment variable " + name;
                case CONFIG_FILE -> "the configuration file " + name;
                case XDG_DATA_HOME -> "XDG_DATA_HOME";
                case DEFAULT -> "the default location";
            };
        }
    }

    /** The environment variable that names the archive folder. */
    public static final String ENV = "VARISET_ARCHIVE";
    /** The environment variable that names a shared archive's server. */
    public static final String DB_ENV = "VARISET_DB";
    /** The configuration file's name, in {@code $XDG_CONFIG_HOME/variset/}. */
    public static final String CONFIG_FILE = "variset.properties";

    /** An embedded archive in a folder. */
    public static ArchiveLocation embedded(Path dir, Origin origin) {
        Path d = dir.toAbsolutePath().normalize();
        return new ArchiveLocation(d, null, d.resolve("index"), origin);
    }

    /** An embedded archive in a folder given for this run. */
    public static ArchiveLocation embedded(Path dir) {
        return embedded(dir, new Origin(Origin.Kind.GIVEN, ""));
    }

    /**
     * The folder of this client's own files for a shared archive (its search index and the lock that keeps two
     * processes of this client from using it at once), or null for an embedded archive.
     */
    public Path clientDir() {
        return server == null ? null : indexDir.getParent();
    }

    /** True for a shared archive on a PostgreSQL server. */
    public boolean shared() {
        return server != null;
    }

    /** The archive for messages: its folder, or its server's address (never a password). */
    public String shown() {
        return server != null ? server.shown() : dir.toString();
    }

    /** Resolves an embedded archive's folder from the one given (or null), the environment and the defaults. */
    public static ArchiveLocation resolve(Path givenDir, Map<String, String> env, Path home) {
        return resolve(givenDir, null, env, home);
    }

    /**
     * Resolves where the archive lives.
     *
     * @param givenDir an embedded archive's folder given for this run, or null
     * @param givenServer a shared archive's address given for this run, or null
     * @param env the process environment
     * @param home the user's home folder
     * @throws IllegalArgumentException when both kinds are given at one level, a configuration file cannot be read,
     *     or a server address is malformed
     */
    public static ArchiveLocation resolve(Path givenDir, String givenServer, Map<String, String> env, Path home) {
        if (givenDir != null && givenServer != null) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    "both an embedded archive (a folder) and a shared one (a PostgreSQL server) were named",
                    Remedy.of(Remedy.Kind.CHOOSE_LOCATION, "level", "given"));
        }
        Origin given = new Origin(Origin.Kind.GIVEN, "");
        if (givenServer != null) {
            return server(givenServer, given, env, home);
        }
        if (givenDir != null) {
            return embedded(givenDir, given);
        }
        String db = blankToNull(env.get(DB_ENV));
        String dir = blankToNull(env.get(ENV));
        if (db != null && dir != null) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    "both " + DB_ENV + " and " + ENV + " are set; unset one of them",
                    Remedy.of(Remedy.Kind.CHOOSE_LOCATION, "level", "environment"));
        }
        if (db != null) {
            return server(db, new Origin(Origin.Kind.ENVIRONMENT, DB_ENV), env, home);
        }
        if (dir != null) {
            return embedded(Path.of(dir), new Origin(Origin.Kind.ENVIRONMENT, ENV));
        }
        Path config = configFile(env, home);
        if (config != null && Files.isRegularFile(config)) {
            Properties p = new Properties();
            try (Reader r = Files.newBufferedReader(config, StandardCharsets.UTF_8)) {
                p.load(r);
            } catch (IOException | IllegalArgumentException e) {
                throw new IllegalArgumentException(
                        "Cannot read the configuration file " + config + ": " + e.getMessage());
            }
            String cdb = blankToNull(p.getProperty("db"));
            String cdir = blankToNull(p.getProperty("archive"));
            if (cdb != null && cdir != null) {
                throw new IllegalArgumentException(
                        "The configuration file " + config + " sets both 'db' and " + "'archive'; keep one of them");
            }
            Origin file = new Origin(Origin.Kind.CONFIG_FILE, config.toString());
            if (cdb != null) {
                return server(cdb, file, env, home);
            }
            if (cdir != null) {
                return embedded(Path.of(cdir), file);
            }
        }
        String xdg = env.get("XDG_DATA_HOME");
        if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return embedded(Path.of(xdg, "variset"), new Origin(Origin.Kind.XDG_DATA_HOME, "XDG_DATA_HOME"));
        }
        return embedded(home.resolve(".local/share/variset"), new Origin(Origin.Kind.DEFAULT, ""));
    }

    private static ArchiveLocation server(String url, Origin origin, Map<String, String> env, Path home) {
        ServerAddress a;
        try {
            a = ServerAddress.parse(url, env, home);
        } catch (IllegalArgumentException e) {
            throw origin.kind() == Origin.Kind.GIVEN
                    ? e
                    : new IllegalArgumentException(
                            e.getMessage() + " (the address came from " + origin.describe() + ")");
        }
        return new ArchiveLocation(
                null, a, cacheHome(env, home).resolve(a.cacheKey()).resolve("index"), origin);
    }

    /** {@code $XDG_CONFIG_HOME/variset/variset.properties}, else {@code ~/.config/variset/variset.properties}. */
    static Path configFile(Map<String, String> env, Path home) {
        String xdg = env.get("XDG_CONFIG_HOME");
        if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return Path.of(xdg, "variset", CONFIG_FILE);
        }
        return home == null ? null : home.resolve(".config/variset").resolve(CONFIG_FILE);
    }

    /** {@code $XDG_CACHE_HOME/variset}, else {@code ~/.cache/variset}. */
    static Path cacheHome(Map<String, String> env, Path home) {
        String xdg = env.get("XDG_CACHE_HOME");
        if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return Path.of(xdg, "variset");
        }
        return home.resolve(".cache/variset").toAbsolutePath().normalize();
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
