/**
 * The archive as plain values for reading: routes with their holds and setters, gyms, walls and resets, read with
 * JDBC on the archive's own connection. Audits, search and reports read through here, so a command that only reads
 * never boots Hibernate; entities ({@code archive.route}, {@code archive.gym}) are for changing the archive.
 */
package org.variset.archive.read;
