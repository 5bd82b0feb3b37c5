package org.variset.archive.store;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.ArchiveException.Problem;

/**
 * The folder of an embedded archive: its database file, and the owner-only permissions it and its folder keep (the
 * archive holds a gym's own records). Where the file system has no POSIX modes, permissions are left as they are.
 */
public final class ArchiveFolder {
    /** The database's base name inside the folder, as H2 is given it. */
    static final String DB_NAME = "archive";
    /** The database file inside the folder. */
    public static final String DATABASE_FILE = DB_NAME + ".mv.db";

    private ArchiveFolder() {}

    /** True when a folder holds an archive. */
    public static boolean holdsArchive(Path dir) {
        return Files.isRegularFile(dir.resolve(DATABASE_FILE));
    }

    /** Creates a folder and its parents, readable by its owner only. */
    public static void createPrivate(Path dir) throws IOException {
        if (posix()) {
            Files.createDirectories(
                    dir, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------")));
        } else {
            Files.createDirectories(dir);
        }
    }

    /**
     * Makes a file readable and writable by its owner only.
     *
     * @throws ArchiveException when the permissions cannot be set
     */
    public static void restrictToOwner(Path file) {
        try {
            if (Files.exists(file) && posix()) {
                Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
            }
        } catch (IOException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot restrict access to " + file + ": " + e.getMessage(), e);
        }
    }

    private static boolean posix() {
        return FileSystems.getDefault().supportedFileAttributeViews().contains("posix");
    }
}
