package org.variset.archive.file;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;

/**
 * Writes a file whole or not at all: into a temporary sibling, moved into place when complete. An existing file is
 * replaced only when asked.
 */
public final class AtomicFile {
    private AtomicFile() {}

    /** What writes the content. */
    @FunctionalInterface
    public interface Content {
        /** Writes the content to the stream. */
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * Writes a file.
     *
     * @throws IllegalArgumentException when the file exists and {@code replace} is false, or its folder is missing
     *     or cannot be written (the message says which and how to fix it)
     */
    public static void write(Path target, boolean replace, Content content) {
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
        Path tmp = null;
        try {
            tmp = Files.createTempFile(dir, "." + file.getFileName(), ".part");
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
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
