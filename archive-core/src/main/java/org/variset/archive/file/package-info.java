/** Files Variset writes for people (documents, exports, backups): whole or not at all. */
package org.variset.archive.file;
