/**
 * How figures read in text and PDF: one formatter, half-up, a fixed number of decimals per key (docs/spec/metrics.md). JSON
 * carries the unrounded values.
 */
package org.variset.reports.format;
