package org.variset.imports.load;

import java.util.Locale;
import org.variset.imports.table.Columns;

/**
 * When two names are likely one thing written twice: "Milk slab" and "Milk Slab", "K. Ames" and "K Ames", "Dario
 * Penhale" and "Dario Penhal". A heuristic of ours (DEVELOPERS.md, "Decisions the specs leave open"):
 * <ul>
 *   <li>the same once case, spaces and the marks {@code . - _ '} are left out; or</li>
 *   <li>within one edit (an insertion, deletion, substitution or swap of neighbours) in lower case, for names of five
 *       letters or more, or two edits for names of twelve or more;</li>
 *   <li>but never when their digits differ: "Cave 1" and "Cave 2" are two walls, "Green 1" and "Green 2" two
 *       routes.</li>
 * </ul>
 */
final class NearNames {
    private NearNames() {}

    /** True when two different names are probably the same one. */
    static boolean near(String a, String b) {
        if (a.equals(b) || !digits(a).equals(digits(b))) {
            return false;
        }
        if (bare(a).equals(bare(b))) {
            return true;
        }
        String x = a.toLowerCase(Locale.ROOT);
        String y = b.toLowerCase(Locale.ROOT);
        int shorter = Math.min(x.length(), y.length());
        int allowed = shorter >= 12 ? 2 : shorter >= 5 ? 1 : 0;
        return allowed > 0 && Columns.distance(x, y) <= allowed;
    }

    /** How two near names differ, in words: "differs only in case", "differs only in spacing", "one letter apart". */
    static String how(String a, String b) {
        if (a.equalsIgnoreCase(b)) {
            return "differs only in case";
        }
        if (bare(a).equals(bare(b))) {
            return "differs only in case, spaces or marks";
        }
        int d = Columns.distance(a.toLowerCase(Locale.ROOT), b.toLowerCase(Locale.ROOT));
        return d == 1 ? "one letter apart" : d + " letters apart";
    }

    private static String bare(String s) {
        return s.toLowerCase(Locale.ROOT).replaceAll("[\\s.\\-_']", "");
    }

    private static String digits(String s) {
        return s.replaceAll("\\D", "");
    }
}
