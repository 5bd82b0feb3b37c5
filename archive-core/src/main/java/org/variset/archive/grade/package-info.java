/**
 * Grade scales: reading grades as setters write them (V, Font, YDS, French, UIAA, IRCRA), placing every
 * grade on the IRCRA reporting axis, converting between scales, and sorting values into bands.
 *
 * <p>The axis and its comparison table come from Draper N. et al. (2015), "Comparative grading scales,
 * statistical analyses, climber descriptors and ability grouping: International Rock Climbing Research
 * Association position statement", Sports Technology 8(3-4):88-94, DOI 10.1080/19346182.2015.1107081. The
 * table is data ({@code ircra-table.csv} beside these classes), not code.
 */
package org.variset.archive.grade;
