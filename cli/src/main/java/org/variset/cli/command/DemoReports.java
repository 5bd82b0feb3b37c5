package org.variset.cli.command;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.variset.archive.file.AtomicFile;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.store.Archive;
import org.variset.cli.internal.Json;
import org.variset.cli.render.AuditText;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.AuditJson;
import org.variset.reports.audit.AuditTarget;
import org.variset.reports.audit.Auditor;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.pdf.AuditPdf;
import org.variset.reports.pdf.PdfOptions;
import org.variset.reports.pdf.TrendPdf;
import org.variset.reports.plan.ResetPlan;
import org.variset.reports.plan.ResetPlanner;
import org.variset.reports.trend.Trend;
import org.variset.reports.trend.TrendJson;
import org.variset.reports.trend.TrendReport;

/**
 * The demo's reports: an audit of each wall's latest reset, of the gym's routes up and of each setter's year, as
 * JSON and (the resets and the gym) PDF, and the annual report, with a summary of what each found.
 */
final class DemoReports {
    private final Archive archive;
    private final Path dir;
    private final LocalDate asOf;
    private final PdfOptions options;
    private final PrintWriter out;

    DemoReports(Archive archive, Path dir, LocalDate asOf, Clock clock, PrintWriter out) throws IOException {
        this.archive = archive;
        this.dir = Files.createDirectories(dir);
        this.asOf = asOf;
        this.options = new PdfOptions(PdfOptions.Paper.A4, LocalDate.now(clock), VersionProvider.version());
        this.out = out;
    }

    void write() throws IOException {
        ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
        GymRecord gym = catalog.gym(null);
        Auditor auditor = new Auditor(archive.connection());
        ResetPlanner planner = new ResetPlanner(archive.connection());
        out.println();
        out.println("Latest reset of each wall, as of " + asOf + " (score 0-100 is a heuristic; the top finding):");
        List<String> written = new ArrayList<>();
        for (WallRecord w : catalog.walls(gym.id())) {
            Audit a = auditor.audit(new AuditTarget.LatestReset(gym.name(), w.name(), asOf));
            ResetPlan plan = planner.plan(
                    gym.name(),
                    w.name(),
                    planner.nextDue(gym.name(), w.name(), a.subject().on()),
                    Math.max(1, a.audited().routes().size()),
                    ResetPlanner.DEFAULT_MARGIN);
            String name = "audit-" + file(w.name());
            json(name, AuditJson.of(a));
            AtomicFile.write(dir.resolve(name + ".pdf"), true, o -> AuditPdf.write(a, plan, options, o));
            written.add(name + ".pdf");
            line(
                    String.format(
                            Locale.ROOT,
                            "%-9s %-22s score %3s",
                            w.name(),
                            a.subject().reset(),
                            Figures.SCORE.text(a.audited().score().score())),
                    a);
        }
        Audit standing = auditor.audit(new AuditTarget.Standing(gym.name(), null, asOf));
        json("gym-standing", AuditJson.of(standing));
        AtomicFile.write(dir.resolve("gym-standing.pdf"), true, o -> AuditPdf.write(standing, null, options, o));
        written.add("gym-standing.pdf");
        out.println();
        line(
                String.format(
                        Locale.ROOT,
                        "Whole gym, %d routes up: score %s",
                        standing.audited().routes().size(),
                        Figures.SCORE.text(standing.audited().score().score())),
                standing);
        setters(catalog, auditor, gym);
        annual(gym, written);
        out.println();
        out.println("Reports (PDF, with JSON beside them) in " + dir + ":");
        out.println("  " + String.join(", ", written));
    }

    /** The annual report of the sample's last year, and the grade gaps and overdue walls it finds. */
    private void annual(GymRecord gym, List<String> written) throws IOException {
        LocalDate yearStart = asOf.withDayOfYear(1);
        Trend t = new TrendReport(archive.connection())
                .of(gym.name(), yearStart, yearStart.withDayOfYear(yearStart.lengthOfYear()), asOf);
        json("annual-report-" + asOf.getYear(), TrendJson.of(t));
        String annual = "annual-report-" + asOf.getYear() + ".pdf";
        AtomicFile.write(dir.resolve(annual), true, o -> TrendPdf.write(t, options, o));
        written.add(annual);
        t.months().stream()
                .filter(p -> p.scope().equals("gym") && !p.gradeGaps().isEmpty())
                .forEach(p -> out.println("  On " + p.day() + " the gym had no "
                        + String.join(
                                "; ",
                                p.gradeGaps().entrySet().stream()
                                        .map(e -> e.getKey() + " " + String.join(" or ", e.getValue()))
                                        .toList())
                        + " up, though its target "
                        + "expects them."));
        t.walls().stream()
                .filter(w -> !w.status().equals("ok"))
                .forEach(w -> out.println("  " + w.wall() + " is "
                        + w.status() + ": last reset " + w.lastReset() + ", " + w.daysSince() + " days before " + asOf
                        + " on a " + w.cycleDays() + "-day cycle."));
    }

    /** Each setter's year: the setters with a habit finding are named. */
    private void setters(ArchiveCatalog catalog, Auditor auditor, GymRecord gym) throws IOException {
        for (String s : catalog.setterNames()) {
            Audit a = auditor.audit(new AuditTarget.SetterPeriod(
                    gym.name(), s, asOf.minusYears(1).plusDays(1), asOf));
            json("setter-" + file(s), AuditJson.of(a));
            a.findings().stream()
                    .filter(f -> f.kind().equals("setter_habit"))
                    .findFirst()
                    .ifPresent(f -> out.println("  " + f.text()));
        }
    }

    private void line(String head, Audit a) {
        out.println(head + "  "
                + a.findings().stream().findFirst().map(AuditText::finding).orElse("nothing stands out"));
    }

    private void json(String name, Object tree) throws IOException {
        Path p = dir.resolve(name + ".json");
        AtomicFile.write(p, true, o -> o.write(Json.write(tree).getBytes(StandardCharsets.UTF_8)));
    }

    /** A file name from a wall or setter name: lower case, letters and digits joined by hyphens. */
    static String file(String name) {
        String f = name.toLowerCase(Locale.ROOT)
                .replaceAll("[^\\p{L}\\p{N}]+", "-")
                .replaceAll("(^-|-$)", "");
        return f.isEmpty() ? "unnamed" : f;
    }
}
