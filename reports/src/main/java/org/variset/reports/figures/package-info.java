/**
 * Every figure of docs/spec/metrics.md for one set of routes, computed from plain route records and the gym's settings:
 * which placements are hand grips, what is counted for each variety field and against which vocabulary, grades per
 * discipline, difficulty profiles and route lines. Pure: no database, no PDF.
 */
package org.variset.reports.figures;
