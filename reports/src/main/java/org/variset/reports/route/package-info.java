/** How one route reads for people: its heading, moves, and holds by type and direction. */
package org.variset.reports.route;
