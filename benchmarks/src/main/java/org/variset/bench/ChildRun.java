package org.variset.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Runs one child process and measures it: wall time, exit status, peak resident memory (the kernel's {@code VmHWM}
 * high-water mark, polled from {@code /proc} while the child runs) and, when it ran with a GC log, the largest heap
 * left after a collection (what the program kept live, as opposed to what it allocated).
 */
public final class ChildRun {
    private static final Pattern GC_LINE = Pattern.compile("(\\d+)M->(\\d+)M\\((\\d+)M\\)");
    private static final long POLL_MS = 10;

    /**
     * What a run gave.
     *
     * @param seconds wall time from start to exit
     * @param exitCode the exit status
     * @param peakRssKb the high-water mark of resident memory, or -1 where {@code /proc} is not there
     * @param liveHeapMb the largest heap after a collection in the GC log, or -1 without a log
     * @param stdout the file holding standard output
     * @param stderr the file holding standard error
     */
    public record Result(double seconds, int exitCode, long peakRssKb, long liveHeapMb, Path stdout, Path stderr) {
        /** Fails with the child's error output when it did not exit with 0. */
        public Result orFail(String what) {
            if (exitCode != 0) {
                String err;
                try {
                    err = Files.readString(stderr, StandardCharsets.UTF_8);
                } catch (IOException e) {
                    err = "(no error output: " + e.getMessage() + ")";
                }
                throw new IllegalStateException(what + " exited with " + exitCode + ":\n" + tail(err));
            }
            return this;
        }

        private static String tail(String s) {
            return s.length() > 4000 ? "..." + s.substring(s.length() - 4000) : s;
        }
    }

    private ChildRun() {}

    /**
     * Runs a command in a folder; its output goes to {@code logs/name.out} and {@code logs/name.err}. A GC log
     * written to {@code gcLog} (when not null) is read for the live heap.
     */
    public static Result run(
            List<String> command, Map<String, String> env, Path dir, Path logs, String name, Path gcLog)
            throws IOException {
        Files.createDirectories(logs);
        Path out = logs.resolve(name + ".out");
        Path err = logs.resolve(name + ".err");
        if (gcLog != null) {
            Files.deleteIfExists(gcLog);
        }
        ProcessBuilder pb = new ProcessBuilder(command)
                .directory(dir.toFile())
                .redirectOutput(out.toFile())
                .redirectError(err.toFile());
        pb.environment().putAll(env);
        long start = System.nanoTime();
        Process p = pb.start();
        Path status = Path.of("/proc", Long.toString(p.pid()), "status");
        long peak = -1;
        try {
            while (!p.waitFor(POLL_MS, TimeUnit.MILLISECONDS)) {
                peak = Math.max(peak, highWaterMark(status));
            }
        } catch (InterruptedException e) {
            p.destroyForcibly();
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while waiting for " + name, e);
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        return new Result(seconds, p.exitValue(), peak, gcLog == null ? -1 : liveHeapMb(gcLog), out, err);
    }

    /** {@code VmHWM} in kB from a {@code /proc/PID/status} file, or -1 when it cannot be read (the child ended). */
    static long highWaterMark(Path status) {
        try {
            for (String line : Files.readAllLines(status, StandardCharsets.US_ASCII)) {
                if (line.startsWith("VmHWM:")) {
                    return Long.parseLong(line.substring(6).replace("kB", "").strip());
                }
            }
        } catch (IOException | RuntimeException e) {
            return -1;
        }
        return -1;
    }

    /** The largest heap after a collection in a unified GC log ({@code -Xlog:gc:file=...}), in MB. */
    static long liveHeapMb(Path gcLog) throws IOException {
        if (!Files.exists(gcLog)) {
            return -1;
        }
        long max = -1;
        for (String line : Files.readAllLines(gcLog, StandardCharsets.UTF_8)) {
            Matcher m = GC_LINE.matcher(line);
            if (m.find()) {
                max = Math.max(max, Long.parseLong(m.group(2)));
            }
        }
        return max;
    }
}
