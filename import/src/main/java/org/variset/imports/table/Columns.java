package org.variset.imports.table;

import java.util.List;
import java.util.Locale;

/** Column names: how they are compared, and the nearest known name for a near miss. */
public final class Columns {
    private Columns() {}

    /** A header cell as compared with the spec's names: stripped and lower case. */
    public static String normalise(String header) {
        return header == null ? "" : header.strip().toLowerCase(Locale.ROOT);
    }

    /**
     * The known name within two edits of a name, if any (docs/spec/interchange.md: such a column is an error with the
     * suggestion). Short names allow fewer edits, one per three letters of the known name, so that {@code bolt}
     * is not taken for a misspelt {@code role}; a swap of two neighbouring letters counts as one edit.
     */
    public static String nearest(String name, List<String> known) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(name, k);
            if (d <= Math.min(2, Math.max(1, k.length() / 3)) && d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best;
    }

    /**
     * Optimal string alignment distance: the Levenshtein distance (Levenshtein 1966) with a transposition of two
     * adjacent characters as one edit (Damerau 1964).
     */
    public static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(d[i - 1][j - 1] + cost, Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1));
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
