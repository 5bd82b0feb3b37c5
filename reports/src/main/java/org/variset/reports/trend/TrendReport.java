package org.variset.reports.trend;

import java.sql.Connection;
import java.time.LocalDate;
import java.time.YearMonth;
import java.time.temporal.ChronoUnit;
import java.util.AbstractMap;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.variset.archive.grade.Discipline;
import org.variset.archive.gym.WallDiscipline;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.ResetRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingsReader;
import org.variset.reports.audit.Headline;
import org.variset.reports.audit.SetResult;
import org.variset.reports.audit.SetResults;
import org.variset.reports.figures.GradeGaps;
import org.variset.reports.figures.RouteFeatureMapper;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.repetition.Repetition;
import org.variset.reports.scoring.repetition.RepetitionFigures;

/**
 * Computes a gym's trends over a period. It reads the gym's routes up at some point between the earliest look-back
 * start and the period's end once; standing sets, look-back windows and reset scores come from that read.
 */
public final class TrendReport {
    private final ArchiveCatalog catalog;
    private final RouteReader reader;
    private final SettingsReader settingsReader;

    /** Trends over a connection the caller keeps open. */
    public TrendReport(Connection connection) {
        this.catalog = new ArchiveCatalog(connection);
        this.reader = new RouteReader(connection);
        this.settingsReader = new SettingsReader(connection);
    }

    /**
     * The trends of a gym from {@code from} to {@code to}, wall status reckoned on {@code today} when that comes
     * before the period's end.
     *
     * @throws IllegalArgumentException for an unknown gym or a period that ends before it starts
     */
    public Trend of(String gymName, LocalDate from, LocalDate to, LocalDate today) {
        if (from.isAfter(to)) {
            throw new IllegalArgumentException("the period starts (" + from + ") after it ends (" + to + ")");
        }
        GymRecord gym = catalog.gym(gymName);
        LocalDate asOf = today.isBefore(to) && !today.isBefore(from) ? today : to;
        GymSettings endSettings = settingsReader.inEffectOn(gym.id(), to);
        int lookback = Math.max(
                endSettings.lookbackDays(),
                settingsReader.inEffectOn(gym.id(), from).lookbackDays());
        List<RouteRecord> all = reader.read(RouteFilter.gym(gym.id()).upBetween(from.minusDays(lookback), to));
        List<WallRecord> walls = catalog.walls(gym.id());
        List<ResetRecord> resets = catalog.resetsOfGym(gym.id(), from, to);
        List<Trend.Repeat> repeats = new ArrayList<>();
        Map<String, List<Double>> scores = resetScores(gym, resets, all, repeats);
        List<RouteRecord> setInPeriod = all.stream()
                .filter(r -> !r.setOn().isBefore(from) && !r.setOn().isAfter(to))
                .toList();
        Map<Discipline, Boolean> example = new EnumMap<>(Discipline.class);
        for (Discipline d : Discipline.values()) {
            example.put(d, endSettings.target(d) != null && endSettings.targetIsDefault(d));
        }
        return new Trend(
                gym.name(),
                from,
                to,
                asOf,
                months(gym, walls, all, from, asOf),
                status(gym, walls, resets, scores, asOf),
                TrendMath.lifetime(all, from, asOf),
                TrendMath.setters(setInPeriod),
                SetFigures.of(setInPeriod, endSettings).grades(),
                example,
                repeats,
                setInPeriod.size(),
                scores.values().stream()
                        .flatMap(List::stream)
                        .filter(java.util.Objects::nonNull)
                        .mapToDouble(Double::doubleValue)
                        .average()
                        .stream()
                        .boxed()
                        .findFirst()
                        .orElse(null));
    }

    /** Month-end points up to {@code to} (the period's end, or today when earlier: no point lies ahead). */
    private List<Trend.MonthPoint> months(
            GymRecord gym, List<WallRecord> walls, List<RouteRecord> all, LocalDate from, LocalDate to) {
        List<Trend.MonthPoint> out = new ArrayList<>();
        // Months before the gym's first set have nothing to show: the points start at the month of the first set.
        LocalDate first =
                all.stream().map(RouteRecord::setOn).min(LocalDate::compareTo).orElse(from);
        YearMonth start = YearMonth.from(first.isAfter(from) ? first : from);
        for (YearMonth m = start; !m.atDay(1).isAfter(to); m = m.plusMonths(1)) {
            LocalDate day = m.atEndOfMonth().isAfter(to) ? to : m.atEndOfMonth();
            GymSettings s = settingsReader.inEffectOn(gym.id(), day);
            List<RouteRecord> up = all.stream().filter(r -> r.standingOn(day)).toList();
            SetFigures gymFigures = SetFigures.of(up, s);
            out.add(point(day, "gym", SetResults.standing("gym", up, gymFigures, gymFigures, s)));
            for (WallRecord w : walls) {
                List<RouteRecord> onWall =
                        up.stream().filter(r -> r.wall().equals(w.name())).toList();
                // A wall's own score: without the gym's grades part, it moves only when the wall's routes do.
                out.add(point(day, w.name(), SetResults.standing(w.name(), onWall, SetFigures.of(onWall, s), null, s)));
            }
        }
        return out;
    }

    private static Trend.MonthPoint point(LocalDate day, String scope, SetResult r) {
        Map<String, List<String>> gaps = new java.util.LinkedHashMap<>();
        r.figures().grades().forEach((d, g) -> {
            List<String> notable = GradeGaps.notable(g);
            if (!notable.isEmpty()) {
                gaps.put(d.word(), notable);
            }
        });
        return new Trend.MonthPoint(day, scope, r.routes().size(), Headline.of(r), gaps);
    }

    /** Scores each reset of the period as an audit does, collecting its near-repeats. */
    private Map<String, List<Double>> resetScores(
            GymRecord gym, List<ResetRecord> resets, List<RouteRecord> all, List<Trend.Repeat> repeats) {
        Map<String, List<Double>> out = new java.util.LinkedHashMap<>();
        for (ResetRecord reset : resets) {
            LocalDate day = reset.resetOn();
            GymSettings s = settingsReader.inEffectOn(gym.id(), day);
            List<RouteRecord> routes =
                    all.stream().filter(r -> r.reset().equals(reset.label())).toList();
            List<RouteRecord> window = all.stream()
                    .filter(r -> !r.reset().equals(reset.label())
                            && !r.setOn().isBefore(day.minusDays(s.lookbackDays()))
                            && r.setOn().isBefore(day))
                    .toList();
            List<RouteRecord> standing =
                    all.stream().filter(r -> r.standingOn(day)).toList();
            RouteFeatureMapper m = new RouteFeatureMapper(s);
            RepetitionFigures rep = Repetition.of(m.features(routes), m.features(window), s.nearRepeatThreshold());
            rep.nearRepeats().forEach(p -> repeats.add(new Trend.Repeat(reset.label(), p)));
            SetResult r = SetResults.reset(
                    reset.label(), routes, window.size(), rep, false, null, SetFigures.of(standing, s), s);
            out.computeIfAbsent(reset.wall(), k -> new ArrayList<>())
                    .add(r.score().score());
        }
        repeats.sort((a, b) -> Double.compare(
                b.pair().similarity().jaccard(), a.pair().similarity().jaccard()));
        return out;
    }

    private List<Trend.WallStatus> status(
            GymRecord gym,
            List<WallRecord> walls,
            List<ResetRecord> resets,
            Map<String, List<Double>> scores,
            LocalDate asOf) {
        GymSettings s = settingsReader.inEffectOn(gym.id(), asOf);
        List<Trend.WallStatus> out = new ArrayList<>();
        for (WallRecord w : walls) {
            List<Map.Entry<String, LocalDate>> mine = resets.stream()
                    .filter(r -> r.wallId() == w.id())
                    .map(r -> (Map.Entry<String, LocalDate>)
                            new AbstractMap.SimpleImmutableEntry<>(r.label(), r.resetOn()))
                    .toList();
            Discipline d = w.discipline() == WallDiscipline.ROPE ? Discipline.ROPE : Discipline.BOULDER;
            int cycle = s.cycleDays(w, d);
            LocalDate last = catalog.latestResetOnOrBefore(w.id(), asOf)
                    .map(ResetRecord::resetOn)
                    .orElse(null);
            Long since = last == null ? null : ChronoUnit.DAYS.between(last, asOf);
            String status = since == null
                    ? "never reset"
                    : since <= cycle ? "ok" : since <= cycle + s.overdueAfterDays() ? "due" : "overdue";
            List<Double> sc = scores.getOrDefault(w.name(), List.of()).stream()
                    .filter(Objects::nonNull)
                    .toList();
            Double mean = sc.isEmpty()
                    ? null
                    : sc.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
            out.add(new Trend.WallStatus(w.name(), d, mine, mean, last, since, cycle, s.overdueAfterDays(), status));
        }
        return out;
    }
}
