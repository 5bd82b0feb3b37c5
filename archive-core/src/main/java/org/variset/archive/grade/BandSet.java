package org.variset.archive.grade;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * An ordered list of grade bands for one discipline. The defaults are those of docs/spec/grades.md; each gym can
 * replace them.
 */
public final class BandSet {

    private static final BandSet BOULDER = boulderDefaults();
    private static final BandSet ROPE = ropeDefaults();

    private final List<Band> bands;

    /**
     * A band set from bands in ascending order.
     *
     * @throws IllegalArgumentException when the list is empty, or two bands overlap or are out of order
     */
    public BandSet(List<Band> bands) {
        if (bands.isEmpty()) {
            throw new IllegalArgumentException("a band set needs at least one band");
        }
        for (int i = 1; i < bands.size(); i++) {
            Double prevHi = bands.get(i - 1).hi();
            Double lo = bands.get(i).lo();
            if (prevHi == null || lo == null || lo < prevHi) {
                throw new IllegalArgumentException("bands " + bands.get(i - 1).label() + " and "
                        + bands.get(i).label() + " overlap or are out of order");
            }
        }
        this.bands = List.copyOf(bands);
    }

    /** The default bands of a discipline (docs/spec/grades.md). */
    public static BandSet defaults(Discipline discipline) {
        return discipline == Discipline.BOULDER ? BOULDER : ROPE;
    }

    /** The bands, easiest first. */
    public List<Band> bands() {
        return bands;
    }

    /** The band labels, easiest first. */
    public List<String> labels() {
        return bands.stream().map(Band::label).toList();
    }

    /** The band a value falls in; empty where the gym's list leaves a gap or ends. */
    public Optional<Band> bandOf(double ircra) {
        return bands.stream().filter(b -> b.contains(ircra)).findFirst();
    }

    /** The position of a band label in the list, or -1. */
    public int indexOf(String label) {
        return labels().indexOf(label);
    }

    /** Boulders: one band per V grade, edges midway between neighbouring grades' level ranges (docs/spec/grades.md). */
    private static BandSet boulderDefaults() {
        String[] labels = {
            "VB", "V0", "V1", "V2", "V3", "V4", "V5", "V6", "V7", "V8", "V9", "V10", "V11", "V12", "V13", "V14", "V15",
            "V16"
        };
        double[] edges = {10, 13.5, 14.5, 16, 17.5, 18.5, 19.5, 20.5, 21.5, 23, 24.5, 25.5, 26.5, 27.5, 29, 30, 31.5};
        List<Band> out = new ArrayList<>();
        for (int i = 0; i < labels.length; i++) {
            Double lo = i == 0 ? null : edges[i - 1];
            Double hi = i == labels.length - 1 ? null : edges[i];
            out.add(new Band(labels[i], lo, hi));
        }
        return new BandSet(out);
    }

    /** Rope: {@code <4} below 6.5, then one band per French grade from 4 up, [n - 0.5, n + 0.5). */
    private static BandSet ropeDefaults() {
        GradeTable table = GradeTable.standard();
        List<Band> out = new ArrayList<>();
        out.add(new Band("<4", null, 6.5));
        List<String> french = table.grades(GradeScale.FRENCH);
        List<String> fromFour = french.subList(french.indexOf("4"), french.size());
        for (int i = 0; i < fromFour.size(); i++) {
            int level = table.span(GradeScale.FRENCH, fromFour.get(i))[0];
            Double hi = i == fromFour.size() - 1 ? null : level + 0.5;
            out.add(new Band(fromFour.get(i), level - 0.5, hi));
        }
        return new BandSet(out);
    }
}
