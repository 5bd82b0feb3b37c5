package org.variset.cli.command;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.variset.app.sample.RunDemo;
import org.variset.cli.ExitCode;
import org.variset.cli.VarisetCli;
import picocli.CommandLine.Command;

/**
 * Runs the common commands once on a throw-away copy of the sample, quietly, so that the launcher can record the
 * classes they load in a class-data sharing archive (the JVM then starts from that archive instead of reading and
 * checking each class again). Not for people: hidden from the help.
 */
@Command(
        name = "train-start-up",
        hidden = true,
        description = "Run the common commands once on a temporary sample archive (used by the launcher).")
final class TrainStartUpCommand extends VarisetSubcommand {
    /** What is run, in order; {@code ARCHIVE} and {@code OUT} stand for the temporary folders. */
    static final List<List<String>> SCRIPT = List.of(
            List.of("--help"),
            List.of("demo", "--out", "OUT"),
            List.of("--archive", "ARCHIVE", "info"),
            List.of("--archive", "ARCHIVE", "info", "--format", "json"),
            List.of("--archive", "ARCHIVE", "search", "heel hook grade:V3..V5", "--facets"),
            List.of("--archive", "ARCHIVE", "search", "hold:crimp@90", "--format", "json"),
            List.of("--archive", "ARCHIVE", "audit", "--wall", "Cave", "--on", "2026-11-30"),
            List.of("--archive", "ARCHIVE", "audit", "--wall", "Cave", "--on", "2026-11-30", "--format", "json"),
            List.of("--archive", "ARCHIVE", "plan", "--wall", "Cave", "--routes", "8"),
            List.of("--archive", "ARCHIVE", "trend", "--from", "2026-01", "--to", "2026-11"),
            List.of("--archive", "ARCHIVE", "check"),
            List.of("grade", "V4"),
            List.of("import", "--help"));

    @Override
    ExitCode execute() {
        Path tmp;
        try {
            tmp = Files.createTempDirectory("variset-train-");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try {
            PrintWriter nowhere = new PrintWriter(Writer.nullWriter());
            VarisetCli quiet = new VarisetCli(
                    new BufferedReader(new StringReader("")),
                    nowhere,
                    nowhere,
                    root().cli().env(),
                    root().cli().home(),
                    root().cli().clock());
            for (List<String> line : SCRIPT) {
                int status = quiet.run(line.stream()
                        .map(a -> a.replace(
                                        "ARCHIVE", tmp.resolve("demo/archive").toString())
                                .replace("OUT", tmp.resolve("demo").toString()))
                        .toArray(String[]::new));
                if (status != 0) {
                    err().println("train-start-up: 'variset " + String.join(" ", line) + "' exited with " + status);
                    return ExitCode.INTERNAL;
                }
            }
        } finally {
            deleteQuietly(tmp);
        }
        return ExitCode.OK;
    }

    private static void deleteQuietly(Path dir) {
        try {
            RunDemo.deleteTree(dir);
        } catch (IOException e) {
            // a temporary folder; the system cleans it up in time
        }
    }
}
