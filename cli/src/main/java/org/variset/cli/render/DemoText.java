package org.variset.cli.render;

import java.io.PrintWriter;
import java.util.Locale;
import org.variset.app.sample.RunDemo;
import org.variset.reports.audit.Audit;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.trend.Trend;

/** What the demo found, as the command line prints it: one line per wall, the gym, the setters, the year. */
public final class DemoText {
    private DemoText() {}

    /** Prints the demo's findings and the reports it wrote. */
    public static void print(RunDemo.Summary s, PrintWriter out) {
        out.println();
        out.println("Latest reset of each wall, as of " + s.asOf() + " (score 0-100 is a heuristic; the top finding):");
        for (RunDemo.WallAudit w : s.walls()) {
            line(
                    out,
                    String.format(
                            Locale.ROOT,
                            "%-9s %-22s score %3s",
                            w.wall(),
                            w.audit().subject().reset(),
                            Figures.SCORE.text(w.audit().audited().score().score())),
                    w.audit());
        }
        out.println();
        Audit standing = s.standing();
        line(
                out,
                String.format(
                        Locale.ROOT,
                        "Whole gym, %d routes up: score %s",
                        standing.audited().routes().size(),
                        Figures.SCORE.text(standing.audited().score().score())),
                standing);
        s.setterHabits().forEach(f -> out.println("  " + AuditText.finding(f)));
        Trend t = s.annual();
        t.gymGaps()
                .forEach(p -> out.println("  On " + p.day() + " the gym had no " + p.gapWords(" or ")
                        + " up, though its target expects routes there."));
        t.walls().stream()
                .filter(w -> !w.status().equals("ok"))
                .forEach(w -> out.println("  " + w.wall() + " is " + w.status() + ": last reset " + w.lastReset() + ", "
                        + w.daysSince() + " days before " + s.asOf() + " on a " + w.cycleDays() + "-day cycle."));
        out.println();
        out.println("Reports (PDF, with JSON beside them) in " + s.reportsDir() + ":");
        out.println("  " + String.join(", ", s.files()));
    }

    private static void line(PrintWriter out, String head, Audit a) {
        out.println(head + "  "
                + a.findings().stream().findFirst().map(AuditText::finding).orElse("nothing stands out"));
    }
}
