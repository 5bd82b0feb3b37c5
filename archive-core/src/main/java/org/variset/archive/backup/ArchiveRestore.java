package org.variset.archive.backup;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.stream.Stream;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveFolder;
import org.variset.archive.store.ArchiveLock;
import org.variset.archive.store.ArchiveStats;

/**
 * Restores an archive from a backup, never half-way: the backup is checked against its manifest, extracted into a
 * new folder beside the archive, opened and counted there; only then does that folder take the archive's place, by
 * renaming folders. A failure at any step leaves the archive as it was.
 */
public final class ArchiveRestore {
    private ArchiveRestore() {}

    /**
     * What a restore did.
     *
     * @param manifest the backup's manifest
     * @param replaced whether an archive was there before (and was replaced)
     */
    public record Result(JsonNode manifest, boolean replaced) {}

    /**
     * Restores a backup into an archive folder.
     *
     * @param replace whether an archive already in the folder may be replaced
     * @throws IllegalArgumentException for a file that is not a sound Variset backup, or an archive there without
     *     {@code replace}
     * @throws ArchiveException when the archive there is in use, or the folders cannot be swapped
     */
    public static Result restore(Path backup, Path dir, boolean replace) {
        Path target = dir.toAbsolutePath().normalize();
        boolean exists = Archive.existsAt(target);
        if (exists && !replace) {
            throw new InputException(
                    InputException.Reason.EXISTS,
                    "there is an archive at " + target + " already, and restoring replaces it with the backup",
                    Remedy.of(Remedy.Kind.REPLACE_EXISTING, "file", target.toString()));
        }
        if (!Files.isRegularFile(backup)) {
            throw new IllegalArgumentException("no backup file at " + backup);
        }
        ArchiveLock lock = exists ? ArchiveLock.acquire(target, ArchiveLock.DEFAULT_WAIT) : null;
        Path fresh = target.resolveSibling("." + target.getFileName() + ".restoring-" + System.nanoTime());
        try {
            ArchiveFolder.createPrivate(fresh);
            JsonNode manifest = ArchiveBackup.verifyAndExtract(backup, fresh.resolve(ArchiveBackup.DATABASE));
            ArchiveFolder.restrictToOwner(fresh.resolve(ArchiveBackup.DATABASE));
            verifyOpens(backup, fresh, manifest);
            swap(fresh, target, exists);
            return new Result(manifest, exists);
        } catch (IOException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED,
                    "Cannot restore into " + target + ": " + e.getMessage() + ". The archive there is unchanged.",
                    e);
        } finally {
            deleteTree(fresh);
            if (lock != null) {
                lock.close();
            }
        }
    }

    /** Opens the restored database (migrating it if the backup is older) and checks its counts against the manifest. */
    private static void verifyOpens(Path backup, Path fresh, JsonNode manifest) {
        ArchiveStats s;
        try (Archive a = Archive.open(fresh)) {
            s = a.stats();
        } catch (ArchiveException e) {
            throw ArchiveBackup.bad(backup, "its database does not open (" + e.getMessage() + ")");
        }
        JsonNode c = manifest.get("counts");
        long[] expected = {
            c.path("gyms").asLong(),
            c.path("walls").asLong(),
            c.path("resets").asLong(),
            c.path("routes").asLong(),
            c.path("holds").asLong(),
            c.path("setters").asLong()
        };
        long[] found = {s.gyms(), s.walls(), s.resets(), s.routes(), s.holds(), s.setters()};
        if (!java.util.Arrays.equals(expected, found)) {
            throw ArchiveBackup.bad(backup, "its database does not hold what its manifest counts");
        }
        ArchiveBackup.deleteQuietly(fresh.resolve(ArchiveLock.FILE));
    }

    /** Puts the fresh folder in the archive's place: the old one aside, the new one in, the old one gone. */
    private static void swap(Path fresh, Path target, boolean exists) throws IOException {
        Path old = target.resolveSibling("." + target.getFileName() + ".replaced-" + System.nanoTime());
        if (exists) {
            move(target, old);
        } else {
            Files.createDirectories(target.getParent());
            deleteTree(target);
        }
        try {
            move(fresh, target);
        } catch (IOException e) {
            if (exists) {
                move(old, target);
            }
            throw e;
        }
        deleteTree(old);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to);
        }
    }

    private static void deleteTree(Path p) {
        if (p == null || !Files.exists(p)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(p)) {
            for (Path x : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(x);
            }
        } catch (IOException ignored) {
            // A leftover hidden folder beside the archive harms nothing; the restore itself is complete.
        }
    }
}
