/**
 * Per-gym settings with the date each value took effect (target grade shares, bands, near-repeat threshold,
 * look-back, reach, score weights, reset cycles, vocabulary), so that an old audit is reproduced with the settings of
 * its day. {@link org.variset.archive.settings.SettingKey} reads and writes each value's text;
 * {@link org.variset.archive.settings.GymSettings} is what is in effect on one day, defaults included.
 */
package org.variset.archive.settings;
