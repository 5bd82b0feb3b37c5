package org.variset.app.sample;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.variset.app.Json;
import org.variset.app.Notice;
import org.variset.app.Notices;
import org.variset.app.VarisetVersion;
import org.variset.app.Workspace;
import org.variset.app.audit.AuditSets;
import org.variset.app.imports.ImportFiles;
import org.variset.app.trend.TrendPeriod;
import org.variset.archive.file.AtomicFile;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.WallRecord;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.AuditTarget;
import org.variset.reports.audit.Finding;
import org.variset.reports.pdf.PdfOptions;
import org.variset.reports.trend.Trend;
import org.variset.sample.SampleArchive;
import org.variset.sample.generate.SampleGenerator;

/**
 * The whole job on the bundled sample gym: load its two years into a fresh archive in the demo's own folder, audit
 * the latest reset of each wall, the gym's routes up and each setter's year as of the sample's last day, and write
 * the reset audits and the annual report (PDF, with JSON beside them). It never touches a real archive, and replaces
 * only what it made itself.
 */
public final class RunDemo {
    /** Marks a folder as the demo's own, so that a later run may replace what is in it. */
    public static final String MARKER = ".variset-demo";

    private RunDemo() {}

    /**
     * A wall's latest reset.
     *
     * @param wall the wall
     * @param audit its audit
     */
    public record WallAudit(String wall, Audit audit) {
        /** The audit's first finding, or null when nothing stands out. */
        public Finding top() {
            return audit.findings().isEmpty() ? null : audit.findings().get(0);
        }
    }

    /**
     * What the demo made and found.
     *
     * @param archiveDir the demo's archive
     * @param stats what it holds
     * @param asOf the day audited
     * @param walls each wall's latest reset
     * @param standing the gym's routes up that day
     * @param setterHabits the habit finding of each setter who has one
     * @param annual the trend of the sample's last year
     * @param reportsDir where the reports are
     * @param files the PDF files written, in order
     */
    public record Summary(
            Path archiveDir,
            ArchiveStats stats,
            LocalDate asOf,
            List<WallAudit> walls,
            Audit standing,
            List<Finding> setterHabits,
            Trend annual,
            Path reportsDir,
            List<String> files) {}

    /**
     * Runs the demo in a folder of its own.
     *
     * @param clock the real clock, for the documents' date (the audits are as of the sample's last day)
     * @throws IllegalArgumentException when the folder holds files the demo did not make, or cannot be written
     */
    public static Summary run(Path folder, Clock clock, Notices notices) {
        Path dir = folder.toAbsolutePath().normalize();
        prepare(dir);
        LocalDate asOf = SampleGenerator.SAMPLE_END;
        Clock sampleDay = Clock.fixed(asOf.atTime(12, 0).toInstant(ZoneOffset.UTC), ZoneOffset.UTC);
        try (Workspace w = Workspace.over(Archive.create(dir.resolve("archive")), sampleDay, notices)) {
            List<Path> files = SampleArchive.copyTo(dir.resolve("sample"));
            notices.note(
                    new Notice(Notice.Kind.INFO, "Loading the sample gym into " + dir.resolve("archive") + " ..."));
            new ImportFiles(w).run(files, ImportOptions.defaults(), ImportProgress.NONE);
            notices.note(new Notice(Notice.Kind.INFO, "Auditing as of " + asOf + " and writing the reports ..."));
            PdfOptions pdf = new PdfOptions(PdfOptions.Paper.A4, LocalDate.now(clock), VarisetVersion.current());
            return reports(w, dir, Files.createDirectories(dir.resolve("reports")), asOf, pdf);
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write the demo into " + dir + ": " + e.getMessage(), e);
        }
    }

    private static Summary reports(Workspace w, Path dir, Path out, LocalDate asOf, PdfOptions pdf) {
        AuditSets audits = new AuditSets(w);
        List<String> written = new ArrayList<>();
        List<WallAudit> walls = new ArrayList<>();
        ArchiveCatalog catalog = new ArchiveCatalog(w.archive().connection());
        String gym = catalog.gym(null).name();
        for (WallRecord wall : catalog.walls(catalog.gym(gym).id())) {
            AuditSets.Report r = audits.audit(new AuditTarget.LatestReset(gym, wall.name(), asOf), true);
            String name = "audit-" + fileName(wall.name());
            json(out, name, r.json());
            AtomicFile.write(out.resolve(name + ".pdf"), true, o -> r.document().write(pdf, o));
            written.add(name + ".pdf");
            walls.add(new WallAudit(wall.name(), r.audit()));
        }
        AuditSets.Report standing = audits.audit(new AuditTarget.Standing(gym, null, asOf), false);
        json(out, "gym-standing", standing.json());
        AtomicFile.write(
                out.resolve("gym-standing.pdf"), true, o -> standing.document().write(pdf, o));
        written.add("gym-standing.pdf");
        List<Finding> habits = new ArrayList<>();
        for (String s : catalog.setterNames()) {
            AuditSets.Report r = audits.audit(
                    new AuditTarget.SetterPeriod(gym, s, asOf.minusYears(1).plusDays(1), asOf), false);
            json(out, "setter-" + fileName(s), r.json());
            r.audit().findings().stream()
                    .filter(f -> f.kind().equals("setter_habit"))
                    .findFirst()
                    .ifPresent(habits::add);
        }
        TrendPeriod.Result annual = new TrendPeriod(w).run(TrendPeriod.Request.year(asOf.getYear(), List.of(), false));
        String annualName = "annual-report-" + asOf.getYear();
        json(out, annualName, annual.json());
        AtomicFile.write(
                out.resolve(annualName + ".pdf"), true, o -> annual.document().write(pdf, o));
        written.add(annualName + ".pdf");
        return new Summary(
                dir.resolve("archive"),
                w.archive().stats(),
                asOf,
                walls,
                standing.audit(),
                habits,
                annual.trends().get(0),
                out,
                written);
    }

    private static void json(Path dir, String name, Object tree) {
        AtomicFile.write(
                dir.resolve(name + ".json"), true, o -> o.write(Json.write(tree).getBytes(StandardCharsets.UTF_8)));
    }

    /** A file name from a wall or setter name: lower case, letters and digits joined by hyphens. */
    public static String fileName(String name) {
        String f = name.toLowerCase(Locale.ROOT)
                .replaceAll("[^\\p{L}\\p{N}]+", "-")
                .replaceAll("(^-|-$)", "");
        return f.isEmpty() ? "unnamed" : f;
    }

    /** Makes the folder the demo's own, refusing one that holds anything the demo did not make. */
    private static void prepare(Path dir) {
        try {
            if (Files.isDirectory(dir)) {
                boolean empty;
                try (Stream<Path> s = Files.list(dir)) {
                    empty = s.findAny().isEmpty();
                }
                if (!empty && !Files.exists(dir.resolve(MARKER))) {
                    throw new IllegalArgumentException(
                            dir + " holds files the demo did not make; give it another " + "folder");
                }
                for (String mine : List.of("archive", "sample", "reports")) {
                    deleteTree(dir.resolve(mine));
                }
            }
            Files.createDirectories(dir);
            Files.writeString(
                    dir.resolve(MARKER), "Made by the Variset demo; it may replace what is in this folder.\n");
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot prepare the demo folder " + dir + ": " + e.getMessage(), e);
        }
    }

    /** Deletes a folder and everything in it; nothing when it does not exist. */
    public static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(p)) {
            for (Path x : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(x);
            }
        }
    }
}
