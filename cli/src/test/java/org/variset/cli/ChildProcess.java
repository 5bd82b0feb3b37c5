package org.variset.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/** Runs the shaded Variset jar in a child JVM, as a user would, for tests that need a second real process. */
final class ChildProcess {
    /** The jar the package phase built (integration tests run after it). */
    static final Path JAR = Path.of("target", "variset.jar");

    private ChildProcess() {}

    /** Starts {@code variset ARGS} with extra environment, its output going to a log file. */
    static Process start(Path log, Map<String, String> env, String... args) throws IOException {
        if (!Files.isRegularFile(JAR)) {
            throw new IllegalStateException(JAR.toAbsolutePath() + " is missing: run the integration tests through "
                    + "Maven's verify phase (the shaded jar is built in package)");
        }
        List<String> cmd = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:+UseSerialGC",
                "-XX:TieredStopAtLevel=1",
                "-jar",
                JAR.toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder b = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile());
        b.environment().putAll(env);
        return b.start();
    }

    /** Runs a command to its end (at most five minutes) and returns its exit status. */
    static int run(Path log, Map<String, String> env, String... args) throws IOException, InterruptedException {
        Process p = start(log, env, args);
        if (!p.waitFor(5, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new IllegalStateException("variset " + String.join(" ", args) + " did not finish");
        }
        return p.exitValue();
    }

    /** Waits until the log holds a text, or the process ends, or the time is up; true when the text came. */
    static boolean awaitLine(Path log, String text, Process p, long millis) throws IOException, InterruptedException {
        long end = System.currentTimeMillis() + millis;
        while (System.currentTimeMillis() < end) {
            if (Files.exists(log) && Files.readString(log).contains(text)) {
                return true;
            }
            if (!p.isAlive()) {
                return Files.exists(log) && Files.readString(log).contains(text);
            }
            Thread.sleep(20);
        }
        return false;
    }
}
