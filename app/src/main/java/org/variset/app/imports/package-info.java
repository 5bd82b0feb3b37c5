/**
 * Interchange files in and out: import files into the archive ({@link org.variset.app.imports.ImportFiles}, all or
 * nothing, then the index), export a gym ({@link org.variset.app.imports.ExportGym}), write the starting templates.
 */
package org.variset.app.imports;
