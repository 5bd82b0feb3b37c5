package org.variset.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The figures of one benchmark run, printed as they come and written as a Markdown table at the end. */
final class Results {
    /**
     * One compared figure.
     *
     * @param what what was measured
     * @param variset Variset's figure, as shown
     * @param baseline the baseline's figure, as shown
     * @param ratio Variset over the baseline (for throughput: baseline time over Variset time, the same sense)
     * @param target the largest ratio the target allows, or NaN when there is none
     * @param note how it was measured
     */
    record Row(String what, String variset, String baseline, double ratio, double target, String note) {
        boolean met() {
            return Double.isNaN(target) || ratio <= target;
        }

        String verdict() {
            return Double.isNaN(target) ? "" : met() ? "met" : "MISSED";
        }

        String targetText() {
            return Double.isNaN(target) ? "-" : String.format(Locale.ROOT, "<= %.1fx", target);
        }
    }

    private final List<Row> rows = new ArrayList<>();
    private final List<String> facts = new ArrayList<>();

    void add(Row r) {
        rows.add(r);
        System.out.printf(
                Locale.ROOT,
                "  %-44s variset %-14s baseline %-14s ratio %5.2fx  %s%n",
                r.what(),
                r.variset(),
                r.baseline(),
                r.ratio(),
                r.verdict());
    }

    /** A figure that has no baseline (memory, sizes). */
    void fact(String text) {
        facts.add(text);
        System.out.println("  " + text);
    }

    List<Row> rows() {
        return rows;
    }

    boolean allMet() {
        return rows.stream().allMatch(Row::met);
    }

    String markdownTable() {
        StringBuilder b = new StringBuilder();
        b.append("| measure | Variset | baseline | ratio | target | |\n|---|---|---|---|---|---|\n");
        for (Row r : rows) {
            b.append(String.format(
                    Locale.ROOT,
                    "| %s | %s | %s | %.2fx | %s | %s |%n",
                    r.what(),
                    r.variset(),
                    r.baseline(),
                    r.ratio(),
                    r.targetText(),
                    r.verdict()));
        }
        return b.toString();
    }

    String markdownNotes() {
        StringBuilder b = new StringBuilder();
        for (Row r : rows) {
            if (!r.note().isEmpty()) {
                b.append("- ").append(r.what()).append(": ").append(r.note()).append('\n');
            }
        }
        return b.toString();
    }

    List<String> facts() {
        return facts;
    }
}
