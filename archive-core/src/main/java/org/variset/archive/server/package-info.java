/**
 * A shared archive's server: its address ({@link org.variset.archive.server.ServerAddress}, never with a password in
 * it), the password from the environment or PostgreSQL's password file, and the first connection that checks the
 * server can hold an archive.
 */
package org.variset.archive.server;
