/**
 * Day-to-day changes to the archive without re-importing a file: stripping a wall, taking back a reset,
 * correcting a route, renaming or merging setters. Each change runs in one transaction.
 */
package org.variset.archive.change;
