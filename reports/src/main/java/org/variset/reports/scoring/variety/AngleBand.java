package org.variset.reports.scoring.variety;

/**
 * The wall-angle band of a route (docs/spec/metrics.md section 2): band k = [15k, 15k + 15) degrees from vertical, with 90
 * in the last band [75, 90]. Slabs (negative angles, down to -45) fall in negative bands: -10 is in band -1.
 */
public final class AngleBand {
    private AngleBand() {}

    /**
     * The band index of an angle.
     *
     * @throws IllegalArgumentException outside -45..90 degrees
     */
    public static int of(double angleDeg) {
        if (!(angleDeg >= -45 && angleDeg <= 90)) {
            throw new IllegalArgumentException("angle " + angleDeg + " is outside -45..90 degrees");
        }
        return angleDeg == 90 ? 5 : (int) Math.floor(angleDeg / 15.0);
    }

    /** The band as a label: {@code 15-30}, {@code -15-0}. */
    public static String label(int band) {
        return (15 * band) + "-" + (15 * band + 15);
    }
}
