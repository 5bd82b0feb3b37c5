package org.variset.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/** What every phase shares: where things are, how children are started, how many runs, and the results. */
final class Bench {
    /** The JVM flags the launcher uses by default; children run with them so figures match what people get. */
    static final List<String> JVM_FLAGS = List.of("-XX:+UseSerialGC", "-XX:TieredStopAtLevel=1");

    final Path repo;
    final Path work;
    final int runs;
    /** A quick run checks that the harness works: fewer repetitions everywhere. */
    final boolean quick;

    final Results results = new Results();
    private int childNo;

    Bench(Path repo, Path work, int runs, boolean quick) {
        this.repo = repo;
        this.work = work;
        this.runs = runs;
        this.quick = quick;
    }

    Path launcher() {
        return repo.resolve("variset");
    }

    Path benchJar() {
        return repo.resolve("benchmarks/target/variset-benchmarks.jar");
    }

    Path bareJar() {
        return repo.resolve("benchmarks/target/bare-picocli.jar");
    }

    Path logs() {
        return work.resolve("logs");
    }

    /**
     * Runs the Variset launcher, with extra JVM flags if any; {@code gc} asks for a GC log to read the live heap from.
     * With the launcher's own flags it uses the launcher's class-data sharing archive (trained by {@link #prepare});
     * with others it runs without one, since the launcher would train a new archive for every new set of flags.
     */
    ChildRun.Result variset(String name, List<String> jvmExtra, boolean gc, String... args) throws IOException {
        String label = String.format("%03d-%s", ++childNo, name);
        Path gcLog = gc ? logs().resolve(label + ".gc") : null;
        List<String> flags = new ArrayList<>(JVM_FLAGS);
        flags.addAll(jvmExtra);
        if (gcLog != null) {
            flags.add("-Xlog:gc:file=" + gcLog);
        }
        List<String> cmd = new ArrayList<>(List.of(launcher().toString()));
        cmd.addAll(List.of(args));
        Map<String, String> env = jvmExtra.isEmpty() && gcLog == null
                ? Map.of()
                : Map.of("VARISET_JAVA_OPTS", String.join(" ", flags), "VARISET_CDS", "off");
        return ChildRun.run(cmd, env, work, logs(), label, gcLog);
    }

    /** Trains the launcher's class-data sharing archive in the foreground, so that none trains during a measurement. */
    void prepare() throws IOException {
        ChildRun.run(
                        List.of(launcher().toString(), "--version"),
                        Map.of("VARISET_CDS", "train"),
                        work,
                        logs(),
                        "cds-train",
                        null)
                .orFail("training the launcher's class-data sharing archive");
    }

    /** Runs a Java main class or jar of the benchmark module (the floors) with the same flags. */
    ChildRun.Result java(String name, List<String> jvmExtra, boolean gc, List<String> args) throws IOException {
        String label = String.format("%03d-%s", ++childNo, name);
        Path gcLog = gc ? logs().resolve(label + ".gc") : null;
        // The java on the PATH, as the launcher uses.
        List<String> cmd = new ArrayList<>(List.of("java"));
        cmd.addAll(JVM_FLAGS);
        cmd.addAll(jvmExtra);
        if (gcLog != null) {
            cmd.add("-Xlog:gc:file=" + gcLog);
        }
        cmd.addAll(args);
        return ChildRun.run(cmd, Map.of(), work, logs(), label, gcLog);
    }

    /** Deletes a folder and everything in it. */
    static void delete(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
