package org.variset.cli.command;

import java.util.ArrayList;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.trend.TrendPeriod;
import org.variset.archive.gym.PartialDate;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.PartialDateConverter;
import org.variset.cli.render.TrendText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** A gym's trends over a year or a period, or several gyms' side by side. */
@Command(
        name = "trend",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Show a gym's trends over a year or a period: month-end figures of the gym's and each wall's "
                    + "routes up, resets per wall and how long each wall has been up against its reset cycle (due, "
                    + "overdue), route lifetimes, the setter mix with each setter's grip, hold and move profile, the "
                    + "period's grades against the target, and its near-repeats.",
            "",
            "With several gyms (--gym A --gym B, or --all-gyms), for a chain: the gyms side by side (routes set, "
                    + "resets and their mean score, month-end figures, walls due and overdue, route lifetime, "
                    + "repeats), then each gym's own trend.",
            ""
        },
        footer = {
            "",
            "Formats: text, json, or csv (one gym: the monthly series, one row per day and wall; several: "
                    + "one row per gym).",
            "",
            "Examples:",
            "  variset trend --year 2026 --pdf annual-2026.pdf",
            "  variset trend --from 2026-03 --to 2026-08 --format csv",
            "  variset --db postgresql://db.example/chain trend --all-gyms --year 2026 --pdf chain-2026.pdf"
        })
final class TrendCommand extends VarisetSubcommand {
    @Option(
            names = "--gym",
            paramLabel = "GYM",
            description = "A gym (needed when the archive holds several); " + "repeat it to compare gyms.")
    List<String> gyms = new ArrayList<>();

    @Option(names = "--all-gyms", description = "Compare every gym of the archive.")
    boolean allGyms;

    @Option(names = "--year", paramLabel = "YYYY", description = "The calendar year.")
    Integer year;

    @Option(
            names = "--from",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "The first day (YYYY-MM-DD, YYYY-MM or YYYY).")
    PartialDate from;

    @Option(
            names = "--to",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "The last day (default: today).")
    PartialDate to;

    @Option(
            names = "--format",
            paramLabel = "FORMAT",
            defaultValue = "text",
            description = "text, json or csv (default: ${DEFAULT-VALUE}).")
    String format;

    @Mixin
    PdfFileOptions pdf;

    @Override
    ExitCode execute() {
        if (!format.matches("text|json|csv")) {
            throw new ParameterException(spec.commandLine(), "--format is text, json or csv, not '" + format + "'");
        }
        if ((year == null) == (from == null)) {
            throw new ParameterException(spec.commandLine(), "give --year, or --from (with --to if not today)");
        }
        if (allGyms && !gyms.isEmpty()) {
            throw new ParameterException(spec.commandLine(), "give --gym, or --all-gyms, not both");
        }
        TrendPeriod.Request request = year != null
                ? TrendPeriod.Request.year(year, gyms, allGyms)
                : new TrendPeriod.Request(gyms, allGyms, from.first(), to == null ? null : to.last());
        TrendPeriod.Result r;
        try (Workspace w = workspace()) {
            r = new TrendPeriod(w).run(request);
        }
        pdf.write(r.today(), err(), r.document());
        switch (format) {
            case "json" -> out().println(Json.write(r.json()));
            case "csv" -> out().print(r.csv());
            default ->
                out().print(
                                r.compared()
                                        ? TrendText.of(r.comparison(), r.trends())
                                        : TrendText.of(r.trends().get(0)));
        }
        return ExitCode.OK;
    }
}
