package org.variset.reports.pdf;

import java.awt.Color;

/**
 * Colours that people with the common forms of colour-vision deficiency tell apart: the palette of Okabe and Ito.
 * Charts never carry meaning by colour alone: bars and points are labelled, lines differ in dash and marker too.
 *
 * <p>Reference: Okabe M., Ito K. (2008), "Color Universal Design (CUD): how to make figures and presentations that
 * are friendly to colorblind people", J*FLY, https://jfly.uni-koeln.de/color/.
 */
public final class Palette {
    /** Blue, the main data colour. */
    public static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    /** Orange, the second series (targets, references). */
    public static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);
    /** Sky blue. */
    public static final Color SKY = new Color(0x56, 0xB4, 0xE9);
    /** Bluish green. */
    public static final Color GREEN = new Color(0x00, 0x9E, 0x73);
    /** Vermillion, for flags (always with words). */
    public static final Color VERMILLION = new Color(0xD5, 0x5E, 0x00);
    /** Reddish purple. */
    public static final Color PURPLE = new Color(0xCC, 0x79, 0xA7);
    /** Text and rules. */
    public static final Color INK = new Color(0x22, 0x22, 0x22);
    /** Light grey for table headers and boxes. */
    public static final Color SHADE = new Color(0xEE, 0xEE, 0xEE);
    /** Mid grey for secondary text. */
    public static final Color MUTED = new Color(0x66, 0x66, 0x66);

    /** Series colours in order. */
    static final Color[] SERIES = {BLUE, ORANGE, GREEN, VERMILLION, PURPLE, SKY};

    private Palette() {}
}
