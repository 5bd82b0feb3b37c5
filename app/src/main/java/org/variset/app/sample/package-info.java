/**
 * The invented sample gym: writing it (or large synthetic chains) as interchange files
 * ({@link org.variset.app.sample.GenerateSample}), and the demo that loads, audits and reports on it
 * ({@link org.variset.app.sample.RunDemo}).
 */
package org.variset.app.sample;
