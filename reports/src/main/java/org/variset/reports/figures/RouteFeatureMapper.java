package org.variset.reports.figures;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.variset.archive.grade.Band;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.reports.scoring.grip.CircularStatistics;
import org.variset.reports.scoring.repetition.RouteEvidence;
import org.variset.reports.scoring.repetition.RouteFeatures;
import org.variset.reports.scoring.variety.AngleBand;

/**
 * Turns archive routes into the inputs of the repetition figures (docs/spec/metrics.md section 5): feature sets compared
 * within a discipline, and the (hold_ref, sector) keys of hold reuse.
 */
public final class RouteFeatureMapper {
    private final GymSettings settings;

    /** Features under the gym's bands. */
    public RouteFeatureMapper(GymSettings settings) {
        this.settings = settings;
    }

    /** The features of a route, named by {@link RouteRecord#name()}, grouped by discipline. */
    public RouteFeatures features(RouteRecord r) {
        List<RouteFeatures.HandHold> hand = new ArrayList<>();
        for (HoldRecord h : r.handHoldsInOrder()) {
            hand.add(new RouteFeatures.HandHold(
                    h.type(),
                    h.grips().stream()
                            .map(CircularStatistics::sector)
                            .distinct()
                            .toList()));
        }
        String angle = r.angleDeg() == null ? null : AngleBand.label(AngleBand.of(r.angleDeg()));
        String grade = settings.bands(r.discipline())
                .bandOf(r.ircra())
                .map(Band::label)
                .orElse(null);
        List<RouteEvidence.Shape> shapes = new ArrayList<>();
        for (HoldRecord h : r.handHoldsInOrder()) {
            if (h.holdRef() != null) {
                shapes.add(new RouteEvidence.Shape(h.holdRef(), h.xM(), h.yM()));
            }
        }
        return RouteFeatures.of(
                r.name(),
                r.discipline().word(),
                hand,
                r.moves(),
                angle,
                grade,
                new RouteEvidence(r.wall(), grade, r.moves(), shapes));
    }

    /** The features of every route. */
    public List<RouteFeatures> features(List<RouteRecord> routes) {
        return routes.stream().map(this::features).toList();
    }

    /**
     * The (hold_ref, sector) keys of each placement of the routes ({@code J12@0}, {@code J12@none}); empty for a
     * placement without hold_ref.
     */
    public static List<Set<String>> reuseKeys(List<RouteRecord> routes) {
        List<Set<String>> out = new ArrayList<>();
        for (RouteRecord r : routes) {
            for (HoldRecord h : r.holds()) {
                Set<String> keys = new LinkedHashSet<>();
                if (h.holdRef() != null) {
                    if (h.grips().isEmpty()) {
                        keys.add(h.holdRef() + "@none");
                    }
                    h.grips()
                            .forEach(g -> keys.add(
                                    h.holdRef() + "@" + RouteFeatures.sectorDegrees(CircularStatistics.sector(g))));
                }
                out.add(keys);
            }
        }
        return out;
    }
}
