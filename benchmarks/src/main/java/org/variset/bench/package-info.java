/**
 * The benchmark harness: synthetic chains from the sample generator, Variset measured beside a floor of plain library
 * calls doing the same work, figures written to BENCHMARKS.md. Run by {@code benchmarks/run}, never by the default
 * build.
 */
package org.variset.bench;
