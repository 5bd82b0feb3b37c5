package org.variset.archive.backup;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.HexFormat;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.file.AtomicFile;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveFolder;
import org.variset.archive.store.ArchiveStats;

/**
 * Backups of an archive: one zip holding the database as H2's online backup made it and a manifest
 * ({@code variset-backup.json}: format, schema version, change stamp, counts, and the SHA-256 of the database). The
 * search index is derived data and is not in it; the first search after a restore builds it again.
 */
public final class ArchiveBackup {
    /** The manifest's entry name. */
    static final String MANIFEST = "variset-backup.json";
    /** The database's entry name. */
    static final String DATABASE = ArchiveFolder.DATABASE_FILE;

    private static final String FORMAT = "variset-backup";
    private static final ObjectMapper JSON = new ObjectMapper();

    private ArchiveBackup() {}

    /**
     * Writes a backup of an open archive (this process holds its lock, so no other process writes meanwhile).
     *
     * @param replace whether an existing file may be replaced
     * @return the manifest written
     */
    public static JsonNode write(Archive archive, Path target, boolean replace) {
        Path tmpZip = null;
        try {
            tmpZip = Files.createTempFile(target.toAbsolutePath().getParent(), ".variset-h2-", ".zip");
            Files.delete(tmpZip);
            try (Statement s = archive.connection().createStatement()) {
                s.execute("BACKUP TO '" + tmpZip.toString().replace("'", "''") + "'");
            }
            ObjectNode manifest = manifest(archive);
            Path h2 = tmpZip;
            AtomicFile.write(target, replace, out -> repack(h2, manifest, out));
            return manifest;
        } catch (IOException | SQLException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot back up the archive to " + target + ": " + e.getMessage(),
                    e);
        } finally {
            deleteQuietly(tmpZip);
        }
    }

    private static ObjectNode manifest(Archive archive) {
        ArchiveStats s = archive.stats();
        ObjectNode m = JSON.createObjectNode()
                .put("format", FORMAT)
                .put("format_version", 1)
                .put("created", Instant.now().toString())
                .put("schema_version", s.schemaVersion())
                .put("change_stamp", ChangeLog.stamp(archive.connection()));
        m.putObject("counts")
                .put("gyms", s.gyms())
                .put("walls", s.walls())
                .put("resets", s.resets())
                .put("routes", s.routes())
                .put("holds", s.holds())
                .put("setters", s.setters());
        return m;
    }

    /** Our zip: the manifest (with the database's checksum), then the database. */
    private static void repack(Path h2Zip, ObjectNode manifest, OutputStream out) throws IOException {
        MessageDigest sha = sha256();
        long bytes = 0;
        try (ZipFile z = new ZipFile(h2Zip.toFile())) {
            ZipEntry db = z.getEntry(DATABASE);
            if (db == null) {
                throw new IOException("H2's backup holds no " + DATABASE);
            }
            try (InputStream in = new DigestInputStream(z.getInputStream(db), sha)) {
                bytes = in.transferTo(OutputStream.nullOutputStream());
            }
            manifest.putObject("database")
                    .put("entry", DATABASE)
                    .put("bytes", bytes)
                    .put("sha256", HexFormat.of().formatHex(sha.digest()));
            try (ZipOutputStream zip = new ZipOutputStream(out)) {
                zip.putNextEntry(new ZipEntry(MANIFEST));
                zip.write(JSON.writerWithDefaultPrettyPrinter().writeValueAsBytes(manifest));
                zip.closeEntry();
                zip.putNextEntry(new ZipEntry(DATABASE));
                try (InputStream in = z.getInputStream(db)) {
                    in.transferTo(zip);
                }
                zip.closeEntry();
            }
        }
    }

    /**
     * Reads a backup's manifest and checks its database against it, extracting the database to a file.
     *
     * @throws IllegalArgumentException naming the file and what is wrong with it
     */
    static JsonNode verifyAndExtract(Path backup, Path databaseFile) {
        JsonNode manifest = null;
        boolean sawDatabase = false;
        try (ZipInputStream zip = new ZipInputStream(Files.newInputStream(backup))) {
            for (ZipEntry e; (e = zip.getNextEntry()) != null; ) {
                if (e.getName().equals(MANIFEST)) {
                    manifest = JSON.readTree(zip.readNBytes(1 << 20));
                } else if (e.getName().equals(DATABASE)) {
                    if (manifest == null) {
                        throw bad(backup, "its manifest does not come first");
                    }
                    check(backup, manifest);
                    MessageDigest sha = sha256();
                    long expected = manifest.at("/database/bytes").asLong(-1);
                    long copied;
                    try (OutputStream out = Files.newOutputStream(databaseFile)) {
                        // Never more than the manifest says: a forged entry cannot fill the disk.
                        copied = new DigestInputStream(zip, sha).transferTo(new BoundedOutput(out, expected));
                    }
                    if (copied != expected) {
                        throw bad(backup, "its database is " + copied + " bytes, its manifest says " + expected);
                    }
                    String found = HexFormat.of().formatHex(sha.digest());
                    if (!found.equals(manifest.at("/database/sha256").asText())) {
                        throw bad(backup, "the database's checksum does not match its manifest (the file is damaged)");
                    }
                    sawDatabase = true;
                }
            }
        } catch (IOException | RuntimeException e) {
            if (e instanceof IllegalArgumentException iae) {
                throw iae;
            }
            throw bad(backup, "it cannot be read as a zip file (" + e.getMessage() + ")");
        }
        if (manifest == null) {
            throw bad(backup, "it holds no " + MANIFEST);
        }
        if (!sawDatabase) {
            throw bad(backup, "it holds no database (" + DATABASE + "): it is incomplete");
        }
        return manifest;
    }

    private static void check(Path backup, JsonNode m) {
        if (!FORMAT.equals(m.path("format").asText())) {
            throw bad(backup, "its manifest is not one Variset wrote");
        }
        int schema = m.path("schema_version").asInt(-1);
        if (schema > SchemaVersion.LATEST) {
            throw bad(
                    backup,
                    "it was made with a newer Variset (schema version " + schema + "; this one knows "
                            + SchemaVersion.LATEST + "): restore it with that version");
        }
        if (schema < 1 || !m.at("/database/sha256").isTextual()) {
            throw bad(backup, "its manifest is incomplete");
        }
    }

    /** Passes bytes on up to a limit, then fails. */
    private static final class BoundedOutput extends java.io.FilterOutputStream {
        private long left;

        BoundedOutput(OutputStream out, long limit) {
            super(out);
            this.left = limit;
        }

        @Override
        public void write(int b) throws IOException {
            write(new byte[] {(byte) b}, 0, 1);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            if (len > left) {
                throw new IOException("the database entry is larger than its manifest says");
            }
            left -= len;
            out.write(b, off, len);
        }
    }

    static IllegalArgumentException bad(Path backup, String why) {
        return new IllegalArgumentException(backup + " is not a backup Variset can restore: " + why + ".");
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("this Java has no SHA-256", e);
        }
    }

    static void deleteQuietly(Path p) {
        if (p == null) {
            return;
        }
        try {
            Files.deleteIfExists(p);
        } catch (IOException ignored) {
            // A leftover temporary file is hidden and named as such; it harms nothing.
        }
    }
}
