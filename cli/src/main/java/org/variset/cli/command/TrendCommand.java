package org.variset.cli.command;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import org.variset.archive.gym.GymCalendar;
import org.variset.archive.gym.PartialDate;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.store.Archive;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.PartialDateConverter;
import org.variset.cli.internal.Json;
import org.variset.cli.render.TrendText;
import org.variset.reports.pdf.TrendPdf;
import org.variset.reports.trend.ChainComparison;
import org.variset.reports.trend.Trend;
import org.variset.reports.trend.TrendJson;
import org.variset.reports.trend.TrendReport;
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
        List<Trend> trends = new ArrayList<>();
        LocalDate today;
        try (Archive archive = openArchive()) {
            ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
            List<String> names = allGyms
                    ? catalog.gyms().stream().map(GymRecord::name).toList()
                    : gyms.isEmpty()
                            ? java.util.Collections.singletonList(null)
                            : List.copyOf(new LinkedHashSet<>(gyms));
            if (names.isEmpty()) {
                throw new IllegalArgumentException("the archive holds no gym yet; import some sets first");
            }
            // One "today" for all: the first gym's (gyms of a chain may lie in several time zones).
            today = new GymCalendar(root().cli().clock())
                    .today(catalog.gym(names.get(0)).zone());
            LocalDate first = year != null ? LocalDate.of(year, 1, 1) : from.first();
            LocalDate last = year != null ? LocalDate.of(year, 12, 31) : to == null ? today : to.last();
            TrendReport report = new TrendReport(archive.connection());
            for (String name : names) {
                trends.add(report.of(name, first, last, today));
            }
        }
        if (trends.size() > 1) {
            ChainComparison c = ChainComparison.of(trends);
            pdf.write(today, err(), (options, out) -> TrendPdf.write(c, trends, options, out));
            switch (format) {
                case "json" -> out().println(Json.write(TrendJson.of(c, trends)));
                case "csv" -> out().print(TrendJson.csv(c));
                default -> out().print(TrendText.of(c, trends));
            }
            return ExitCode.OK;
        }
        Trend t = trends.get(0);
        pdf.write(today, err(), (options, out) -> TrendPdf.write(t, options, out));
        switch (format) {
            case "json" -> out().println(Json.write(TrendJson.of(t)));
            case "csv" -> out().print(TrendJson.csv(t));
            default -> out().print(TrendText.of(t));
        }
        return ExitCode.OK;
    }
}
