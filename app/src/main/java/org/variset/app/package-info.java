/**
 * The application layer: one class per use case, below every front end. A front end resolves where the archive
 * is, opens a {@link org.variset.app.Workspace} over it, calls a use case with values it parsed, and renders the
 * result (text, HTML, JSON). Each use case owns its transaction, its search-index upkeep and its "today" (in the
 * gym's time zone); none prints, exits or names a front end's controls. Packages are by feature: {@code archive}
 * (init, info, check, reindex, backup, restore, migrate), {@code imports} (import, export, templates),
 * {@code audit}, {@code plan}, {@code trend}, {@code search} (search, similar routes), {@code change} (strip, amend,
 * remove, setter names), {@code settings}, {@code grade} and {@code sample} (generate, demo).
 */
package org.variset.app;
