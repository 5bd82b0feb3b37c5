package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.archive.gym.GymCalendar;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.archive.gym.PartialDate;
import org.variset.cli.convert.PartialDateConverter;
import org.variset.cli.internal.Json;
import org.variset.reports.pdf.TrendPdf;
import org.variset.reports.trend.Trend;
import org.variset.reports.trend.TrendJson;
import org.variset.reports.trend.TrendReport;
import org.variset.reports.trend.TrendText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** A gym's trends over a year or a period. */
@Command(name = "trend", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Show a gym's trends over a year or a period: month-end figures of the gym's and each wall's "
                + "routes up, resets per wall and how long each wall has been up against its reset cycle (due, "
                + "overdue), route lifetimes, the setter mix with each setter's grip, hold and move profile, the "
                + "period's grades against the target, and its near-repeats.", ""},
        footer = {"", "Formats: text, json, or csv (the monthly series, one row per day and wall).", "",
            "Examples:", "  variset trend --year 2026 --pdf annual-2026.pdf",
            "  variset trend --from 2026-03 --to 2026-08 --format csv"})
final class TrendCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(names = "--year", paramLabel = "YYYY", description = "The calendar year.")
    Integer year;

    @Option(names = "--from", paramLabel = "DATE", converter = PartialDateConverter.class,
            description = "The first day (YYYY-MM-DD, YYYY-MM or YYYY).")
    PartialDate from;

    @Option(names = "--to", paramLabel = "DATE", converter = PartialDateConverter.class,
            description = "The last day (default: today).")
    PartialDate to;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
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
        Trend t;
        LocalDate today;
        try (Archive archive = openArchive()) {
            today = new GymCalendar(root().cli().clock()).today(new ArchiveCatalog(archive.connection())
                    .gym(gym.gym).zone());
            LocalDate first = year != null ? LocalDate.of(year, 1, 1) : from.first();
            LocalDate last = year != null ? LocalDate.of(year, 12, 31) : to == null ? today : to.last();
            t = new TrendReport(archive.connection()).of(gym.gym, first, last, today);
        }
        pdf.write(today, err(), (options, out) -> TrendPdf.write(t, options, out));
        switch (format) {
            case "json" -> out().println(Json.write(TrendJson.of(t)));
            case "csv" -> out().print(TrendJson.csv(t));
            default -> out().print(TrendText.of(t));
        }
        return ExitCode.OK;
    }
}
