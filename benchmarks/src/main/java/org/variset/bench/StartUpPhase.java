package org.variset.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Cold start: {@code variset info} on the small chain's archive through the launcher, as people run it (with the
 * class-data sharing archive the launcher keeps), against a jar holding nothing but picocli printing its version,
 * run with the same JVM flags. The launcher's sharing archive is trained first, in the foreground; the figure without
 * it is shown too.
 */
final class StartUpPhase {
    private static final int RUNS = 11;

    private final Bench b;

    StartUpPhase(Bench b) {
        this.b = b;
    }

    void run(Workload w) throws IOException {
        Path dir = ImportPhase.archive(b, w);
        b.prepare();
        List<Double> info = new ArrayList<>();
        List<Double> infoWithout = new ArrayList<>();
        List<Double> version = new ArrayList<>();
        List<Double> bare = new ArrayList<>();
        long rss = -1;
        int runs = b.quick ? 3 : RUNS;
        for (int i = 0; i < runs + 1; i++) {
            boolean keep = i > 0;
            ChildRun.Result r = b.variset("info", List.of(), false, "--archive", dir.toString(), "info")
                    .orFail("variset info");
            ChildRun.Result n = ChildRun.run(
                            List.of(b.launcher().toString(), "--archive", dir.toString(), "info"),
                            Map.of("VARISET_CDS", "off"),
                            b.work,
                            b.logs(),
                            "info-no-cds",
                            null)
                    .orFail("variset info");
            ChildRun.Result v =
                    b.variset("version", List.of(), false, "--version").orFail("variset --version");
            ChildRun.Result x = b.java(
                            "bare",
                            List.of(),
                            false,
                            List.of("-jar", b.bareJar().toString(), "--version"))
                    .orFail("the bare picocli jar");
            if (keep) {
                info.add(r.seconds());
                infoWithout.add(n.seconds());
                version.add(v.seconds());
                bare.add(x.seconds());
                rss = Math.max(rss, r.peakRssKb());
            }
        }
        double vi = Stats.median(info);
        double ba = Stats.median(bare);
        b.results.add(new Results.Row(
                "cold start: variset info vs bare picocli --version",
                secs(vi),
                secs(ba),
                vi / ba,
                3.0,
                String.format(
                        Locale.ROOT,
                        "median of %d runs each after one unmeasured run; "
                                + "launcher with its sharing archive; without it info took %s, variset --version %s; info "
                                + "peak RSS %d MB",
                        runs,
                        secs(Stats.median(infoWithout)),
                        secs(Stats.median(version)),
                        rss / 1024)));
    }

    private static String secs(double s) {
        return String.format(Locale.ROOT, "%.2f s", s);
    }
}
