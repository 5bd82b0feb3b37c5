/**
 * Charts drawn as SVG on the server, into the page: bars of a distribution against its target, the rose of grip
 * directions, and a route's sketch. Plain code over numbers, with every text escaped, and no script.
 */
package org.variset.web.chart;
