package org.variset.reports.plan;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.variset.archive.grade.Band;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.gym.WallDiscipline;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.ResetRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingsReader;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.grades.GradeDistribution;
import org.variset.reports.scoring.grades.GradeFigures;
import org.variset.reports.scoring.grip.CircularStatistics;

/**
 * Plans a wall's next reset from the archive: the gym's routes up that day without the wall's (they come down), the
 * target, the wall's latest reset (tie-break), the gym's routes set over the last twelve months (variety gaps) and
 * the wall's last three resets (shapes to rest).
 */
public final class ResetPlanner {
    /** The default margin for variety gaps: five share points (a heuristic of ours). */
    public static final double DEFAULT_MARGIN = 0.05;

    private static final int YEAR_DAYS = 365;
    /** Walls within this many degrees of each other are alike for the baseline (a heuristic of ours). */
    static final double LIKE_ANGLE_DEG = 15;
    /** How many shapes to rest a plan lists (a heuristic of ours: a setter's morning, not an inventory). */
    static final int SHAPES_LISTED = 12;

    private final ArchiveCatalog catalog;
    private final RouteReader reader;
    private final SettingsReader settingsReader;

    /** Plans over a connection the caller keeps open. */
    public ResetPlanner(Connection connection) {
        this.catalog = new ArchiveCatalog(connection);
        this.reader = new RouteReader(connection);
        this.settingsReader = new SettingsReader(connection);
    }

    /**
     * Plans n routes for a wall's reset on a day.
     *
     * @throws IllegalArgumentException for an unknown gym or wall, or n below 1
     */
    public ResetPlan plan(String gymName, String wallName, LocalDate on, int n, double margin) {
        if (n < 1) {
            throw new IllegalArgumentException("a reset brings at least one route, not " + n);
        }
        GymRecord gym = catalog.gym(gymName);
        WallRecord wall = catalog.wall(gym, wallName);
        GymSettings settings = settingsReader.inEffectOn(gym.id(), on);
        List<RouteRecord> standing = reader.read(RouteFilter.gym(gym.id()).standingOn(on));
        List<ResetRecord> recent = new ArrayList<>(
                catalog.latestResetOnOrBefore(wall.id(), on).stream().toList());
        if (!recent.isEmpty()) {
            recent.addAll(catalog.resetsBefore(recent.get(0), 2));
        }
        List<RouteRecord> latest = recent.isEmpty()
                ? List.of()
                : reader.read(RouteFilter.reset(recent.get(0).id()));
        Discipline d = discipline(wall, latest);
        List<RouteRecord> sameStanding =
                standing.stream().filter(r -> r.discipline() == d).toList();
        List<RouteRecord> rest =
                sameStanding.stream().filter(r -> !r.wall().equals(wall.name())).toList();
        List<String> like = similarWalls(gym, wall);
        List<RouteRecord> year = reader
                .read(RouteFilter.gym(gym.id()).withDiscipline(d).setBetween(on.minusDays(YEAR_DAYS), on.plusDays(1)))
                .stream()
                .filter(r -> like.contains(r.wall()))
                .toList();
        List<RouteRecord> standingLike =
                sameStanding.stream().filter(r -> like.contains(r.wall())).toList();
        Map<String, String> why = new LinkedHashMap<>();
        Map<String, List<RouteRecord>> byReset = new LinkedHashMap<>();
        year.forEach(
                r -> byReset.computeIfAbsent(r.reset(), k -> new ArrayList<>()).add(r));
        List<SetFigures> resets =
                byReset.values().stream().map(rs -> SetFigures.of(rs, settings)).toList();
        List<VarietyGaps.Gap> gaps = gaps(SetFigures.of(standingLike, settings), resets, margin);
        if (year.isEmpty()) {
            why.put(
                    "gaps",
                    "no " + d.word() + " route was set on " + String.join(", ", like) + " in the twelve months before "
                            + on);
        }
        ResetPlan.Baseline baseline = new ResetPlan.Baseline(like, resets.size());
        Shapes shapes = shapes(recent);
        if (shapes.ranked().isEmpty()) {
            why.put(
                    "shapes_to_rest",
                    recent.isEmpty()
                            ? "the wall has no reset yet"
                            : "no hand hold of the wall's last three resets names its hold shape (hold_ref)");
        }
        ResetPlan.GradeSlots slots = slots(settings, d, n, sameStanding, rest, latest);
        if (slots == null) {
            why.put("slots", "the gym has no grade target for " + d.word() + " routes");
        }
        return new ResetPlan(
                gym.name(), wall.name(), on, d, n, slots, gaps, margin, baseline, shapes.ranked(), shapes.all(), why);
    }

    /** The grade slots closest to the target once the wall's routes come down, or null without a target. */
    private static ResetPlan.GradeSlots slots(
            GymSettings settings,
            Discipline d,
            int n,
            List<RouteRecord> sameStanding,
            List<RouteRecord> rest,
            List<RouteRecord> latest) {
        Map<String, Double> target = settings.target(d);
        if (target == null) {
            return null;
        }
        BandSet bandSet = settings.bands(d);
        List<String> bands =
                bandSet.labels().stream().filter(target::containsKey).toList();
        long[] restCounts = counts(rest, bandSet, bands);
        long[] prevCounts = counts(latest, bandSet, bands);
        double[] shares = bands.stream().mapToDouble(target::get).toArray();
        double sum = Arrays.stream(shares).sum();
        shares = Arrays.stream(shares).map(s -> s / sum).toArray();
        GradeSlotPlanner.Result r = GradeSlotPlanner.plan(restCounts, shares, n, prevCounts);
        GradeFigures now = GradeDistribution.of(
                sameStanding.stream().mapToDouble(RouteRecord::ircra).toArray(), bandSet, target);
        long outside = rest.size() - Arrays.stream(restCounts).sum();
        return new ResetPlan.GradeSlots(
                bands,
                restCounts,
                shares,
                r.slots(),
                now.emdToTarget(),
                r.distanceAfter(),
                outside,
                settings.targetIsDefault(d),
                prevCounts);
    }

    /**
     * The day a wall's reset after the given one falls due: that reset's date plus the wall's cycle (settings in
     * effect on that date).
     */
    public LocalDate nextDue(String gymName, String wallName, LocalDate resetOn) {
        GymRecord gym = catalog.gym(gymName);
        WallRecord wall = catalog.wall(gym, wallName);
        List<RouteRecord> routes = catalog.latestResetOnOrBefore(wall.id(), resetOn)
                .map(r -> reader.read(RouteFilter.reset(r.id())))
                .orElse(List.of());
        return resetOn.plusDays(settingsReader.inEffectOn(gym.id(), resetOn).cycleDays(wall, discipline(wall, routes)));
    }

    private static Discipline discipline(WallRecord wall, List<RouteRecord> latest) {
        if (wall.discipline() == WallDiscipline.ROPE) {
            return Discipline.ROPE;
        }
        if (wall.discipline() == WallDiscipline.BOULDER || latest.isEmpty()) {
            return Discipline.BOULDER;
        }
        long rope =
                latest.stream().filter(r -> r.discipline() == Discipline.ROPE).count();
        return rope * 2 > latest.size() ? Discipline.ROPE : Discipline.BOULDER;
    }

    private static long[] counts(List<RouteRecord> routes, BandSet bandSet, List<String> bands) {
        long[] c = new long[bands.size()];
        for (RouteRecord r : routes) {
            int i = bandSet.bandOf(r.ircra())
                    .map(Band::label)
                    .map(bands::indexOf)
                    .orElse(-1);
            if (i >= 0) {
                c[i]++;
            }
        }
        return c;
    }

    /**
     * Categories behind: each field's share now (on walls like this one) against the median share of the last
     * twelve months' resets there, so that one reset unlike the others does not set the baseline.
     */
    private static List<VarietyGaps.Gap> gaps(SetFigures now, List<SetFigures> resets, double margin) {
        List<VarietyGaps.Gap> out = new ArrayList<>();
        out.addAll(gap("grip", ResetPlanner::sectors, now, resets, margin));
        out.addAll(gap("holds", f -> f.holds().counts(), now, resets, margin));
        out.addAll(gap("moves", f -> f.moves().counts(), now, resets, margin));
        out.addAll(gap("styles", f -> f.styles().counts(), now, resets, margin));
        return out;
    }

    private static List<VarietyGaps.Gap> gap(
            String field,
            Function<SetFigures, Map<String, Long>> counts,
            SetFigures now,
            List<SetFigures> resets,
            double margin) {
        return VarietyGaps.ofShares(
                field,
                VarietyGaps.shares(counts.apply(now)),
                VarietyGaps.medianShares(resets.stream().map(counts).toList()),
                margin);
    }

    /**
     * The walls whose resets make the baseline: the gym's walls within {@value #LIKE_ANGLE_DEG} degrees of this
     * wall's angle (a cave's moves are not a slab's), all walls when this one has no angle; always this one.
     */
    private List<String> similarWalls(GymRecord gym, WallRecord wall) {
        List<String> out = new ArrayList<>();
        for (WallRecord w : catalog.walls(gym.id())) {
            boolean like = w.id() == wall.id()
                    || wall.angleDeg() == null
                    || w.angleDeg() != null && Math.abs(w.angleDeg() - wall.angleDeg()) <= LIKE_ANGLE_DEG;
            if (like) {
                out.add(w.name());
            }
        }
        return out;
    }

    private static Map<String, Long> sectors(SetFigures f) {
        Map<String, Long> m = new LinkedHashMap<>();
        for (int i = 0; i < 8; i++) {
            m.put(CircularStatistics.sectorWord(i), (long) f.grip().sectors().get(i));
        }
        return m;
    }

    /** The hand-hold shapes of the last resets, ranked, and how many there were in all. */
    private record Shapes(Map<String, Long> ranked, int all) {}

    /**
     * The hand-hold shapes (hold_ref) of the wall's last three resets, most used first (by how many of those resets
     * used them, then by placements), at most {@value #SHAPES_LISTED}: the shapes a setter would rest first. Foot
     * holds are left out (a foot chip rested teaches nothing).
     */
    private Shapes shapes(List<ResetRecord> recent) {
        Map<String, Long> placements = new LinkedHashMap<>();
        Map<String, Set<Long>> resetsUsing = new LinkedHashMap<>();
        for (ResetRecord r : recent) {
            for (RouteRecord route : reader.read(RouteFilter.reset(r.id()))) {
                for (HoldRecord h : route.handHoldsInOrder()) {
                    if (h.holdRef() != null) {
                        placements.merge(h.holdRef(), 1L, Long::sum);
                        resetsUsing
                                .computeIfAbsent(h.holdRef(), k -> new HashSet<>())
                                .add(r.id());
                    }
                }
            }
        }
        List<String> sorted = new ArrayList<>(placements.keySet());
        sorted.sort(Comparator.comparing((String k) -> -resetsUsing.get(k).size())
                .thenComparing(k -> -placements.get(k))
                .thenComparing(k -> k));
        Map<String, Long> ranked = new LinkedHashMap<>();
        sorted.stream().limit(SHAPES_LISTED).forEach(k -> ranked.put(k, placements.get(k)));
        return new Shapes(ranked, placements.size());
    }
}
