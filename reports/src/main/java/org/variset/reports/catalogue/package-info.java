/**
 * The one catalogue of figures: every figure an audit, plan or trend reports, with its JSON key, its label for
 * people, its unit and decimals, which direction is better, and its source. JSON writers, the text and PDF renderers,
 * trends and the web read it here; adding a figure means computing it and adding one entry (DEVELOPERS.md).
 */
package org.variset.reports.catalogue;
