/**
 * Writing the archive back out in the interchange formats, so that export then import gives the same content.
 * Text cells a spreadsheet would run as a formula are neutralised in CSV and XLSX (OWASP, "CSV Injection"); the
 * import restores them.
 */
package org.variset.imports.export;
