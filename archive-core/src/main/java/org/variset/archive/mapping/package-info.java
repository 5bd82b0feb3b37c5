/**
 * How value lists and extra fields are written to the database: small JSON columns for the ordered lists a
 * route owns (moves, styles, move difficulties, grip directions) and for the extra columns users bring.
 */
package org.variset.archive.mapping;
