/** The composite 0-100 score of a reset (docs/spec/metrics.md section 7), a heuristic of ours shown beside its parts. */
package org.variset.reports.scoring.score;
