package org.variset.imports.table;

import java.util.List;
import java.util.Locale;

/** Column names: how they are compared, and the nearest known name for a near miss. */
public final class Columns {
    private Columns() {
    }

    /** A header cell as compared with the spec's names: stripped and lower case. */
    public static String normalise(String header) {
        return header == null ? "" : header.strip().toLowerCase(Locale.ROOT);
    }

    /**
     * The known name within two edits of a name, if any (interchange.md: such a column is an error with the
     * suggestion).
     */
    public static String nearest(String name, List<String> known) {
        String best = null;
        int bestDistance = 3;
        for (String k : known) {
            int d = distance(name, k);
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best;
    }

    /** Levenshtein distance (Levenshtein 1966): insertions, deletions and substitutions, each costing one. */
    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int sub = prev[j - 1] + (a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1);
                cur[j] = Math.min(sub, Math.min(prev[j] + 1, cur[j - 1] + 1));
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
