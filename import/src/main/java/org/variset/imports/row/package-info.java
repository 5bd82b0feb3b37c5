/**
 * Validated rows: routes, holds and walls read from table cells, with every problem located as
 * {@code file:line: column}. Names are trimmed and Unicode NFC-normalised; vocabulary spellings become terms.
 */
package org.variset.imports.row;
