package org.variset.archive.file;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;

/**
 * Writes a file whole or not at all: into a temporary sibling, moved into place when complete. An existing file is
 * replaced only when asked. Every file Variset writes for people (documents, exports, templates, backups) goes
 * through here.
 */
public final class AtomicFile {
    private AtomicFile() {}

    /** What writes the content to a stream. */
    @FunctionalInterface
    public interface Content {
        /** Writes the content to the stream. */
        void writeTo(OutputStream out) throws IOException;
    }

    /** What writes the content to a file of its own (for libraries that want a path). */
    @FunctionalInterface
    public interface FileContent {
        /** Writes the content to the (temporary) file. */
        void writeTo(Path file) throws IOException;
    }

    /**
     * Checks, before anything is written, that each target can be written: none is a folder, none exists unless
     * {@code replace}, each folder is there. A set of files is refused whole rather than half written.
     *
     * @throws InputException when a target exists and {@code replace} is false
     * @throws IllegalArgumentException when a target is a folder or its folder is missing
     */
    public static void checkWritable(List<Path> targets, boolean replace) {
        for (Path target : targets) {
            Path file = target.toAbsolutePath().normalize();
            Path dir = file.getParent();
            if (Files.isDirectory(file)) {
                throw new IllegalArgumentException(
                        target + " is a folder; give a file name, such as " + target.resolve("audit.pdf"));
            }
            if (Files.exists(file) && !replace) {
                throw new InputException(
                        InputException.Reason.EXISTS,
                        target + " exists already",
                        Remedy.of(Remedy.Kind.REPLACE_EXISTING, "file", target.toString()));
            }
            if (dir == null || !Files.isDirectory(dir)) {
                throw new IllegalArgumentException("cannot write " + target + ": " + dir
                        + (dir != null && Files.exists(dir) ? " is a file, not a folder" : " does not exist")
                        + " (expected a folder that is there)");
            }
        }
    }

    /**
     * Writes a file from a stream.
     *
     * @throws IllegalArgumentException when the file exists and {@code replace} is false, or its folder is missing
     *     or cannot be written (the message says which and how to fix it)
     */
    public static void write(Path target, boolean replace, Content content) {
        writeThrough(target, replace, tmp -> {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
        });
    }

    /**
     * Writes a file through a temporary sibling the content is written to.
     *
     * @throws IllegalArgumentException as {@link #write}
     */
    public static void writeThrough(Path target, boolean replace, FileContent content) {
        checkWritable(List.of(target), replace);
        Path file = target.toAbsolutePath().normalize();
        Path tmp = null;
        try {
            tmp = Files.createTempFile(file.getParent(), "." + file.getFileName(), ".part");
            content.writeTo(tmp);
            try {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
            }
            tmp = null;
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write " + target + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // The temporary file is hidden and named after the target; nothing else depends on it.
                }
            }
        }
    }
}
