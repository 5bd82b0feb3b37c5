/**
 * Writing validated rows into the archive: one import is one transaction (all rows or none), importing the same
 * rows again adds nothing, and a changed row for an existing route is refused with its differences unless the
 * user asks to update. Hold rows are streamed twice (check, then write) instead of being kept in memory.
 */
package org.variset.imports.load;
