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
import org.variset.imports.load.ImportSummary;
import org.variset.sample.SampleArchive;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Loads the bundled sample gym into a fresh archive of its own folder. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = {"Load the bundled sample gym (invented) into a fresh archive inside its own folder and say "
                + "what it holds. It never touches your real archive, and replaces only what it made itself."})
final class DemoCommand extends VarisetSubcommand {
    /** Marks a folder as the demo's own, so that a later run may replace what is in it. */
    static final String MARKER = ".variset-demo";

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "variset-demo",
            description = "The demo's folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Override
    ExitCode execute() {
        Path dir = out.toAbsolutePath().normalize();
        prepare(dir);
        ImportSummary s;
        ArchiveStats stats;
        try (Archive archive = Archive.create(dir.resolve("archive"))) {
            List<Path> files = SampleArchive.copyTo(dir.resolve("sample"));
            s = new ArchiveImporter(archive).run(files, ImportOptions.defaults(), ImportProgress.NONE);
            IndexUpkeep.afterWrite(archive, err());
            stats = archive.stats();
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write the demo into " + dir + ": " + e.getMessage(), e);
        }
        out().println("Demo archive: " + dir.resolve("archive"));
        out().println("Loaded the sample gym " + SampleArchive.GYM + " from " + dir.resolve("sample") + ": "
                + s.routesNew() + " routes, " + s.holdsWritten() + " holds, " + stats.walls() + " walls, "
                + stats.resets() + " resets, " + stats.setters() + " setters, set " + stats.firstSetOn() + " to "
                + stats.lastSetOn() + ".");
        out().println("Try: ./variset --archive " + dir.resolve("archive") + " info");
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
                    throw new IllegalArgumentException(dir + " holds files the demo did not make; give another "
                            + "folder with --out");
                }
                for (String mine : List.of("archive", "sample")) {
                    deleteTree(dir.resolve(mine));
                }
            }
            Files.createDirectories(dir);
            Files.writeString(dir.resolve(MARKER), "Made by 'variset demo'; it may replace what is in this folder.\n");
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot prepare the demo folder " + dir + ": " + e.getMessage(), e);
        }
    }

    private static void deleteTree(Path p) throws IOException {
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
