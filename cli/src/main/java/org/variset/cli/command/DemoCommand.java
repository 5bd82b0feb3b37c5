package org.variset.cli.command;

import java.nio.file.Path;
import org.variset.app.sample.RunDemo;
import org.variset.archive.store.ArchiveStats;
import org.variset.cli.ExitCode;
import org.variset.cli.render.DemoText;
import org.variset.sample.SampleArchive;
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
        long start = System.nanoTime();
        RunDemo.Summary s = RunDemo.run(out, root().cli().clock(), notices());
        ArchiveStats st = s.stats();
        out().println("Demo archive: " + s.archiveDir());
        out().println("The sample gym " + SampleArchive.GYM + " (invented): " + st.routes() + " routes, " + st.holds()
                + " holds, " + st.walls() + " walls, " + st.resets() + " resets, " + st.setters() + " setters, set "
                + st.firstSetOn() + " to " + st.lastSetOn() + ".");
        DemoText.print(s, out());
        err().printf("Done in %.0f s.%n", (System.nanoTime() - start) / 1e9);
        out().println("Try: ./variset --archive " + s.archiveDir() + " search heel hook grade:V4..V5 --facets");
        out().println("In a browser: ./variset --archive " + s.archiveDir() + " user add NAME --role admin, then "
                + "./variset --archive " + s.archiveDir() + " serve, and open http://127.0.0.1:7070/");
        return ExitCode.OK;
    }
}
