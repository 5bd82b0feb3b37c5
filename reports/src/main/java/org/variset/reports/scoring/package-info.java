/**
 * The pure scoring functions of docs/spec/metrics.md: no database, no PDF. One package per metric family; each function
 * documents its formula, edge cases and references, and returns null with a reason where a metric is undefined.
 */
package org.variset.reports.scoring;
