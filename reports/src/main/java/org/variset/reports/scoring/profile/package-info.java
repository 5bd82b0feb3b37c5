/** Difficulty profiles within routes (metrics.md section 4): steady, sustained, single-crux, multi-crux. */
package org.variset.reports.scoring.profile;
