package org.variset.archive.grade;

import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * How each scale is written: reads one grade (no slash) of one scale and places it on the axis.
 *
 * <p>Every scale has an ordinal, a whole number that grows by one per grade step, so that grades above the
 * table can extend the axis by one level per step (docs/spec/grades.md, "Grades beyond the table").
 */
final class GradeNotation {

    private static final Pattern V = Pattern.compile("[vV](B|b|\\d{1,2})([+-])?");
    private static final Pattern LETTERED = Pattern.compile("(\\d)([abcABC])?([+-])?");
    private static final Pattern YDS = Pattern.compile("5\\.(\\d{1,2})([a-dA-D])?([+-])?");
    private static final Pattern ARABIC = Pattern.compile("(\\d{1,2})([+-])?");
    private static final Pattern ROMAN = Pattern.compile("([IVXivx]+)([+-])?");
    private static final Pattern NUMBER = Pattern.compile("\\d{1,3}(\\.\\d+)?");
    private static final String[] ROMANS = {
        "I", "II", "III", "IV", "V", "VI", "VII", "VIII", "IX", "X", "XI", "XII", "XIII", "XIV", "XV"
    };

    /**
     * How far above the table a grade may lie and still be read (V20, 9c+/10a, UIAA 13+). Further out a text is
     * far more likely a typing error, or a number of another kind, than a grade; a choice of ours.
     */
    static final int MAX_STEPS_BEYOND = 4;

    /** Marks a grade that cannot extend the table (plain low French or Font numbers). */
    private static final int NO_ORDINAL = Integer.MIN_VALUE;

    private final GradeTable table;

    GradeNotation(GradeTable table) {
        this.table = table;
    }

    /**
     * Reads one grade of one scale.
     *
     * @param token the grade, trimmed, without a slash
     * @param anyCase true when letter case must not decide between Font and French (the scale or the
     *     discipline already did)
     * @return the reading, or null when the token is not a grade of that scale
     */
    Grade read(String text, String token, GradeScale scale, boolean anyCase) {
        return switch (scale) {
            case V -> readV(text, token);
            case FONT -> readLettered(text, token, GradeScale.FONT, anyCase);
            case FRENCH -> readLettered(text, token, GradeScale.FRENCH, anyCase);
            case YDS -> readYds(text, token);
            case UIAA -> readUiaa(text, token);
            case IRCRA -> readIrcra(text, token);
        };
    }

    private Grade readV(String text, String token) {
        Matcher m = V.matcher(token);
        if (!m.matches()) {
            return null;
        }
        String body = m.group(1).toUpperCase(Locale.ROOT);
        int ordinal = body.equals("B") ? -1 : Integer.parseInt(body);
        return place(text, GradeScale.V, "V" + body, m.group(2), ordinal, 16);
    }

    private Grade readLettered(String text, String token, GradeScale scale, boolean anyCase) {
        Matcher m = LETTERED.matcher(token);
        if (!m.matches()) {
            return null;
        }
        String letter = m.group(2);
        if (letter != null && !anyCase && Character.isUpperCase(letter.charAt(0)) != (scale == GradeScale.FONT)) {
            return null;
        }
        String base = m.group(1)
                + (letter == null
                        ? ""
                        : scale == GradeScale.FONT ? letter.toUpperCase(Locale.ROOT) : letter.toLowerCase(Locale.ROOT));
        String mod = m.group(3);
        if (scale == GradeScale.FRENCH && OLDER_FRENCH.containsKey(base)) {
            double at = OLDER_FRENCH.get(base);
            GradeModifier flag = mod == null ? GradeModifier.NONE : GradeModifier.of(mod.charAt(0));
            return new Grade(text, scale, base, at, (int) Math.floor(at), (int) Math.ceil(at), flag, false);
        }
        if (letter == null) {
            return place(text, scale, base, mod, NO_ORDINAL, NO_ORDINAL);
        }
        if ("+".equals(mod)) {
            // On a lettered grade the plus is a grade step of its own (6a to 6a+), also above the table.
            base = base + "+";
            mod = null;
        }
        String top = scale == GradeScale.FONT ? "8C+" : "9b+";
        return place(text, scale, base, mod, ordinalLettered(base), ordinalLettered(top));
    }

    /**
     * Older French grades with letters, on the IRCRA axis: the table has 4 and 4+ at levels 7 and 8, 5 and 5+ at 9
     * and 10, and the three letters of a number are spaced evenly over its two levels (4a 7, 4b 7.5, 4c 8; 5a 9, 5b
     * 9.5, 5c 10). That 4a sits with 4 and 4c with 4+ is common practice, from memory; the even spacing is ours, so
     * that 5a and 5b read as the grades they are (docs/spec/grades.md). A plus or minus on them is kept as a flag.
     */
    static final Map<String, Double> OLDER_FRENCH =
            Map.of("4a", 7.0, "4b", 7.5, "4c", 8.0, "5a", 9.0, "5b", 9.5, "5c", 10.0);

    private Grade readYds(String text, String token) {
        Matcher m = YDS.matcher(token);
        if (!m.matches()) {
            return null;
        }
        int minor = Integer.parseInt(m.group(1));
        String letter = m.group(2) == null ? null : m.group(2).toLowerCase(Locale.ROOT);
        String mod = m.group(3);
        if (minor < 10 && letter != null) {
            return null;
        }
        if (minor >= 10 && letter == null) {
            return ydsWithoutLetter(text, minor, mod);
        }
        String base = "5." + minor + (letter == null ? "" : letter);
        return place(text, GradeScale.YDS, base, mod, ordinalYds(minor, letter), ordinalYds(15, "c"));
    }

    /** YDS 5.10- means 5.10a/b, 5.10+ means 5.10c/d, a bare 5.10 means the mean of 5.10a to 5.10d. */
    private Grade ydsWithoutLetter(String text, int minor, String mod) {
        String[] letters = "-".equals(mod)
                ? new String[] {"a", "b"}
                : "+".equals(mod) ? new String[] {"c", "d"} : new String[] {"a", "b", "c", "d"};
        double sum = 0;
        int lo = Integer.MAX_VALUE;
        int hi = Integer.MIN_VALUE;
        boolean beyond = false;
        for (String l : letters) {
            Grade g = place(text, GradeScale.YDS, "5." + minor + l, null, ordinalYds(minor, l), ordinalYds(15, "c"));
            if (g == null) {
                return null;
            }
            sum += g.ircra();
            lo = Math.min(lo, g.lowLevel());
            hi = Math.max(hi, g.highLevel());
            beyond |= g.beyondTable();
        }
        String canonical = "5." + minor + letters[0] + "/" + letters[letters.length - 1];
        return new Grade(text, GradeScale.YDS, canonical, sum / letters.length, lo, hi, GradeModifier.NONE, beyond);
    }

    private Grade readUiaa(String text, String token) {
        Matcher a = ARABIC.matcher(token);
        Matcher r = ROMAN.matcher(token);
        int n;
        String mod;
        if (a.matches()) {
            n = Integer.parseInt(a.group(1));
            mod = a.group(2);
        } else if (r.matches()) {
            n = fromRoman(r.group(1).toUpperCase(Locale.ROOT));
            mod = r.group(2);
        } else {
            return null;
        }
        if (n < 1) {
            return null;
        }
        String withMod = n + (mod == null ? "" : mod);
        if (table.lists(GradeScale.UIAA, withMod)) {
            return place(text, GradeScale.UIAA, withMod, null, NO_ORDINAL, NO_ORDINAL);
        }
        int ordinal = ordinalUiaa(n, mod);
        if (ordinal > ordinalUiaa(12, null)) {
            return place(text, GradeScale.UIAA, withMod, null, ordinal, ordinalUiaa(12, null));
        }
        return place(text, GradeScale.UIAA, String.valueOf(n), mod, ordinal, ordinalUiaa(12, null));
    }

    private static Grade readIrcra(String text, String token) {
        if (!NUMBER.matcher(token).matches()) {
            return null;
        }
        double v = Double.parseDouble(token);
        if (v < GradeTable.FIRST_LEVEL) {
            return null;
        }
        return new Grade(
                text,
                GradeScale.IRCRA,
                token,
                v,
                (int) Math.floor(v),
                (int) Math.ceil(v),
                GradeModifier.NONE,
                v > GradeTable.LAST_LEVEL);
    }

    /**
     * Places a canonical grade: on its table rows when listed, else (above the top grade) one level per step.
     *
     * @param mod a modifier written after the grade that the table does not list with it, or null
     * @param ordinal the grade's ordinal on its scale, or {@link #NO_ORDINAL} when it cannot lie above the
     *     table; {@code topOrdinal} is that of the table's top grade
     */
    private Grade place(String text, GradeScale scale, String canonical, String mod, int ordinal, int topOrdinal) {
        GradeModifier flag = GradeModifier.NONE;
        if (mod != null) {
            if (table.lists(scale, canonical + mod)) {
                canonical = canonical + mod;
            } else {
                flag = GradeModifier.of(mod.charAt(0));
            }
        }
        int[] span = table.span(scale, canonical);
        if (span != null) {
            return new Grade(text, scale, canonical, (span[0] + span[1]) / 2.0, span[0], span[1], flag, false);
        }
        if (ordinal != NO_ORDINAL && ordinal > topOrdinal && ordinal - topOrdinal <= MAX_STEPS_BEYOND) {
            int level = GradeTable.LAST_LEVEL + (ordinal - topOrdinal);
            return new Grade(text, scale, canonical, level, level, level, flag, true);
        }
        return null;
    }

    /** Font and French: three letters per number, each with a plus step. */
    static int ordinalLettered(String grade) {
        int digit = grade.charAt(0) - '0';
        int letter = Character.toLowerCase(grade.charAt(1)) - 'a';
        return digit * 6 + letter * 2 + (grade.endsWith("+") ? 1 : 0);
    }

    static int ordinalYds(int minor, String letter) {
        return minor < 10 ? minor : 10 + (minor - 10) * 4 + (letter.charAt(0) - 'a');
    }

    static int ordinalUiaa(int n, String mod) {
        return n * 3 + ("-".equals(mod) ? 0 : "+".equals(mod) ? 2 : 1);
    }

    /** The name of the grade of a scale that lies {@code level - 32} steps above the table's top grade. */
    static String extendedName(GradeScale scale, int level) {
        int steps = level - GradeTable.LAST_LEVEL;
        return switch (scale) {
            case V -> "V" + (16 + steps);
            case FONT, FRENCH -> {
                int o = ordinalLettered(scale == GradeScale.FONT ? "8C+" : "9b+") + steps;
                char letter = (char) ((scale == GradeScale.FONT ? 'A' : 'a') + (o % 6) / 2);
                yield (o / 6) + String.valueOf(letter) + (o % 2 == 1 ? "+" : "");
            }
            case YDS -> {
                int o = ordinalYds(15, "c") + steps - 10;
                yield "5." + (10 + o / 4) + (char) ('a' + o % 4);
            }
            case UIAA -> {
                int o = ordinalUiaa(12, null) + steps;
                yield (o / 3) + (o % 3 == 0 ? "-" : o % 3 == 2 ? "+" : "");
            }
            case IRCRA -> String.valueOf(level);
        };
    }

    private static int fromRoman(String roman) {
        for (int i = 0; i < ROMANS.length; i++) {
            if (ROMANS[i].equals(roman)) {
                return i + 1;
            }
        }
        return 0;
    }
}
