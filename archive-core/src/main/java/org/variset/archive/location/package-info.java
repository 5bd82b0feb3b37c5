/**
 * Where the archive of a run lives: an option, then the environment, then the configuration file, then the XDG data
 * folder ({@link org.variset.archive.location.ArchiveLocation}). Front ends name their own options; this package only
 * knows where each value came from.
 */
package org.variset.archive.location;
