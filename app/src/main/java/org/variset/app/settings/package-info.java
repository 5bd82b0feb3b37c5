/** A gym's settings: what is in effect on a day, changes from a day on, and their history. */
package org.variset.app.settings;
