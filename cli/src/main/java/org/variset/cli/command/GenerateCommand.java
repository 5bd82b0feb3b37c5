package org.variset.cli.command;

import java.nio.file.Path;
import java.time.LocalDate;
import org.variset.app.sample.GenerateSample;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.sample.generate.SampleGenerator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Writes invented gyms as interchange files: the bundled sample again, or large synthetic chains. */
@Command(
        name = "generate",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Write invented gyms as interchange CSV files (walls.csv, routes.csv, holds.csv) into a "
                    + "folder, for trying Variset out, benchmarks and scale tests. The same options give the same bytes.",
            "Without --gyms it writes the bundled sample gym (Lantern Rock, two years, seven walls, with stories "
                    + "planted for the audits to find); with --gyms it writes that many synthetic gyms, streamed to disk.",
            ""
        },
        footer = {
            "",
            "Examples:",
            "  variset generate --out sample",
            "  variset generate --out chain --gyms 50 " + "--years 10 --seed 7",
            "  variset import chain/walls.csv chain/routes.csv chain/holds.csv"
        })
final class GenerateCommand extends VarisetSubcommand {
    @Option(names = "--out", required = true, paramLabel = "DIR", description = "The folder to write into.")
    Path out;

    @Option(names = "--gyms", paramLabel = "N", description = "How many synthetic gyms (default: the sample gym).")
    Integer gyms;

    @Option(
            names = "--years",
            paramLabel = "Y",
            defaultValue = "2",
            description = "Years of resets (default: " + "${DEFAULT-VALUE}).")
    int years;

    @Option(names = "--seed", paramLabel = "S", description = "The seed (default: the sample's).")
    Long seed;

    @Option(
            names = "--end",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The last day of the generated resets (default: 2026-11-30).")
    LocalDate end;

    @Option(names = "--force", description = "Replace walls.csv, routes.csv and holds.csv if the folder has them.")
    boolean force;

    @Override
    ExitCode execute() {
        GenerateSample.Result r = GenerateSample.into(out, new GenerateSample.Request(gyms, years, seed, end), force);
        SampleGenerator.Summary s = r.summary();
        out().printf(
                        "Wrote %d " + (s.gyms() == 1 ? "gym" : "gyms")
                                + ", %d walls, %d routes and %d holds to %s in %.1f s.%n",
                        s.gyms(),
                        s.walls(),
                        s.routes(),
                        s.holds(),
                        out,
                        r.seconds());
        out().println("Import them with: variset import "
                + String.join(" ", s.files().stream().map(Path::toString).toList()));
        return ExitCode.OK;
    }
}
