package org.variset.archive.server;

import java.net.URI;
import java.net.URISyntaxException;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * A shared archive on a PostgreSQL server, and the credentials to reach it. The address is written as
 * {@code postgresql://[user@]host[:port]/database[?currentSchema=name]} (also with {@code postgres://} or
 * {@code jdbc:postgresql://}). A password is never taken from the address: it comes from {@code PGPASSWORD} or the
 * PostgreSQL password file ({@code PGPASSFILE}, else {@code ~/.pgpass}), as for PostgreSQL's own tools, so that it
 * never shows in a process list, a shell history or a message. The user is the one in the address, else
 * {@code PGUSER}, else the login name.
 *
 * @param host the server's host name
 * @param port its port
 * @param database the database
 * @param schema the schema the archive's tables live in, or null for the server's default search path
 * @param user the database user
 * @param password the password, or null when none is set (trust or peer authentication); never printed
 */
public record ServerAddress(String host, int port, String database, String schema, String user, String password) {

    /** PostgreSQL's port when the address names none. */
    public static final int DEFAULT_PORT = 5432;

    /**
     * Reads an address.
     *
     * @param text the address as the user wrote it
     * @param env the process environment (for {@code PGUSER}, {@code PGPASSWORD}, {@code PGPASSFILE})
     * @param home the user's home folder (for {@code ~/.pgpass})
     * @throws IllegalArgumentException saying what is wrong and how to write it, or that a password was given in it
     */
    public static ServerAddress parse(String text, Map<String, String> env, Path home) {
        String t = text == null ? "" : text.strip();
        String lower = t.toLowerCase(Locale.ROOT);
        String rest;
        if (lower.startsWith("jdbc:postgresql://")) {
            rest = t.substring("jdbc:".length());
        } else if (lower.startsWith("postgresql://")) {
            rest = t;
        } else if (lower.startsWith("postgres://")) {
            rest = "postgresql://" + t.substring("postgres://".length());
        } else {
            throw new IllegalArgumentException("'" + t + "' is not a PostgreSQL address; write it as "
                    + "postgresql://host[:port]/database (for example postgresql://127.0.0.1:5432/variset)");
        }
        URI uri;
        try {
            uri = new URI(rest);
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("Cannot read the PostgreSQL address: " + e.getReason()
                    + "; write it as postgresql://host[:port]/database");
        }
        String host = uri.getHost();
        String path = uri.getPath() == null ? "" : uri.getPath();
        if (host == null || host.isBlank() || path.length() < 2) {
            throw new IllegalArgumentException("The PostgreSQL address must name a host and a database, as in "
                    + "postgresql://host[:port]/database");
        }
        Map<String, String> params = query(uri.getRawQuery());
        String userInfo = uri.getRawUserInfo();
        if ((userInfo != null && userInfo.contains(":")) || params.containsKey("password")) {
            throw new IllegalArgumentException("The PostgreSQL address holds a password; Variset does not take "
                    + "passwords from addresses, which show in process lists and shell histories. Remove it and set "
                    + "PGPASSWORD, or put it in the PostgreSQL password file (~/.pgpass, or the file named by "
                    + "PGPASSFILE).");
        }
        for (String key : params.keySet()) {
            if (!key.equals("currentSchema") && !key.equals("user")) {
                throw new IllegalArgumentException("The PostgreSQL address has the setting '" + key
                        + "', which Variset does not use; the settings it takes are currentSchema and user");
            }
        }
        String user = userInfo != null ? decode(userInfo) : params.get("user");
        if (user == null || user.isBlank()) {
            user = blankToNull(env.get("PGUSER"));
        }
        if (user == null) {
            user = System.getProperty("user.name");
        }
        int port = uri.getPort() < 0 ? DEFAULT_PORT : uri.getPort();
        String database = decode(path.substring(1));
        String schema = blankToNull(params.get("currentSchema"));
        String password = blankToNull(env.get("PGPASSWORD"));
        if (password == null) {
            password = PasswordFile.lookup(PasswordFile.location(env, home), host, port, database, user);
        }
        return new ServerAddress(host, port, database, schema, user, password);
    }

    /**
     * The JDBC URL, without user or password (they are given to the driver apart). {@code reWriteBatchedInserts}
     * lets the driver send a batch of inserts as multi-row statements (pgJDBC documentation, "Connection
     * Parameters"), which is how the bulk writer sends holds.
     */
    public String jdbcUrl() {
        return "jdbc:postgresql://" + hostForUrl() + ":" + port + "/" + database
                + (schema == null ? "" : "?currentSchema=" + schema) + (schema == null ? "?" : "&")
                + "ApplicationName=variset&reWriteBatchedInserts=true";
    }

    /** The address for messages: no password, ever. */
    public String shown() {
        return "postgresql://" + user + "@" + hostForUrl() + ":" + port + "/" + database
                + (schema == null ? "" : "?currentSchema=" + schema);
    }

    /**
     * A folder name that tells this archive from others on this machine: readable, and a digest of the server,
     * database, schema and user so that two archives never share a name.
     */
    public String cacheKey() {
        String canonical = host.toLowerCase(Locale.ROOT) + ":" + port + "/" + database + "?" + schema + "@" + user;
        String readable = (host + "-" + port + "-" + database + (schema == null ? "" : "-" + schema))
                .replaceAll("[^A-Za-z0-9._-]", "_");
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(canonical.getBytes(StandardCharsets.UTF_8));
            return readable + "-" + HexFormat.of().formatHex(d, 0, 6);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java", e);
        }
    }

    @Override
    public String toString() {
        return shown();
    }

    private String hostForUrl() {
        return host.contains(":") && !host.startsWith("[") ? "[" + host + "]" : host;
    }

    private static Map<String, String> query(String raw) {
        Map<String, String> out = new LinkedHashMap<>();
        if (raw == null || raw.isEmpty()) {
            return out;
        }
        for (String pair : raw.split("&")) {
            int eq = pair.indexOf('=');
            String k = decode(eq < 0 ? pair : pair.substring(0, eq));
            out.put(k, eq < 0 ? "" : decode(pair.substring(eq + 1)));
        }
        return out;
    }

    private static String decode(String s) {
        return URLDecoder.decode(s, StandardCharsets.UTF_8);
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s;
    }
}
