/**
 * The archive's change log ({@code route_change}): every write records which routes it touched, so that each
 * client's search index can catch up without a rebuild (ADR 0003; on a shared archive read by transaction, ADR 0005).
 */
package org.variset.archive.changelog;
