package org.variset.archive.grade;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Reads grades as setters write them (docs/spec/grades.md, "Reading a grade").
 *
 * <p>The scale is taken, in this order, from the explicit scale (a file's {@code grade_scale} cell or the
 * command line), from the scales the gym writes for the discipline, or inferred from the text among the
 * discipline's scales (boulder: V, Font; rope: YDS, French, UIAA; without a discipline, all five). IRCRA numbers
 * are read only when the scale is given as {@code ircra}. A text that fits two candidate scales is an error
 * naming both readings.
 *
 * <p>Letter case separates Font (6A+) from French (6a+) only when nothing else does: a boulder grade written in
 * lower case is still Font, and a rope grade in upper case is still French.
 */
public final class GradeReader {

    private static final GradeReader STANDARD = new GradeReader(GradeTable.standard());
    private static final String EXPECTED = "expected a grade such as V4, V0+ or V3/4 (V-scale), 6B+ (Font), "
            + "5.10c (YDS), 6a+ (French), VI+ or 7- (UIAA), or a number with the scale ircra";

    private final GradeTable table;
    private final GradeNotation notation;

    /** A reader over the given table. */
    public GradeReader(GradeTable table) {
        this.table = table;
        this.notation = new GradeNotation(table);
    }

    /** A reader over the standard IRCRA table. */
    public static GradeReader standard() {
        return STANDARD;
    }

    /** The table this reader places grades on. */
    public GradeTable table() {
        return table;
    }

    /**
     * Reads a grade.
     *
     * @param text the grade as written
     * @param discipline the route's discipline, or null when unknown
     * @param scale the scale named explicitly, or null to infer it
     * @param gymScales the scales the gym writes for this discipline (may be empty)
     * @return the reading
     * @throws GradeException when the text is no grade, or fits two scales and nothing chooses between them
     */
    public Grade read(String text, Discipline discipline, GradeScale scale, Set<GradeScale> gymScales) {
        String token = text == null ? "" : text.strip();
        if (token.isEmpty()) {
            throw new GradeException("empty grade (" + EXPECTED + ")", List.of());
        }
        if (scale != null) {
            Grade g = readIn(text, token, scale, true);
            if (g == null) {
                throw new GradeException(
                        "'" + token + "' is not a " + scale.displayName() + " grade (" + EXPECTED + ")", List.of());
            }
            return g;
        }
        Set<GradeScale> candidates = candidates(discipline);
        if (gymScales != null && !gymScales.isEmpty()) {
            Set<GradeScale> preferred = EnumSet.copyOf(gymScales);
            preferred.retainAll(candidates);
            List<Grade> fits = fits(text, token, preferred, discipline != null);
            if (fits.size() == 1) {
                return fits.get(0);
            }
        }
        List<Grade> fits = fits(text, token, candidates, discipline != null);
        if (fits.size() == 1) {
            return fits.get(0);
        }
        if (fits.isEmpty()) {
            String where = discipline == null ? "" : " for a " + discipline.word() + " route";
            throw new GradeException("'" + token + "' is not a grade" + where + " (" + EXPECTED + ")", List.of());
        }
        throw new GradeException(ambiguity(token, discipline, fits), fits);
    }

    /** Reads a grade with nothing but its text. */
    public Grade read(String text) {
        return read(text, null, null, Set.of());
    }

    private static Set<GradeScale> candidates(Discipline discipline) {
        Set<GradeScale> all = EnumSet.noneOf(GradeScale.class);
        for (GradeScale s : GradeScale.values()) {
            if (s != GradeScale.IRCRA && (discipline == null || s.discipline() == discipline)) {
                all.add(s);
            }
        }
        return all;
    }

    private List<Grade> fits(String text, String token, Set<GradeScale> scales, boolean disciplineKnown) {
        List<Grade> fits = new ArrayList<>();
        for (GradeScale s : scales) {
            Grade g = readIn(text, token, s, disciplineKnown);
            if (g != null) {
                fits.add(g);
            }
        }
        return fits;
    }

    private static String ambiguity(String token, Discipline discipline, List<Grade> fits) {
        String readings = fits.stream()
                .map(g -> g.describe() + " (IRCRA " + g.ircraText() + ")")
                .collect(Collectors.joining(" or "));
        String where = discipline == null ? "" : " for a " + discipline.word() + " route";
        return "'" + token + "' fits more than one scale" + where + ": " + readings;
    }

    /** One scale; a slash grade reads as the mean of its two grades, the second may be abbreviated (V3/4). */
    private Grade readIn(String text, String token, GradeScale scale, boolean anyCase) {
        int slash = token.indexOf('/');
        if (slash < 0) {
            return notation.read(text, token, scale, anyCase);
        }
        String left = token.substring(0, slash).strip();
        String right = token.substring(slash + 1).strip();
        Grade a = notation.read(text, left, scale, anyCase);
        if (a == null || right.isEmpty() || right.indexOf('/') >= 0) {
            return null;
        }
        Grade b = null;
        for (int k = 0; k < left.length() && b == null; k++) {
            Grade candidate = notation.read(text, left.substring(0, k) + right, scale, anyCase);
            if (candidate != null && candidate.ircra() > a.ircra()) {
                b = candidate;
            }
        }
        if (b == null) {
            return null;
        }
        return new Grade(
                text,
                scale,
                a.canonical() + "/" + b.canonical(),
                (a.ircra() + b.ircra()) / 2,
                Math.min(a.lowLevel(), b.lowLevel()),
                Math.max(a.highLevel(), b.highLevel()),
                GradeModifier.NONE,
                a.beyondTable() || b.beyondTable());
    }
}
