/**
 * Day-to-day changes: a wall was reset ({@link org.variset.app.change.StripWall}), a route's fields are corrected
 * ({@link org.variset.app.change.AmendRoute}), a mistaken import is taken back
 * ({@link org.variset.app.change.RemoveRoutes}), a setter's name is fixed ({@link org.variset.app.change.SetterNames}).
 * Each is one transaction, then the search index.
 */
package org.variset.app.change;
