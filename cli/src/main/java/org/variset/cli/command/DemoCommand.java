package org.variset.cli.command;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.IndexUpkeep;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;
import org.variset.sample.SampleArchive;
import org.variset.sample.generate.SampleGenerator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Loads the bundled sample gym into a fresh archive of its own folder, audits it and writes the reports. */
@Command(
        name = "demo",
        mixinStandardHelpOptions = true,
        description = {
            "Show the whole job on the bundled sample gym (Lantern Rock, invented): load its two years of "
                    + "resets into a fresh archive inside the demo's own folder, audit the latest reset of each wall, "
                    + "the gym's routes up and each setter's year, and write the reset audits and the annual report as "
                    + "PDF (with JSON beside them). It never touches your real archive, and replaces only what it made "
                    + "itself.",
            "",
            "The sample ends on " + "2026-11-30; the demo audits as of that day."
        })
final class DemoCommand extends VarisetSubcommand {
    /** Marks a folder as the demo's own, so that a later run may replace what is in it. */
    static final String MARKER = ".variset-demo";

    @Option(
            names = "--out",
            paramLabel = "DIR",
            defaultValue = "variset-demo",
            description = "The demo's folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Override
    ExitCode execute() {
        Path dir = out.toAbsolutePath().normalize();
        prepare(dir);
        long start = System.nanoTime();
        try (Archive archive = Archive.create(dir.resolve("archive"))) {
            List<Path> files = SampleArchive.copyTo(dir.resolve("sample"));
            err().println("Loading the sample gym into " + dir.resolve("archive") + " ...");
            new ArchiveImporter(archive).run(files, ImportOptions.defaults(), ImportProgress.NONE);
            IndexUpkeep.afterWrite(archive, err());
            ArchiveStats s = archive.stats();
            out().println("Demo archive: " + dir.resolve("archive"));
            out().println("The sample gym " + SampleArchive.GYM + " (invented): " + s.routes() + " routes, "
                    + s.holds() + " holds, " + s.walls() + " walls, " + s.resets() + " resets, " + s.setters()
                    + " setters, set " + s.firstSetOn() + " to " + s.lastSetOn() + ".");
            err().println("Auditing as of " + SampleGenerator.SAMPLE_END + " and writing the reports ...");
            new DemoReports(
                            archive,
                            dir.resolve("reports"),
                            SampleGenerator.SAMPLE_END,
                            root().cli().clock(),
                            out())
                    .write();
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write the demo into " + dir + ": " + e.getMessage(), e);
        }
        err().printf("Done in %.0f s.%n", (System.nanoTime() - start) / 1e9);
        out().println("Try: ./variset --archive " + dir.resolve("archive") + " search heel hook grade:V4..V5 --facets");
        return ExitCode.OK;
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
                            dir + " holds files the demo did not make; give another " + "folder with --out");
                }
                for (String mine : List.of("archive", "sample", "reports")) {
                    deleteTree(dir.resolve(mine));
                }
            }
            Files.createDirectories(dir);
            Files.writeString(dir.resolve(MARKER), "Made by 'variset demo'; it may replace what is in this folder.\n");
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot prepare the demo folder " + dir + ": " + e.getMessage(), e);
        }
    }

    /** Deletes a folder and everything in it; nothing when it does not exist. */
    static void deleteTree(Path p) throws IOException {
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
