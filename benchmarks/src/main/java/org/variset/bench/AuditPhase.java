package org.variset.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.variset.archive.store.Archive;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.AuditTarget;
import org.variset.reports.audit.Auditor;

/**
 * The time to audit one reset (the first gym's first wall, its latest reset) in the small and in the large chain:
 * warm, in one JVM (the audit alone: reads and figures), and cold, as {@code variset audit} from a fresh JVM. The
 * first gym holds the same ten years in both chains, so what differs is only how much else the archive holds.
 */
final class AuditPhase {
    private static final int WARM_UP = 5;
    private static final int REPEATS = 25;

    private final Bench b;
    private final List<double[]> warm = new ArrayList<>();
    private final List<double[]> cold = new ArrayList<>();
    private final List<String> names = new ArrayList<>();

    AuditPhase(Bench b) {
        this.b = b;
    }

    /** Measures one workload; call for the small chain first, then the large. */
    void measure(Workload w) throws IOException {
        Path dir = ImportPhase.archive(b, w);
        String wall;
        List<Double> times = new ArrayList<>();
        int routes;
        try (Archive archive = Archive.open(dir)) {
            wall = firstWall(archive, w.firstGym());
            AuditTarget target = new AuditTarget.LatestReset(w.firstGym(), wall, Workload.END);
            Auditor auditor = new Auditor(archive.connection());
            Audit a = null;
            for (int i = 0; i < WARM_UP + REPEATS; i++) {
                long start = System.nanoTime();
                a = auditor.audit(target);
                if (i >= WARM_UP) {
                    times.add((System.nanoTime() - start) / 1e6);
                }
            }
            routes = a.audited().routes().size();
        }
        List<Double> coldTimes = new ArrayList<>();
        long rss = -1;
        for (int i = 0; i < b.runs; i++) {
            ChildRun.Result r = b.variset(
                            "audit-" + w.name(),
                            List.of(),
                            false,
                            "--archive",
                            dir.toString(),
                            "audit",
                            "--gym",
                            w.firstGym(),
                            "--wall",
                            wall,
                            "--on",
                            Workload.END.toString())
                    .orFail("variset audit in the " + w.name() + " chain");
            coldTimes.add(r.seconds());
            rss = Math.max(rss, r.peakRssKb());
        }
        warm.add(new double[] {Stats.median(times)});
        cold.add(new double[] {Stats.median(coldTimes), rss});
        names.add(w.name());
        b.results.fact(String.format(
                Locale.ROOT,
                "audit of %s / %s (%d routes) in the %s chain: warm median %.1f " + "ms, cold %.2f s, peak RSS %d MB",
                w.firstGym(),
                wall,
                routes,
                w.name(),
                Stats.median(times),
                Stats.median(coldTimes),
                rss / 1024));
    }

    /** Adds the large-over-small rows once both chains were measured. */
    void compare() {
        if (warm.size() != 2) {
            return;
        }
        double ws = warm.get(0)[0];
        double wl = warm.get(1)[0];
        b.results.add(new Results.Row(
                "audit one reset, warm (" + names.get(1) + " vs " + names.get(0) + ")",
                String.format(Locale.ROOT, "%.1f ms", wl),
                String.format(Locale.ROOT, "%.1f ms", ws),
                wl / ws,
                3.0,
                "median of " + REPEATS + " audits in one JVM after " + WARM_UP + " warm-up audits; baseline = the "
                        + "same audit in the small chain"));
        double cs = cold.get(0)[0];
        double cl = cold.get(1)[0];
        b.results.add(new Results.Row(
                "audit one reset, cold CLI (" + names.get(1) + " vs " + names.get(0) + ")",
                String.format(Locale.ROOT, "%.2f s", cl),
                String.format(Locale.ROOT, "%.2f s", cs),
                cl / cs,
                3.0,
                String.format(
                        Locale.ROOT,
                        "variset audit from a fresh JVM, median of %d runs; peak RSS %d MB " + "(small), %d MB (large)",
                        b.runs,
                        (long) cold.get(0)[1] / 1024,
                        (long) cold.get(1)[1] / 1024)));
    }

    private static String firstWall(Archive a, String gym) {
        try (PreparedStatement s = a.connection()
                .prepareStatement("select w.name from wall w join gym g on g.id = "
                        + "w.gym_id where g.name = ? order by w.name")) {
            s.setString(1, gym);
            try (ResultSet r = s.executeQuery()) {
                if (!r.next()) {
                    throw new IllegalStateException("no walls in " + gym);
                }
                return r.getString(1);
            }
        } catch (SQLException e) {
            throw new IllegalStateException(e);
        }
    }
}
