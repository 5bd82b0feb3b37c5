/**
 * Variety of categories (docs/spec/metrics.md section 2): richness, Shannon entropy, Pielou evenness, Gini-Simpson, Hill
 * numbers and coverage of the gym's vocabulary, for hold types, shapes, sizes, moves, styles and angle bands.
 */
package org.variset.reports.scoring.variety;
