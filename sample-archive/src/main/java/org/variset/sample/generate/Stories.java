package org.variset.sample.generate;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;

/**
 * The stories planted in the sample gym Lantern Rock (invented, as are its setters), each for an audit to find:
 * <ul>
 * <li>Rafe Kalder reaches for up-facing crimps far too often (a setter audit's habit finding);</li>
 * <li>the Prow keeps to 26 hold shapes, each turned the same way, reset after reset (hold reuse);</li>
 * <li>in the last summer no V5 or V6 boulder goes up, so by mid-August the gym has none (a grade gap);</li>
 * <li>the Cave's last reset repeats a problem set about six months earlier (a near-repeat);</li>
 * <li>the Slab's last reset is 78 days before the sample's end, with a 28-day cycle (overdue).</li>
 * </ul>
 */
public final class Stories {
    /** The sample gym's name. */
    public static final String GYM = "Lantern Rock";
    /** Its setters (invented). */
    public static final List<String> SETTERS =
            List.of("Mira Holt", "Jon Vale", "Tess Orrin", "Rafe Kalder", "Ines Marlow", "Dov Saari");
    /** The setter with the up-facing crimps. */
    public static final String CRIMP_SETTER = "Rafe Kalder";
    /** The share of that setter's hand holds that are up-facing crimps (others: about one in ten). */
    static final double CRIMP_SHARE = 0.5;
    /** The wall that keeps reusing its hold shapes. */
    public static final String REUSE_WALL = "Prow";
    /** The wall whose last reset repeats an earlier problem. */
    public static final String REPEAT_WALL = "Cave";
    /** The wall that goes overdue. */
    public static final String OVERDUE_WALL = "Slab";
    /** Days from the Slab's last reset to the sample's end. */
    static final int OVERDUE_BY = 78;
    /** The grades not set in the last summer. */
    public static final Set<String> GAP_GRADES = Set.of("V5", "V6");

    private Stories() {}

    /** The grades not to set on a day: V5 and V6 from June to August of the sample's last year. */
    static Set<String> avoidedGrades(LocalDate day, LocalDate end) {
        LocalDate from = LocalDate.of(end.getYear(), 6, 1);
        LocalDate to = LocalDate.of(end.getYear(), 8, 31);
        return day.isBefore(from) || day.isAfter(to) ? Set.of() : GAP_GRADES;
    }

    /** True for the reset whose first problem the Cave's last reset repeats: about six months before the end. */
    static boolean isRepeatSource(LocalDate day, LocalDate end) {
        return !day.isBefore(end.minusDays(200)) && day.isBefore(end.minusDays(160));
    }

    /**
     * A problem that repeats an earlier one: its holds shifted a little along the wall (all by the same amount, the
     * whole route staying on the wall), its moves and grade, under a new label.
     */
    static GeneratedRoute repeatOf(GeneratedRoute earlier, GeneratedRoute now, double wallWidthM, SplittableRandom r) {
        List<GeneratedRoute.Hold> holds = new ArrayList<>();
        double left = earlier.holds().stream()
                .mapToDouble(GeneratedRoute.Hold::x)
                .min()
                .orElse(0);
        double right = earlier.holds().stream()
                .mapToDouble(GeneratedRoute.Hold::x)
                .max()
                .orElse(0);
        double lo = Math.max(-1, 0.2 - left);
        double hi = Math.min(1, wallWidthM - 0.2 - right);
        double dx = lo > hi ? 0 : lo + r.nextDouble() * (hi - lo);
        for (GeneratedRoute.Hold h : earlier.holds()) {
            holds.add(new GeneratedRoute.Hold(
                    h.seq(),
                    h.role(),
                    h.type(),
                    h.size(),
                    h.grips(),
                    h.ref(),
                    Math.round((h.x() + dx) * 100) / 100.0,
                    h.y()));
        }
        return new GeneratedRoute(
                now.label(),
                earlier.grade(),
                now.setters(),
                now.color(),
                earlier.moves(),
                earlier.styles(),
                earlier.difficulty(),
                holds);
    }
}
