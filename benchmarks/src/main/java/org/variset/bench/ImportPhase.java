package org.variset.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Import throughput: {@code variset import} of a generated chain into a new archive (checks, database, change log,
 * search index) against {@link org.variset.bench.floor.RawFloor} doing the storing and indexing with plain library
 * calls. Both run as fresh JVMs under a 512 MB heap cap, alternating which goes first; each gets an empty archive
 * made by {@code variset init} beforehand (not timed).
 */
final class ImportPhase {
    static final List<String> HEAP_CAP = List.of("-Xmx512m");

    private final Bench b;
    /** The peak RSS of the floor's last run. */
    private long lastFloorRss = -1;

    ImportPhase(Bench b) {
        this.b = b;
    }

    /** Imports a workload {@code runs} times each way; leaves Variset's last archive at {@link #archive}. */
    void run(Workload w, long holds) throws IOException {
        List<Double> variset = new ArrayList<>();
        List<Double> floor = new ArrayList<>();
        long rss = -1;
        long liveHeap = -1;
        long floorRss = -1;
        for (int i = 0; i < b.runs; i++) {
            boolean floorFirst = i % 2 == 1;
            if (floorFirst) {
                floor.add(floor(w, i));
            }
            Path dir = archive(b, w);
            Bench.delete(dir);
            b.variset("init-" + w.name(), List.of(), false, "--archive", dir.toString(), "init")
                    .orFail("variset init");
            ChildRun.Result r = b.variset(
                            "import-" + w.name(),
                            HEAP_CAP,
                            true,
                            "--archive",
                            dir.toString(),
                            "import",
                            w.walls().toString(),
                            w.routes().toString(),
                            w.holds().toString())
                    .orFail("variset import of the " + w.name() + " chain");
            variset.add(r.seconds());
            rss = Math.max(rss, r.peakRssKb());
            liveHeap = Math.max(liveHeap, r.liveHeapMb());
            System.out.printf(Locale.ROOT, "    run %d: variset %.1f s%n", i + 1, r.seconds());
            if (!floorFirst) {
                floor.add(floor(w, i));
            }
            floorRss = Math.max(floorRss, lastFloorRss);
        }
        report(w, holds, variset, floor, rss, liveHeap, floorRss);
    }

    /** The import's rate against the floor's, and its heap, as result rows. */
    private void report(
            Workload w, long holds, List<Double> variset, List<Double> floor, long rss, long liveHeap, long floorRss) {
        double v = Stats.median(variset);
        double f = Stats.median(floor);
        b.results.add(new Results.Row(
                "import, " + w.name() + " chain (holds/s)",
                rate(holds / v, v),
                rate(holds / f, f),
                v / f,
                1.5,
                String.format(
                        Locale.ROOT,
                        "%d holds; median of %d runs each; "
                                + "ratio = Variset time / floor time; Variset %s, floor %s",
                        holds,
                        b.runs,
                        seconds(variset),
                        seconds(floor))));
        b.results.add(new Results.Row(
                "import heap, " + w.name() + " chain (live after GC)",
                liveHeap + " MB",
                "512 MB cap",
                liveHeap / 512.0,
                1.0,
                String.format(
                        Locale.ROOT,
                        "largest heap left after a "
                                + "collection in the GC log, run under -Xmx512m; peak RSS %d MB (floor %d MB)",
                        rss / 1024,
                        floorRss / 1024)));
    }

    private double floor(Workload w, int i) throws IOException {
        Path dir = b.work.resolve("archives").resolve(w.name() + "-floor");
        Bench.delete(dir);
        b.variset("init-floor-" + w.name(), List.of(), false, "--archive", dir.toString(), "init")
                .orFail("variset init");
        ChildRun.Result r = b.java(
                        "floor-" + w.name(),
                        HEAP_CAP,
                        true,
                        List.of(
                                "-cp",
                                b.benchJar().toString(),
                                "org.variset.bench.floor.RawFloor",
                                dir.toString(),
                                w.walls().toString(),
                                w.routes().toString(),
                                w.holds().toString()))
                .orFail("the import floor");
        lastFloorRss = r.peakRssKb();
        System.out.printf(Locale.ROOT, "    run %d: floor %.1f s%n", i + 1, r.seconds());
        return r.seconds();
    }

    /** Where Variset's archive of a workload is kept for the later phases. */
    static Path archive(Bench b, Workload w) {
        return b.work.resolve("archives").resolve(w.name() + "-variset");
    }

    private static String rate(double perSecond, double seconds) {
        return String.format(Locale.ROOT, "%,.0f (%.1f s)", perSecond, seconds);
    }

    static String seconds(List<Double> xs) {
        return xs.stream().map(x -> String.format(Locale.ROOT, "%.1f", x)).toList() + " s";
    }
}
