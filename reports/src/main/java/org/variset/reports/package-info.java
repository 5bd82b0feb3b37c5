/** Pure variety metrics, audits, planning and PDF documents. Filled by the metrics and report work. */
package org.variset.reports;
