/**
 * Grip directions (docs/spec/metrics.md section 1): circular statistics of the directions hand holds face, the Rayleigh
 * test, the axial resultant, and the eight-sector histogram with its entropy.
 */
package org.variset.reports.scoring.grip;
