/**
 * The names a person picks from: a gym's walls ({@link org.variset.app.names.ListWalls}), resets
 * ({@link org.variset.app.names.ListResets}) and setters ({@link org.variset.app.names.ListSetters}), each with
 * what tells them apart.
 */
package org.variset.app.names;
