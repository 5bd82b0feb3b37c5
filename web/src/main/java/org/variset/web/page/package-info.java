/**
 * The pages of the web workspace, one class per feature: each reads through the application layer's use cases
 * (never SQL, scoring or PDF code of its own) and hands a view to its template.
 */
package org.variset.web.page;
