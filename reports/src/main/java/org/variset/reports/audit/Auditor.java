package org.variset.reports.audit;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.ResetRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingsReader;
import org.variset.reports.figures.RouteFeatureMapper;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.repetition.Repetition;
import org.variset.reports.scoring.repetition.RepetitionFigures;

/**
 * Reads what an audit needs from the archive and hands it to the pure figures: for a reset, its routes, the gym's
 * routes set in the look-back window before it (docs/spec/metrics.md section 5), the wall's previous three resets (hold
 * reuse), the gym's routes up on its day (grades part of the score, and context), and the wall's previous reset
 * audited the same way for comparison.
 */
public final class Auditor {
    private final ArchiveCatalog catalog;
    private final RouteReader reader;
    private final SettingsReader settingsReader;

    /** Audits over a connection the caller keeps open. */
    public Auditor(Connection connection) {
        this.catalog = new ArchiveCatalog(connection);
        this.reader = new RouteReader(connection);
        this.settingsReader = new SettingsReader(connection);
    }

    /**
     * Audits a target.
     *
     * @throws IllegalArgumentException when the target names what the archive does not hold (the message lists
     *     what it does)
     */
    public Audit audit(AuditTarget target) {
        if (target instanceof AuditTarget.LatestReset l && l.on() == null
                || target instanceof AuditTarget.SetterPeriod p && p.to() == null) {
            throw new IllegalStateException("give the target its day first (AuditTarget.onDay): " + target);
        }
        GymRecord gym = catalog.gym(target.gym());
        if (target instanceof AuditTarget.Reset r) {
            return auditReset(gym, catalog.reset(gym, r.label()));
        }
        if (target instanceof AuditTarget.LatestReset l) {
            WallRecord wall = catalog.wall(gym, l.wall());
            ResetRecord reset =
                    catalog.latestResetOnOrBefore(wall.id(), l.on()).orElseThrow(() -> noReset(wall, l.on()));
            return auditReset(gym, reset);
        }
        if (target instanceof AuditTarget.Standing s) {
            return auditStanding(gym, s.wall() == null ? null : catalog.wall(gym, s.wall()), s.on());
        }
        return auditSetter(gym, (AuditTarget.SetterPeriod) target);
    }

    /** The reset a wall had on a day, for callers that need it before auditing. */
    public ResetRecord resetOn(String gymName, String wallName, LocalDate on) {
        GymRecord gym = catalog.gym(gymName);
        WallRecord wall = catalog.wall(gym, wallName);
        return catalog.latestResetOnOrBefore(wall.id(), on).orElseThrow(() -> noReset(wall, on));
    }

    private IllegalArgumentException noReset(WallRecord wall, LocalDate on) {
        List<ResetRecord> all = catalog.resetsOfWall(wall.id());
        return new IllegalArgumentException("wall " + wall.name() + " has no reset on or before " + on
                + (all.isEmpty()
                        ? " (it has none yet)"
                        : " (its first is " + all.get(0).label() + " on "
                                + all.get(0).resetOn() + ")"));
    }

    private Audit auditReset(GymRecord gym, ResetRecord reset) {
        LocalDate day = reset.resetOn();
        GymSettings settings = settingsReader.inEffectOn(gym.id(), day);
        List<RouteRecord> routes = reader.read(RouteFilter.reset(reset.id()));
        List<RouteRecord> standing = reader.read(RouteFilter.gym(gym.id()).standingOn(day));
        SetFigures standingFigures = SetFigures.of(standing, settings);
        List<RouteRecord> window = window(gym, reset, settings);
        SetResult audited = resetResult("this reset", reset, routes, window, standingFigures, settings);
        SetResult previous = catalog.resetsBefore(reset, 1).stream()
                .findFirst()
                .map(p -> {
                    GymSettings s = settingsReader.inEffectOn(gym.id(), p.resetOn());
                    SetFigures pStanding =
                            SetFigures.of(reader.read(RouteFilter.gym(gym.id()).standingOn(p.resetOn())), s);
                    return resetResult(
                            "previous reset " + p.label(),
                            p,
                            reader.read(RouteFilter.reset(p.id())),
                            window(gym, p, s),
                            pStanding,
                            s);
                })
                .orElse(null);
        SetResult reference = SetResults.context("gym, routes up on " + day, standing, standingFigures, settings);
        Subject subject = new Subject(Subject.Kind.RESET, gym.name(), reset.wall(), reset.label(), day, null, null);
        Map<String, Double> moveShares = moveShares(window, SetResults.mainDiscipline(routes));
        return Findings.complete(new Audit(subject, settings, audited, previous, reference, moveShares, List.of()));
    }

    private SetResult resetResult(
            String name,
            ResetRecord reset,
            List<RouteRecord> routes,
            List<RouteRecord> window,
            SetFigures standing,
            GymSettings settings) {
        RouteFeatureMapper m = new RouteFeatureMapper(settings);
        RepetitionFigures rep = Repetition.of(m.features(routes), m.features(window), settings.nearRepeatThreshold());
        List<ResetRecord> before = catalog.resetsBefore(reset, 3);
        Set<String> previousKeys = new HashSet<>();
        before.forEach(b -> RouteFeatureMapper.reuseKeys(reader.read(RouteFilter.reset(b.id())))
                .forEach(previousKeys::addAll));
        // Routes compare within a discipline: the window's count is of the routes this reset is compared with.
        Set<Discipline> disciplines = new HashSet<>();
        routes.forEach(r -> disciplines.add(r.discipline()));
        int compared = (int) window.stream()
                .filter(w -> disciplines.contains(w.discipline()))
                .count();
        return SetResults.reset(name, routes, compared, rep, before.isEmpty(), previousKeys, standing, settings);
    }

    /** The gym's routes set in [day − look-back, day), not of the reset (docs/spec/metrics.md section 5). */
    private List<RouteRecord> window(GymRecord gym, ResetRecord reset, GymSettings settings) {
        LocalDate day = reset.resetOn();
        return reader.read(RouteFilter.gym(gym.id())
                .withoutReset(reset.id())
                .setBetween(day.minusDays(settings.lookbackDays()), day));
    }

    private Audit auditStanding(GymRecord gym, WallRecord wall, LocalDate day) {
        GymSettings settings = settingsReader.inEffectOn(gym.id(), day);
        List<RouteRecord> gymRoutes = reader.read(RouteFilter.gym(gym.id()).standingOn(day));
        SetFigures gymFigures = SetFigures.of(gymRoutes, settings);
        Subject subject;
        SetResult audited;
        SetResult reference = null;
        if (wall == null) {
            subject = new Subject(Subject.Kind.GYM_STANDING, gym.name(), null, null, day, null, null);
            audited = SetResults.standing("routes up", gymRoutes, gymFigures, gymFigures, settings);
        } else {
            subject = new Subject(Subject.Kind.WALL_STANDING, gym.name(), wall.name(), null, day, null, null);
            List<RouteRecord> onWall =
                    gymRoutes.stream().filter(r -> r.wall().equals(wall.name())).toList();
            audited = SetResults.standing("routes up", onWall, SetFigures.of(onWall, settings), gymFigures, settings);
            reference = SetResults.context("gym, routes up on " + day, gymRoutes, gymFigures, settings);
        }
        return Findings.complete(new Audit(subject, settings, audited, null, reference, Map.of(), List.of()));
    }

    private Audit auditSetter(GymRecord gym, AuditTarget.SetterPeriod p) {
        catalog.setterId(p.setter());
        GymSettings settings = settingsReader.inEffectOn(gym.id(), p.to());
        List<RouteRecord> period = reader.read(RouteFilter.gym(gym.id()).setBetween(p.from(), p.to().plusDays(1)));
        String name = p.setter().strip();
        List<RouteRecord> mine =
                period.stream().filter(r -> r.setters().contains(name)).toList();
        List<RouteRecord> others =
                period.stream().filter(r -> !r.setters().contains(name)).toList();
        SetFigures standing =
                SetFigures.of(reader.read(RouteFilter.gym(gym.id()).standingOn(p.to())), settings);
        SetResult audited =
                SetResults.standing("routes of " + name, mine, SetFigures.of(mine, settings), standing, settings);
        SetResult reference =
                SetResults.context("other setters, same period", others, SetFigures.of(others, settings), settings);
        Subject subject = new Subject(Subject.Kind.SETTER, gym.name(), null, null, p.to(), p.from(), name);
        return Findings.complete(new Audit(subject, settings, audited, null, reference, Map.of(), List.of()));
    }

    /** The share of the window's routes of a discipline that list each move. */
    private static Map<String, Double> moveShares(List<RouteRecord> window, Discipline d) {
        List<RouteRecord> same =
                window.stream().filter(r -> r.discipline() == d).toList();
        Map<String, Double> out = new LinkedHashMap<>();
        for (RouteRecord r : same) {
            for (String m : new HashSet<>(r.moves())) {
                out.merge(m, 1.0 / same.size(), Double::sum);
            }
        }
        return out;
    }
}
