/**
 * What goes up on a wall: resets, the routes and boulder problems of each reset, their setters, and every hold
 * placement with its type, size, grip directions and position (docs/spec/interchange.md).
 */
package org.variset.archive.route;
