/**
 * Import and export of the interchange formats (docs/spec/interchange.md): CSV, XLSX and JSON. Problems in
 * input are reported as {@code file:line: column: what is wrong (what was expected)}, several per run.
 *
 * <p>{@code table} reads files into rows of cells, {@code row} turns cells into validated routes, holds and walls,
 * {@code load} writes them into the archive in one transaction.
 */
package org.variset.imports;
