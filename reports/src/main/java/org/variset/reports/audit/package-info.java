/**
 * Audits: a reset, a standing set or one setter's routes, read from the archive and scored with the figures of
 * docs/spec/metrics.md, beside the wall's previous reset and the gym's standing set, with findings in plain words.
 * {@link org.variset.reports.audit.Auditor} reads; everything after the read is pure.
 */
package org.variset.reports.audit;
