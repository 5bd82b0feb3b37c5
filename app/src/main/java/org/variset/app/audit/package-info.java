/** Auditing a reset, a standing set or a setter's period ({@link org.variset.app.audit.AuditSets}). */
package org.variset.app.audit;
