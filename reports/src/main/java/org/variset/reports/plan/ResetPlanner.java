package org.variset.reports.plan;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
        List<RouteRecord> year = reader.read(
                RouteFilter.gym(gym.id()).withDiscipline(d).setBetween(on.minusDays(YEAR_DAYS), on.plusDays(1)));
        Map<String, String> why = new LinkedHashMap<>();
        List<VarietyGaps.Gap> gaps = gaps(SetFigures.of(sameStanding, settings), SetFigures.of(year, settings), margin);
        if (year.isEmpty()) {
            why.put("gaps", "no " + d.word() + " route was set in the twelve months before " + on);
        }
        Map<String, Long> shapes = shapes(recent);
        if (shapes.isEmpty()) {
            why.put(
                    "shapes_to_rest",
                    recent.isEmpty()
                            ? "the wall has no reset yet"
                            : "no hold_ref recorded on the " + "wall's last three resets");
        }
        ResetPlan.GradeSlots slots = slots(settings, d, n, sameStanding, rest, latest);
        if (slots == null) {
            why.put("slots", "the gym has no grade target for " + d.word() + " routes");
        }
        return new ResetPlan(gym.name(), wall.name(), on, d, n, slots, gaps, margin, shapes, why);
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
        double sum = java.util.Arrays.stream(shares).sum();
        shares = java.util.Arrays.stream(shares).map(s -> s / sum).toArray();
        GradeSlotPlanner.Result r = GradeSlotPlanner.plan(restCounts, shares, n, prevCounts);
        GradeFigures now = GradeDistribution.of(
                sameStanding.stream().mapToDouble(RouteRecord::ircra).toArray(), bandSet, target);
        long outside = rest.size() - java.util.Arrays.stream(restCounts).sum();
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

    private static List<VarietyGaps.Gap> gaps(SetFigures standing, SetFigures year, double margin) {
        List<VarietyGaps.Gap> out = new ArrayList<>();
        out.addAll(VarietyGaps.of("grip", sectors(standing), sectors(year), margin));
        out.addAll(
                VarietyGaps.of("holds", standing.holds().counts(), year.holds().counts(), margin));
        out.addAll(
                VarietyGaps.of("moves", standing.moves().counts(), year.moves().counts(), margin));
        out.addAll(VarietyGaps.of(
                "styles", standing.styles().counts(), year.styles().counts(), margin));
        return out;
    }

    private static Map<String, Long> sectors(SetFigures f) {
        Map<String, Long> m = new LinkedHashMap<>();
        for (int i = 0; i < 8; i++) {
            m.put(CircularStatistics.sectorWord(i), (long) f.grip().sectors().get(i));
        }
        return m;
    }

    private Map<String, Long> shapes(List<ResetRecord> recent) {
        Map<String, Long> out = new LinkedHashMap<>();
        for (ResetRecord r : recent) {
            for (RouteRecord route : reader.read(RouteFilter.reset(r.id()))) {
                for (HoldRecord h : route.holds()) {
                    if (h.holdRef() != null) {
                        out.merge(h.holdRef(), 1L, Long::sum);
                    }
                }
            }
        }
        List<Map.Entry<String, Long>> sorted = new ArrayList<>(out.entrySet());
        sorted.sort(Map.Entry.<String, Long>comparingByValue().reversed().thenComparing(Map.Entry.comparingByKey()));
        Map<String, Long> ordered = new LinkedHashMap<>();
        sorted.forEach(e -> ordered.put(e.getKey(), e.getValue()));
        return ordered;
    }
}
