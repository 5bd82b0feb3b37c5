package org.variset.archive.server;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The PostgreSQL password file, read as PostgreSQL's client library reads it (PostgreSQL 15 documentation, section
 * 34.16, "The Password File"): one {@code hostname:port:database:username:password} per line, {@code *} matching
 * anything in the first four fields, {@code \:} and {@code \\} for a colon or backslash inside a field, lines
 * starting with {@code #} ignored, the first matching line wins. As there, a file that others can read is not used.
 */
final class PasswordFile {

    private PasswordFile() {}

    /** {@code PGPASSFILE} when set, else {@code ~/.pgpass}. */
    static Path location(Map<String, String> env, Path home) {
        String named = env.get("PGPASSFILE");
        if (named != null && !named.isBlank()) {
            return Path.of(named);
        }
        return home == null ? null : home.resolve(".pgpass");
    }

    /**
     * The password of the first line that matches, or null when the file is missing or no line matches.
     *
     * @throws IllegalArgumentException when a line matches but the file is readable by others
     */
    static String lookup(Path file, String host, int port, String database, String user) {
        if (file == null || !Files.isRegularFile(file)) {
            return null;
        }
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            return null;
        }
        for (String line : lines) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            List<String> f = fields(line);
            if (f.size() < 5) {
                continue;
            }
            if (matches(f.get(0), host)
                    && matches(f.get(1), Integer.toString(port))
                    && matches(f.get(2), database)
                    && matches(f.get(3), user)) {
                refuseIfShared(file);
                return f.get(4);
            }
        }
        return null;
    }

    private static boolean matches(String pattern, String value) {
        return pattern.equals("*") || pattern.equals(value);
    }

    /** Splits on unescaped colons; the fifth field keeps any further colons. */
    static List<String> fields(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder b = new StringBuilder();
        boolean escaped = false;
        for (int i = 0; i < line.length(); i++) {
            char ch = line.charAt(i);
            if (escaped) {
                b.append(ch);
                escaped = false;
            } else if (ch == '\\' && i + 1 < line.length()) {
                escaped = true;
            } else if (ch == ':' && out.size() < 4) {
                out.add(b.toString());
                b.setLength(0);
            } else {
                b.append(ch);
            }
        }
        out.add(b.toString());
        return out;
    }

    private static void refuseIfShared(Path file) {
        if (!FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            return;
        }
        try {
            Set<PosixFilePermission> p = Files.getPosixFilePermissions(file);
            if (p.contains(PosixFilePermission.GROUP_READ) || p.contains(PosixFilePermission.OTHERS_READ)) {
                throw new IllegalArgumentException("The PostgreSQL password file " + file + " can be read by other "
                        + "users, so it is not used; make it private with: chmod 600 " + file);
            }
        } catch (IOException e) {
            // A file whose modes cannot be read is used as PostgreSQL's own tools would on such a file system.
        }
    }
}
