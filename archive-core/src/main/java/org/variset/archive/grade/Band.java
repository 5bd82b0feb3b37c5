package org.variset.archive.grade;

import java.util.Objects;

/**
 * One band of grades: a half-open interval [lo, hi) on the IRCRA axis. A value on an edge belongs to the
 * upper band (docs/spec/grades.md, "Default bands").
 *
 * @param label the band's name ({@code V3}, {@code 6b+}, {@code <4})
 * @param lo the lower edge, included; null for a band open below
 * @param hi the upper edge, excluded; null for a band open above
 */
public record Band(String label, Double lo, Double hi) {

    /** Checks that the label is present and the edges are in order. */
    public Band {
        Objects.requireNonNull(label, "label");
        if (lo != null && hi != null && !(lo < hi)) {
            throw new IllegalArgumentException("band " + label + ": lower edge " + lo + " is not below " + hi);
        }
    }

    /** True when the value lies in [lo, hi). */
    public boolean contains(double value) {
        return (lo == null || value >= lo) && (hi == null || value < hi);
    }
}
