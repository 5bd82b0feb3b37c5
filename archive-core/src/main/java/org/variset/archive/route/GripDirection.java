package org.variset.archive.route;

import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the direction a hold's usable surface faces, in degrees clockwise from straight up in the wall plane
 * (0 faces up, a classic down-pull; 90 right; 180 down, an undercling; 270 left), from any of the notations of
 * docs/spec/interchange.md: degrees ({@code 90}), a clock position ({@code 4:30}, which is 30 x (H mod 12) + 0.5 x MM
 * degrees) or a word ({@code up-right}). 360 reads as 0; negative values are refused.
 */
public final class GripDirection {
    private static final Pattern CLOCK = Pattern.compile("(\\d{1,2}):(\\d{2})");
    private static final Pattern DEGREES = Pattern.compile("\\d+(\\.\\d+)?");
    private static final Map<String, Double> WORDS = Map.of(
            "up",
            0.0,
            "up-right",
            45.0,
            "right",
            90.0,
            "down-right",
            135.0,
            "down",
            180.0,
            "down-left",
            225.0,
            "left",
            270.0,
            "up-left",
            315.0);
    /** What a grip direction looks like, for error messages. */
    public static final String EXPECTED = "degrees 0-360 clockwise from up, a clock position such as 4:30, or "
            + "up, up-right, right, down-right, down, down-left, left, up-left";

    private GripDirection() {}

    /**
     * Reads one direction.
     *
     * @return degrees in [0, 360)
     * @throws IllegalArgumentException saying what was expected
     */
    public static double parse(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        if (plainNumber(t)) {
            return ofDegrees(Double.parseDouble(t), text);
        }
        Double word = WORDS.get(t);
        if (word != null) {
            return word;
        }
        Matcher clock = CLOCK.matcher(t);
        if (clock.matches()) {
            int h = Integer.parseInt(clock.group(1));
            int mm = Integer.parseInt(clock.group(2));
            if (h < 1 || h > 12 || mm > 59) {
                throw new IllegalArgumentException("'" + text + "' is not a clock position (expected 1:00 to 12:59)");
            }
            return 30.0 * (h % 12) + 0.5 * mm;
        }
        if (DEGREES.matcher(t).matches()) {
            return ofDegrees(Double.parseDouble(t), text);
        }
        throw new IllegalArgumentException("'" + text + "' is not a grip direction (expected " + EXPECTED + ")");
    }

    /** Digits with at most one decimal point: the common case, read without a regular expression. */
    private static boolean plainNumber(String t) {
        if (t.isEmpty() || t.length() > 12) {
            return false;
        }
        int dots = 0;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c == '.') {
                dots++;
            } else if (c < '0' || c > '9') {
                return false;
            }
        }
        return dots <= 1 && t.charAt(0) != '.' && t.charAt(t.length() - 1) != '.';
    }

    /**
     * Checks a direction given as a number.
     *
     * @return degrees in [0, 360); 360 becomes 0
     * @throws IllegalArgumentException outside 0..360 or not finite
     */
    public static double ofDegrees(double degrees, String asWritten) {
        if (!Double.isFinite(degrees) || degrees < 0 || degrees > 360) {
            throw new IllegalArgumentException("grip angle '" + asWritten + "' is outside 0-360 degrees");
        }
        return degrees == 360 ? 0 : degrees;
    }

    /**
     * The time of day a spreadsheet stores for a clock cell (a setter typing 4:30), as a direction.
     *
     * @param hours the hour of the day, 0-23 (4:30 pm reads as 4:30)
     */
    public static double ofClock(int hours, int minutes) {
        return 30.0 * (hours % 12) + 0.5 * minutes;
    }

    /** The direction each of the eight 45-degree sectors faces, sector 0 (up) first, clockwise. */
    private static final String[] SECTOR_WORDS = {
        "up", "up-right", "right", "down-right", "down", "down-left", "left", "up-left"
    };

    /**
     * The sector of a direction: k = floor((θ + 22.5) / 45) mod 8, computed on the degree value (docs/spec/metrics.md section 1),
     * so 22.5 is in sector 1 and 337.5 in sector 0.
     */
    public static int sector(double degrees) {
        return (int) Math.floor((degrees + 22.5) / 45.0) % SECTOR_WORDS.length;
    }

    /** The direction sector k faces, as a word ({@code up}, {@code down-left}). */
    public static String sectorWord(int k) {
        return SECTOR_WORDS[k];
    }
}
