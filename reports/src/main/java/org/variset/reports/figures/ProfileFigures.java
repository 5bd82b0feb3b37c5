package org.variset.reports.figures;

import java.util.List;
import java.util.Map;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.scoring.profile.DifficultyProfile;
import org.variset.reports.scoring.profile.ProfileClass;

/**
 * Difficulty profiles of a set (docs/spec/metrics.md section 4; JSON key {@code profiles}).
 *
 * @param counts routes per class, every class present, in the spec's order
 * @param splitEntropy entropy of the four class shares over ln 4, or null when no route is classified
 */
public record ProfileFigures(Map<ProfileClass, Long> counts, Double splitEntropy) {

    /** The profiles of the routes' move difficulties. */
    public static ProfileFigures of(List<RouteRecord> routes) {
        Map<ProfileClass, Long> counts = DifficultyProfile.counts(
                routes.stream().map(RouteRecord::moveDifficulty).toList());
        return new ProfileFigures(counts, DifficultyProfile.splitEntropy(counts));
    }

    /** Routes with a class other than unclassified. */
    public long classified() {
        return counts.entrySet().stream()
                .filter(e -> e.getKey() != ProfileClass.UNCLASSIFIED)
                .mapToLong(Map.Entry::getValue)
                .sum();
    }
}
