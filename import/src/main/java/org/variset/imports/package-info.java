/** Readers and writers of the interchange formats (interchange.md), with validation. Filled by the import work. */
package org.variset.imports;
