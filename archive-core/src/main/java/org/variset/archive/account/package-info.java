/**
 * The accounts of the web workspace as the archive keeps them ({@code account}, schema version 6): names, roles,
 * the gyms a role is limited to, and password hashes. What a role may do, and how a password is hashed, is decided
 * above the archive (the application layer's {@code account} package).
 */
package org.variset.archive.account;
