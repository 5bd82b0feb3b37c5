/** Reading one archived route, for a route's page. */
package org.variset.app.route;
