/**
 * Repetition (docs/spec/metrics.md section 5): each route's namespaced feature set, the Jaccard index between routes,
 * near-repeat pairs against the look-back window and inside a reset, novelty, and hold reuse.
 */
package org.variset.reports.scoring.repetition;
