/** Difficulty profiles within routes (docs/spec/metrics.md section 4): steady, sustained, single-crux, multi-crux. */
package org.variset.reports.scoring.profile;
