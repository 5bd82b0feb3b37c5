/**
 * The archive's own use cases: create one ({@link org.variset.app.archive.InitArchive}), say what it holds
 * ({@link org.variset.app.archive.ArchiveInfo}), check and repair it, rebuild its index, back it up, restore it and
 * copy it onto a server ({@link org.variset.app.archive.MigrateArchive}).
 */
package org.variset.app.archive;
