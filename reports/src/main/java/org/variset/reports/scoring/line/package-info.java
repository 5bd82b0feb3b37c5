/** The line a route takes (docs/spec/metrics.md section 6): path length, convex hull, geometric index of entropy, spans. */
package org.variset.reports.scoring.line;
