package org.variset.cli.command;

import java.util.Locale;
import org.variset.app.Json;
import org.variset.app.grade.ReadGrade;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeModifier;
import org.variset.archive.grade.GradeScale;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DisciplineConverter;
import org.variset.cli.convert.GradeScaleConverter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Reads a grade and shows it on the IRCRA axis with its equivalents. Needs no archive. */
@Command(
        name = "grade",
        mixinStandardHelpOptions = true,
        description = {
            "Read a grade as setters write it, place it on the IRCRA axis and show its equivalents.",
            "Scales: V (V4, V0+, V3/4), Font (6B+), YDS (5.10c, 5.10-), French (6a+), UIAA (VII+, 7-), and",
            "IRCRA numbers with --scale ircra. A grade spanning several rows of the IRCRA table converts to",
            "every grade on those rows."
        },
        footer = {
            "",
            "Examples:",
            "  variset grade 5.11d --to french",
            "  variset grade 6A+ --discipline rope",
            "  variset grade 5+ --discipline rope --scale uiaa"
        })
final class GradeCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "GRADE", description = "The grade as written.")
    String text;

    @Option(
            names = "--discipline",
            paramLabel = "boulder|rope",
            converter = DisciplineConverter.class,
            description = "The route's discipline; decides which scales fit (boulder: V, Font; rope: YDS, "
                    + "French, UIAA).")
    Discipline discipline;

    @Option(
            names = "--scale",
            paramLabel = "SCALE",
            converter = GradeScaleConverter.class,
            description = "The scale the grade is written in, when the text fits two: v, font, yds, french, "
                    + "uiaa, ircra.")
    GradeScale scale;

    @Option(
            names = "--to",
            paramLabel = "SCALE",
            converter = GradeScaleConverter.class,
            description = "Show only the equivalents in this scale.")
    GradeScale to;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ReadGrade.Reading r = ReadGrade.read(text, discipline, scale, to);
        if (format.json()) {
            out().println(Json.write(r.json()));
        } else {
            printText(r);
        }
        return ExitCode.OK;
    }

    private void printText(ReadGrade.Reading r) {
        Grade g = r.grade();
        StringBuilder head = new StringBuilder(g.text().strip() + ": " + g.describe() + ", IRCRA " + g.ircraText());
        if (r.discipline() != null) {
            head.append(" (default ")
                    .append(r.discipline().word())
                    .append(" band ")
                    .append(r.band())
                    .append(')');
        }
        out().println(head);
        if (g.modifier() != GradeModifier.NONE) {
            out().println("  The table has no " + g.canonical() + (g.modifier() == GradeModifier.HARD ? "+" : "-")
                    + ": read as " + g.canonical() + ", kept as a "
                    + g.modifier().name().toLowerCase(Locale.ROOT)
                    + " flag.");
        }
        if (g.beyondTable()) {
            out().println("  Beyond the IRCRA table: the axis is extended one level per grade step.");
        }
        r.equivalents()
                .forEach((s, eq) -> out().printf(
                                "  %-7s %s%n",
                                s.displayName(),
                                eq.isEmpty() ? "(no equivalent in the table)" : String.join(", ", eq)));
    }
}
