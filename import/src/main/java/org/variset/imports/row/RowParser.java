package org.variset.imports.row;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeException;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.gym.WallDiscipline;
import org.variset.archive.route.GripDirection;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;
import org.variset.archive.route.Reset;
import org.variset.archive.settings.GymVocabularies;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;
import org.variset.imports.ProblemList;
import org.variset.imports.table.Columns;
import org.variset.imports.table.TableKind;
import org.variset.imports.table.TableRow;

/**
 * Turns table rows into validated routes, holds and walls (docs/spec/interchange.md). Each bad cell becomes one located
 * problem; a row with any problem gives null. Move and style spellings of the vocabulary become their terms;
 * terms it does not know are kept (lower case, single spaces) and listed in {@link #unknownTerms()}.
 */
public final class RowParser {
    private final GradeReader grades = GradeReader.standard();
    private final GymVocabularies vocabularies;
    private final ProblemList problems;
    private final Set<String> unknownTerms = new TreeSet<>();

    /**
     * A parser recording problems in a list. Each row's terms are read with the vocabulary its gym had on its set
     * date, so a gym's own spellings become its canonical terms.
     */
    public RowParser(GymVocabularies vocabularies, ProblemList problems) {
        this.vocabularies = vocabularies;
        this.problems = problems;
    }

    /** Moves and styles met that the vocabulary does not list ({@code move: bat hang}). */
    public Set<String> unknownTerms() {
        return unknownTerms;
    }

    /** A route row, or null when it has problems. */
    public RouteRow route(TableRow row) {
        CellReader c = new CellReader(row, problems);
        String gym = c.gym();
        String wall = c.name("wall", true);
        String label = c.name("route", true);
        LocalDate setOn = c.date("set_on", true);
        Discipline discipline = discipline(c);
        Grade grade = discipline == null ? null : grade(c, discipline);
        LocalDate stripped = c.date("stripped_on", false);
        if (setOn != null && stripped != null && !stripped.isAfter(setOn)) {
            c.problem(
                    "stripped_on",
                    stripped + " is not after set_on " + setOn
                            + " (expected the date it came down, or empty while it is up)");
        }
        String reset = c.name("reset", false);
        List<String> setters = c.list("setters").stream()
                .map(s -> java.text.Normalizer.normalize(s, java.text.Normalizer.Form.NFC))
                .toList();
        Double angle = c.number("angle_deg", -45, 90, "degrees from vertical, -45 to 90");
        Vocabulary vocabulary = vocabularies.on(gym, setOn);
        List<String> moves = terms(c, vocabulary, VocabularyField.MOVES, "moves");
        List<String> styles = terms(c, vocabulary, VocabularyField.STYLES, "styles");
        List<Integer> difficulty = difficulties(c);
        var extras = c.extras(TableKind.ROUTES);
        if (!c.ok()) {
            return null;
        }
        return new RouteRow(
                row.file(),
                row.line(),
                new RouteKey(gym, wall, label, setOn),
                discipline,
                grade,
                stripped,
                reset == null ? Reset.defaultLabel(wall, setOn) : reset,
                setters,
                c.text("color"),
                angle,
                moves,
                styles,
                difficulty,
                c.text("notes"),
                extras);
    }

    /**
     * The key of a route row whose key cells (gym, wall, route, set_on) can be read, whatever its other cells hold;
     * null otherwise. Records no problem: for rows {@link #route} refused, so their holds are not reported again.
     */
    public RouteKey keyOf(TableRow row) {
        CellReader c = new CellReader(row, new org.variset.imports.ProblemList());
        String gym = c.name("gym", true);
        String wall = c.name("wall", true);
        String label = c.name("route", true);
        LocalDate setOn = c.date("set_on", true);
        return gym == null || wall == null || label == null || setOn == null
                ? null
                : new RouteKey(gym, wall, label, setOn);
    }

    /** A hold row, or null when it has problems. */
    public HoldRow hold(TableRow row) {
        CellReader c = new CellReader(row, problems);
        String gym = c.gym();
        String wall = c.name("wall", false);
        String route = c.name("route", true);
        LocalDate setOn = c.date("set_on", true);
        Integer seq = c.integer("seq", 1, 100_000, "the hold's order along the route, from 1");
        String type = holdType(c, vocabularies.on(gym, setOn));
        HoldRole role = role(c, type);
        HoldSize size = size(c);
        List<Double> grips = grips(c);
        Double x = c.number("x_m", 0, 1000, "metres from the wall's left edge, 0 or more");
        Double y = c.number("y_m", 0, 1000, "metres from the wall's bottom edge, 0 or more");
        var extras = c.extras(TableKind.HOLDS);
        if (!c.ok()) {
            return null;
        }
        return new HoldRow(
                row.file(),
                row.line(),
                gym,
                wall,
                route,
                setOn,
                new HoldPlacement.Spec(seq, role, type, size, grips, c.text("hold_ref"), x, y, extras));
    }

    /** A wall row, or null when it has problems. */
    public WallRow wall(TableRow row) {
        CellReader c = new CellReader(row, problems);
        String gym = c.gym();
        String wall = c.name("wall", true);
        WallDiscipline discipline = null;
        String d = c.text("discipline");
        if (d != null) {
            try {
                discipline = WallDiscipline.parse(d);
            } catch (IllegalArgumentException e) {
                c.problem("discipline", e.getMessage());
            }
        }
        Double angle = c.number("angle_deg", -45, 90, "degrees from vertical, -45 to 90");
        Double height = c.number("height_m", 0.1, 100, "metres, above 0");
        Double width = c.number("width_m", 0.1, 1000, "metres, above 0");
        Integer cycle = c.integer("cycle_days", 1, 3650, "days between resets, 1 or more");
        var extras = c.extras(TableKind.WALLS);
        if (!c.ok()) {
            return null;
        }
        return new WallRow(row.file(), row.line(), gym, wall, discipline, angle, height, width, cycle, extras);
    }

    private static Discipline discipline(CellReader c) {
        String t = c.text("discipline");
        if (t == null) {
            c.problem("discipline", "missing value (expected boulder or rope)");
            return null;
        }
        try {
            return Discipline.parse(t);
        } catch (IllegalArgumentException e) {
            c.problem("discipline", e.getMessage());
            return null;
        }
    }

    private Grade grade(CellReader c, Discipline discipline) {
        String text = c.text("grade");
        if (text == null) {
            c.problem("grade", "missing value (expected the grade as the setters wrote it)");
            return null;
        }
        GradeScale scale = null;
        String s = c.text("grade_scale");
        if (s != null) {
            try {
                scale = GradeScale.parse(s);
            } catch (IllegalArgumentException e) {
                c.problem("grade_scale", e.getMessage());
                return null;
            }
        }
        try {
            return grades.read(text, discipline, scale, Set.of());
        } catch (GradeException e) {
            String hint = e.ambiguous()
                    ? " (give the scale in the grade_scale column: "
                            + String.join(
                                    " or ",
                                    e.readings().stream()
                                            .map(r -> r.scale().word())
                                            .toList()) + ")"
                    : "";
            c.problem("grade", e.getMessage() + hint);
            return null;
        }
    }

    private List<String> terms(CellReader c, Vocabulary vocabulary, VocabularyField field, String column) {
        List<String> out = new ArrayList<>();
        for (String t : c.list(column)) {
            String term = vocabulary.termOrAsWritten(field, t);
            if (!vocabulary.knows(field, t)) {
                unknownTerms.add(column.substring(0, column.length() - 1) + ": " + term);
            }
            out.add(term);
        }
        return out;
    }

    private static List<Integer> difficulties(CellReader c) {
        List<Integer> out = new ArrayList<>();
        for (String t : c.list("move_difficulty")) {
            try {
                int d = Integer.parseInt(t.endsWith(".0") ? t.substring(0, t.length() - 2) : t);
                if (d < 1 || d > 10) {
                    c.problem(
                            "move_difficulty",
                            d + " is out of range (expected whole numbers 1 to 10, one per hand move, separated by ;)");
                }
                out.add(d);
            } catch (NumberFormatException e) {
                c.problem(
                        "move_difficulty",
                        "'" + t + "' is not a whole number (expected whole numbers 1 to 10, one per hand move, "
                                + "separated by ;: the scale is coarse on purpose, so round a half up or down)");
            }
        }
        return out;
    }

    private String holdType(CellReader c, Vocabulary vocabulary) {
        String t = c.text("type");
        if (t == null) {
            c.problem(
                    "type",
                    "missing value (expected one of " + String.join(", ", vocabulary.terms(VocabularyField.HOLD_TYPES))
                            + ")");
            return null;
        }
        var term = vocabulary.canonical(VocabularyField.HOLD_TYPES, t);
        if (term.isEmpty()) {
            String near = Columns.nearest(
                    t.toLowerCase(java.util.Locale.ROOT),
                    new ArrayList<>(
                            vocabulary.spellings(VocabularyField.HOLD_TYPES).keySet()));
            String suggestion = near == null
                    ? ""
                    : "did you mean "
                            + vocabulary.spellings(VocabularyField.HOLD_TYPES).get(near) + "? ";
            c.problem(
                    "type",
                    "unknown hold type '" + t + "' (" + suggestion + "expected one of "
                            + String.join(", ", vocabulary.terms(VocabularyField.HOLD_TYPES)) + ")");
            return null;
        }
        return term.get();
    }

    private static HoldRole role(CellReader c, String type) {
        String t = c.text("role");
        if (t == null) {
            return type == null ? HoldRole.HAND : HoldRole.defaultFor(type);
        }
        try {
            return HoldRole.parse(t);
        } catch (IllegalArgumentException e) {
            String near =
                    Columns.nearest(t.toLowerCase(java.util.Locale.ROOT), List.of("hand", "foot", "start", "finish"));
            c.problem(
                    "role",
                    "unknown hold role '" + t + "' (" + (near == null ? "" : "did you mean " + near + "? ")
                            + "expected hand, foot, start or finish)");
            return null;
        }
    }

    private static HoldSize size(CellReader c) {
        String t = c.text("size");
        if (t == null) {
            return null;
        }
        try {
            return HoldSize.parse(t);
        } catch (IllegalArgumentException e) {
            c.problem("size", e.getMessage());
            return null;
        }
    }

    private static List<Double> grips(CellReader c) {
        List<Double> out = new ArrayList<>();
        for (String g : c.list("grip")) {
            try {
                out.add(GripDirection.parse(g));
            } catch (IllegalArgumentException e) {
                c.problem("grip", e.getMessage());
            }
        }
        return out;
    }
}
