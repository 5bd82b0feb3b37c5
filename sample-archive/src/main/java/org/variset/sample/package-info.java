/**
 * The invented sample gym, Lantern Rock, as committed interchange files ({@link org.variset.sample.SampleArchive}),
 * and the seeded generator that writes it and larger synthetic chains ({@code generate}).
 */
package org.variset.sample;
