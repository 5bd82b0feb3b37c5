/** Finding past routes: the query language ({@link org.variset.app.search.SearchRoutes}) and similar routes. */
package org.variset.app.search;
