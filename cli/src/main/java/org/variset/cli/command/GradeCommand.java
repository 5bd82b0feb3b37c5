package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeConverter;
import org.variset.archive.grade.GradeException;
import org.variset.archive.grade.GradeModifier;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DisciplineConverter;
import org.variset.cli.convert.GradeScaleConverter;
import org.variset.cli.internal.Json;
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
        Grade g;
        try {
            g = GradeReader.standard().read(text, discipline, scale, Set.of());
        } catch (GradeException e) {
            if (e.ambiguous()) {
                String options = e.readings().stream()
                        .map(r -> "--scale " + r.scale().word())
                        .collect(Collectors.joining(" or "));
                throw new IllegalArgumentException(e.getMessage() + ". Choose with " + options + ".", e);
            }
            throw e;
        }
        Discipline d = discipline != null ? discipline : g.scale().discipline();
        List<GradeScale> targets = targets(d);
        if (format.json()) {
            out().println(Json.write(json(g, d, targets)));
        } else {
            printText(g, d, targets);
        }
        return ExitCode.OK;
    }

    private List<GradeScale> targets(Discipline d) {
        if (to != null) {
            return List.of(to);
        }
        List<GradeScale> out = new ArrayList<>();
        for (GradeScale s : GradeScale.values()) {
            if (s != GradeScale.IRCRA && (d == null || s.discipline() == d)) {
                out.add(s);
            }
        }
        return out;
    }

    private static String band(Grade g, Discipline d) {
        return BandSet.defaults(d).bandOf(g.ircra()).map(b -> b.label()).orElse("none");
    }

    private void printText(Grade g, Discipline d, List<GradeScale> targets) {
        StringBuilder head = new StringBuilder(g.text().strip() + ": " + g.describe() + ", IRCRA " + g.ircraText());
        if (d != null) {
            head.append(" (default ")
                    .append(d.word())
                    .append(" band ")
                    .append(band(g, d))
                    .append(')');
        }
        out().println(head);
        if (g.modifier() != GradeModifier.NONE) {
            out().println("  The table has no " + g.canonical() + (g.modifier() == GradeModifier.HARD ? "+" : "-")
                    + ": read as " + g.canonical() + ", kept as a "
                    + g.modifier().name().toLowerCase() + " flag.");
        }
        if (g.beyondTable()) {
            out().println("  Beyond the IRCRA table: the axis is extended one level per grade step.");
        }
        GradeConverter converter = GradeConverter.standard();
        for (GradeScale s : targets) {
            List<String> eq = converter.equivalents(g, s);
            out().printf(
                            "  %-7s %s%n",
                            s.displayName(), eq.isEmpty() ? "(no equivalent in the table)" : String.join(", ", eq));
        }
    }

    private static ObjectNode json(Grade g, Discipline d, List<GradeScale> targets) {
        ObjectNode o = Json.object();
        o.put("text", g.text());
        o.put("scale", g.scale().word());
        o.put("canonical", g.canonical());
        o.put("ircra", g.ircra());
        ArrayNode levels = o.putArray("levels");
        levels.add(g.lowLevel()).add(g.highLevel());
        o.put("discipline", d == null ? null : d.word());
        o.put("band", d == null ? null : band(g, d));
        o.put("modifier", g.modifier().name().toLowerCase());
        o.put("beyond_table", g.beyondTable());
        ObjectNode eq = o.putObject("equivalents");
        GradeConverter converter = GradeConverter.standard();
        for (GradeScale s : targets) {
            ArrayNode a = eq.putArray(s.word());
            converter.equivalents(g, s).forEach(a::add);
        }
        return o;
    }
}
