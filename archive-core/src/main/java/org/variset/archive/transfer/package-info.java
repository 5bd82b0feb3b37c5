/** Copying a whole archive from one database to another (an embedded archive into a shared one), verified. */
package org.variset.archive.transfer;
