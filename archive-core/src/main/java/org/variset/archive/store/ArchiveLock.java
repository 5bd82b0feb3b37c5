package org.variset.archive.store;

import java.io.IOException;
import java.net.InetAddress;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalTime;
import java.time.ZoneId;
import java.time.temporal.ChronoUnit;
import org.variset.archive.problem.ArchiveException;

/**
 * One process at a time works on an archive. The lock is an operating-system lock on {@code variset.lock} in the
 * archive folder (released by the system when the process ends, even when it is killed), and the file says which
 * process holds it, so a second process can answer "in use by process N on host H" instead of waiting or corrupting
 * anything. A process that finds the archive in use tries again for a short while, then gives up with that answer.
 */
public final class ArchiveLock implements AutoCloseable {
    /** The lock file's name. */
    public static final String FILE = "variset.lock";
    /** How long a command waits for another to finish before it gives up. */
    public static final Duration DEFAULT_WAIT = Duration.ofSeconds(5);

    private static final long RETRY_MS = 200;

    private final FileChannel channel;
    private final FileLock lock;

    private ArchiveLock(FileChannel channel, FileLock lock) {
        this.channel = channel;
        this.lock = lock;
    }

    /**
     * Takes the archive's lock, waiting up to {@code wait} for another process to let it go.
     *
     * @throws ArchiveException (in use) naming the process that holds it, when it does not let go in time
     */
    public static ArchiveLock acquire(Path dir, Duration wait) {
        return acquire(dir, wait, "The archive at " + dir);
    }

    /**
     * Takes the lock of a folder, waiting up to {@code wait}; {@code what} names the folder in messages ("The archive
     * at ...", "This client's search index of ...").
     *
     * @throws ArchiveException (in use) naming the process that holds it, when it does not let go in time
     */
    public static ArchiveLock acquire(Path dir, Duration wait, String what) {
        Path file = dir.resolve(FILE);
        long deadline = System.nanoTime() + wait.toNanos();
        try {
            FileChannel ch = FileChannel.open(
                    file, StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
            ArchiveFolder.restrictToOwner(file);
            while (true) {
                FileLock l;
                try {
                    l = ch.tryLock();
                } catch (OverlappingFileLockException sameProcess) {
                    l = null;
                }
                if (l != null) {
                    writeHolder(ch);
                    return new ArchiveLock(ch, l);
                }
                if (System.nanoTime() >= deadline) {
                    String holder = holder(file);
                    ch.close();
                    throw new ArchiveException(
                            ArchiveException.Problem.IN_USE,
                            what + " is in use by " + holder + ". Wait for it to finish and try again.");
                }
                sleep();
            }
        } catch (IOException e) {
            throw new ArchiveException(
                    ArchiveException.Problem.DAMAGED, "Cannot lock " + dir + ": " + e.getMessage(), e);
        }
    }

    /** Who holds the lock, as the lock file says: {@code process 1234 on host h (since 11:02:03)}. */
    static String holder(Path file) {
        try {
            String[] f = Files.readString(file, StandardCharsets.UTF_8).strip().split(" ");
            if (f.length >= 3) {
                LocalTime since = Instant.ofEpochMilli(Long.parseLong(f[2]))
                        .atZone(ZoneId.systemDefault())
                        .toLocalTime()
                        .truncatedTo(ChronoUnit.SECONDS);
                String doing =
                        f.length > 3 ? ", " + String.join(" ", java.util.Arrays.copyOfRange(f, 3, f.length)) : "";
                return "process " + f[0] + " on host " + f[1] + " (since " + since + ")" + doing;
            }
        } catch (IOException | RuntimeException e) {
            // The holder is writing its name right now, or the file is from an older Variset: say less.
        }
        return "another Variset process";
    }

    /**
     * Says in the lock file what the holder is doing, for the message another process shows ("variset serve at
     * http://127.0.0.1:7070/; stop it to use the archive here").
     */
    public void describe(String doing) {
        try {
            writeHolder(channel, doing.replace('\n', ' '));
        } catch (IOException e) {
            // The lock still holds; the other process just says less.
        }
    }

    private static void writeHolder(FileChannel ch) throws IOException {
        writeHolder(ch, "");
    }

    private static void writeHolder(FileChannel ch, String doing) throws IOException {
        String host;
        try {
            host = InetAddress.getLocalHost().getHostName();
        } catch (IOException e) {
            host = "unknown";
        }
        byte[] text = (ProcessHandle.current().pid() + " " + host.replace(' ', '_') + " " + System.currentTimeMillis()
                        + (doing.isEmpty() ? "" : " " + doing)
                        + "\n")
                .getBytes(StandardCharsets.UTF_8);
        ch.truncate(0);
        ch.write(ByteBuffer.wrap(text), 0);
        ch.force(false);
    }

    private static void sleep() {
        try {
            Thread.sleep(RETRY_MS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ArchiveException(ArchiveException.Problem.IN_USE, "Interrupted while waiting for the archive.");
        }
    }

    @Override
    public void close() {
        try {
            lock.release();
            channel.close();
        } catch (IOException e) {
            // The system releases the lock when the channel or the process goes; nothing else to do.
        }
    }
}
