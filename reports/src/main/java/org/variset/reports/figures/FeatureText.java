package org.variset.reports.figures;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/** Feature sets (docs/spec/metrics.md section 5) in words: "same crimp@0 and pinch@90 holds, same heel hook > dyno". */
public final class FeatureText {
    private FeatureText() {}

    /** "same crimp@0 and pinch@90 holds, same heel hook > dyno" from the shared features. */
    public static String shared(Set<String> features) {
        List<String> holds = new ArrayList<>();
        List<String> pairs = new ArrayList<>();
        List<String> moves = new ArrayList<>();
        for (String x : features) {
            if (x.startsWith("hold:")) {
                holds.add(x.substring(5));
            } else if (x.startsWith("pair:")) {
                pairs.add(x.substring(5).replace(">", " > "));
            } else if (x.startsWith("move:")) {
                moves.add(x.substring(5));
            }
        }
        moves.removeIf(m -> pairs.stream().anyMatch(p -> p.startsWith(m + " > ") || p.endsWith(" > " + m)));
        holds.sort(java.util.Comparator.comparing((String h) -> h.substring(0, h.indexOf('@')))
                .thenComparing(h -> h.endsWith("@none") ? 360 : Integer.parseInt(h.substring(h.indexOf('@') + 1))));
        List<String> chains = chains(pairs);
        pairs.clear();
        pairs.addAll(chains);
        List<String> parts = new ArrayList<>();
        if (!holds.isEmpty()) {
            parts.add("same " + list(holds, 4) + (holds.size() == 1 ? " hold" : " holds"));
        }
        if (!pairs.isEmpty() || !moves.isEmpty()) {
            List<String> m = new ArrayList<>(pairs);
            m.addAll(moves);
            parts.add("same " + list(m, 4));
        }
        return parts.isEmpty() ? "same grade and angle" : String.join(", ", parts);
    }

    /** Joins pairs that follow on into chains: "heel hook > dyno" and "dyno > match" read "heel hook > dyno > match". */
    public static List<String> chains(List<String> pairs) {
        List<String> out = new ArrayList<>(pairs);
        boolean joined = true;
        while (joined) {
            joined = false;
            for (int i = 0; i < out.size() && !joined; i++) {
                for (int j = 0; j < out.size() && !joined; j++) {
                    String a = out.get(i);
                    String b = out.get(j);
                    String last = a.substring(a.lastIndexOf(" > ") + 3);
                    if (i != j && b.startsWith(last + " > ")) {
                        out.set(i, a + b.substring(last.length()));
                        out.remove(j);
                        joined = true;
                    }
                }
            }
        }
        return out;
    }

    /** "a, b and c", or "a, b, c and 2 more" beyond max. */
    public static String list(List<String> items, int max) {
        if (items.size() > max) {
            return String.join(", ", items.subList(0, max)) + " and " + (items.size() - max) + " more";
        }
        if (items.size() == 1) {
            return items.get(0);
        }
        return String.join(", ", items.subList(0, items.size() - 1)) + " and " + items.get(items.size() - 1);
    }
}
