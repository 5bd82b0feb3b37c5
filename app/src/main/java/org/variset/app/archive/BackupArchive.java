package org.variset.app.archive;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.Duration;
import org.variset.archive.backup.ArchiveBackup;
import org.variset.archive.backup.ArchiveRestore;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Archive;

/** Backs an embedded archive up to a file, and restores one from such a file. */
public final class BackupArchive {
    private BackupArchive() {}

    /**
     * A backup's manifest, as written or as restored.
     *
     * @param file the backup file
     * @param routes routes in it
     * @param holds holds in it
     * @param gyms gyms in it
     * @param schemaVersion the schema version of its database
     * @param sha256 the SHA-256 of its database
     * @param created when the backup was made
     * @param replaced for a restore, true when an archive that was there was replaced
     */
    public record Result(
            Path file,
            long routes,
            long holds,
            long gyms,
            int schemaVersion,
            String sha256,
            String created,
            boolean replaced) {

        static Result of(Path file, JsonNode m, boolean replaced) {
            JsonNode c = m.get("counts");
            return new Result(
                    file,
                    c.get("routes").asLong(),
                    c.get("holds").asLong(),
                    c.get("gyms").asLong(),
                    m.get("schema_version").asInt(),
                    m.at("/database/sha256").asText(),
                    m.get("created").asText(),
                    replaced);
        }
    }

    /**
     * Writes a consistent backup, waiting up to {@code wait} for another process using the archive.
     *
     * @throws InputException for a shared archive (its server keeps it), or a file in the way without {@code force}
     */
    public static Result backup(ArchiveLocation where, Path file, boolean force, Duration wait) {
        try (Archive archive = Archive.open(embedded(where, "a backup"), wait)) {
            return Result.of(file, ArchiveBackup.write(archive, file, force), false);
        }
    }

    /**
     * Restores a backup in place of the archive, checked before anything is replaced.
     *
     * @throws InputException for a shared archive, or an archive there without {@code force}
     */
    public static Result restore(ArchiveLocation where, Path file, boolean force) {
        ArchiveRestore.Result r = ArchiveRestore.restore(file, embedded(where, "a restore"), force);
        return Result.of(file, r.manifest(), r.replaced());
    }

    private static Path embedded(ArchiveLocation where, String what) {
        if (where.shared()) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    what + " works on an embedded archive, and this one is shared on " + where.shown(),
                    Remedy.of(Remedy.Kind.USE_SERVER_TOOLS));
        }
        return where.dir();
    }
}
