package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.audit.AuditSets;
import org.variset.archive.gym.PartialDate;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.convert.PartialDateConverter;
import org.variset.cli.render.AuditText;
import org.variset.reports.audit.AuditTarget;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** Audits a reset, a standing set or one setter's routes for variety. */
@Command(
        name = "audit",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Audit a set of routes for variety: grip directions, hold types and sizes, moves and styles, "
                    + "grades against the gym's target, difficulty profiles, route lines, and repetition of what was set "
                    + "before. A reset is shown beside the wall's previous reset and the gym's routes up that day.",
            "",
            "Say what to audit with one of:",
            "  --reset LABEL                 one reset",
            "  --wall WALL [--on DATE]       the wall's latest reset on or before DATE (default: today)",
            "  --standing-on DATE [--wall W] the routes up that day, in the whole gym or on one wall",
            "  --setter NAME --from D [--to D]  one setter's routes over a period (default end: today)",
            ""
        },
        footer = {
            "",
            "The score (0-100) is a heuristic: a weighted mean of its parts, always shown beside them.",
            "",
            "Examples:",
            "  variset audit --reset \"Cave 2026-03-02\"",
            "  variset audit --wall Cave --on 2026-03-10",
            "  variset audit --standing-on 2026-06-30 --format json",
            "  variset audit --setter \"Ines Marlow\" --from 2026-01 --to 2026-06",
            "  variset audit --wall Cave --pdf cave-audit.pdf --paper letter"
        })
final class AuditCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(names = "--reset", paramLabel = "LABEL", description = "The reset to audit.")
    String reset;

    @Option(
            names = "--wall",
            paramLabel = "WALL",
            description = "The wall: its latest reset, or with --standing-on " + "its routes up that day.")
    String wall;

    @Option(
            names = "--on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "With --wall: the latest reset on or before this day (default: today).")
    LocalDate on;

    @Option(
            names = "--standing-on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "Audit the routes up on this day.")
    LocalDate standingOn;

    @Option(names = "--setter", paramLabel = "NAME", description = "Audit this setter's routes over a period.")
    String setter;

    @Option(
            names = "--from",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "With --setter: the first day (YYYY-MM-DD, YYYY-MM or YYYY).")
    PartialDate from;

    @Option(
            names = "--to",
            paramLabel = "DATE",
            converter = PartialDateConverter.class,
            description = "With --setter: the last day (default: today).")
    PartialDate to;

    @Option(
            names = "--findings",
            paramLabel = "N",
            defaultValue = "6",
            description = "How many findings the text shows (default: ${DEFAULT-VALUE}; JSON has all).")
    int findings;

    @Mixin
    FormatOptions format;

    @Mixin
    PdfFileOptions pdf;

    @Override
    ExitCode execute() {
        AuditTarget request = request();
        AuditSets.Report report;
        try (Workspace w = workspace()) {
            report = new AuditSets(w).audit(request, pdf.wanted());
        }
        pdf.write(report.today(), err(), report.document());
        if (format.json()) {
            out().println(Json.write(report.json()));
        } else {
            out().print(AuditText.of(report.audit(), findings));
        }
        return ExitCode.OK;
    }

    /** The request the options name; usage errors for combinations that name none or several. */
    AuditTarget request() {
        int kinds = (reset != null ? 1 : 0)
                + (standingOn != null ? 1 : 0)
                + (setter != null ? 1 : 0)
                + (wall != null && standingOn == null ? 1 : 0);
        if (kinds != 1) {
            throw new ParameterException(
                    spec.commandLine(),
                    kinds == 0
                            ? "say what to audit: --reset, --wall, --standing-on or --setter"
                            : "give only one of --reset, --wall (with --on), --standing-on (with or without --wall) "
                                    + "and --setter");
        }
        if (on != null && (wall == null || standingOn != null)) {
            throw new ParameterException(
                    spec.commandLine(),
                    "--on goes with --wall (the wall's latest reset on or before that day); for the routes up on a "
                            + "day use --standing-on");
        }
        if ((from != null || to != null) && setter == null) {
            throw new ParameterException(spec.commandLine(), "--from and --to go with --setter");
        }
        if (reset != null) {
            return new AuditTarget.Reset(gym.gym, reset);
        }
        if (standingOn != null) {
            return new AuditTarget.Standing(gym.gym, wall, standingOn);
        }
        if (setter != null) {
            if (from == null) {
                throw new ParameterException(spec.commandLine(), "--setter needs --from (the first day of the period)");
            }
            return new AuditTarget.SetterPeriod(gym.gym, setter, from.first(), to == null ? null : to.last());
        }
        return new AuditTarget.LatestReset(gym.gym, wall, on);
    }
}
