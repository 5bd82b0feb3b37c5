package org.variset.reports.audit;

import org.variset.archive.problem.Remedy;

/**
 * One thing an audit found, in plain words.
 *
 * @param kind what it is about ({@code grip}, {@code near_repeat}, {@code grade_gap}, ...)
 * @param weight how much it matters, for ordering (higher first)
 * @param text the sentence, in neutral words
 * @param remedy what the gym can do about it beyond resetting differently (set a target, say), for the front end to
 *     word; {@link Remedy#NONE} for most findings
 */
public record Finding(String kind, double weight, String text, Remedy remedy) {

    /** A finding whose remedy is the next reset itself. */
    public Finding(String kind, double weight, String text) {
        this(kind, weight, text, Remedy.NONE);
    }
}
