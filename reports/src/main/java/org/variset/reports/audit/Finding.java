package org.variset.reports.audit;

/**
 * One thing an audit found, in plain words.
 *
 * @param kind what it is about ({@code grip}, {@code near_repeat}, {@code grade_gap}, ...)
 * @param weight how much it matters, for ordering (higher first)
 * @param text the sentence
 */
public record Finding(String kind, double weight, String text) {}
