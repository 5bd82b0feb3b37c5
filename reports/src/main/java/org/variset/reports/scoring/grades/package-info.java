/**
 * Grades against the gym's target (docs/spec/metrics.md section 3): the histogram over the band list, the Wasserstein-1
 * distance to the target, Pearson's chi-square goodness of fit with its reliability flag, and the gaps.
 */
package org.variset.reports.scoring.grades;
