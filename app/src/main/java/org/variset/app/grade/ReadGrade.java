package org.variset.app.grade;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.variset.app.Json;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeConverter;
import org.variset.archive.grade.GradeException;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;

/** Reads a grade and places it on the IRCRA axis with its equivalents. Needs no archive. */
public final class ReadGrade {
    private ReadGrade() {}

    /**
     * A grade read.
     *
     * @param grade the grade
     * @param discipline the discipline given, else the grade's scale's, or null for IRCRA numbers
     * @param band the default band of that discipline, or null
     * @param equivalents the equivalents in each scale shown
     */
    public record Reading(Grade grade, Discipline discipline, String band, Map<GradeScale, List<String>> equivalents) {
        /** The reading for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object();
            o.put("text", grade.text());
            o.put("scale", grade.scale().word());
            o.put("canonical", grade.canonical());
            o.put("ircra", grade.ircra());
            o.putArray("levels").add(grade.lowLevel()).add(grade.highLevel());
            o.put("discipline", discipline == null ? null : discipline.word());
            o.put("band", band);
            o.put("modifier", grade.modifier().name().toLowerCase(Locale.ROOT));
            o.put("beyond_table", grade.beyondTable());
            ObjectNode eq = o.putObject("equivalents");
            equivalents.forEach((s, list) -> {
                ArrayNode a = eq.putArray(s.word());
                list.forEach(a::add);
            });
            return o;
        }
    }

    /**
     * Reads a grade.
     *
     * @param discipline the route's discipline, or null
     * @param scale the scale it is written in when the text fits two, or null
     * @param to the one scale to show equivalents in, or null for every scale of the discipline
     * @throws InputException when the text is no grade, or fits several scales (the remedy names them)
     */
    public static Reading read(String text, Discipline discipline, GradeScale scale, GradeScale to) {
        Grade g;
        try {
            g = GradeReader.standard().read(text, discipline, scale, Set.of());
        } catch (GradeException e) {
            if (e.ambiguous()) {
                throw new InputException(
                        InputException.Reason.AMBIGUOUS,
                        e.getMessage(),
                        Remedy.of(
                                Remedy.Kind.CHOOSE_SCALE,
                                "scales",
                                e.readings().stream().map(r -> r.scale().word()).collect(Collectors.joining(", "))));
            }
            throw e;
        }
        Discipline d = discipline != null ? discipline : g.scale().discipline();
        Map<GradeScale, List<String>> eq = new LinkedHashMap<>();
        GradeConverter converter = GradeConverter.standard();
        for (GradeScale s : targets(d, to)) {
            eq.put(s, converter.equivalents(g, s));
        }
        String band = d == null
                ? null
                : BandSet.defaults(d).bandOf(g.ircra()).map(b -> b.label()).orElse("none");
        return new Reading(g, d, band, eq);
    }

    private static List<GradeScale> targets(Discipline d, GradeScale to) {
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
}
