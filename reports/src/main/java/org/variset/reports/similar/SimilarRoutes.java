package org.variset.reports.similar;

import java.sql.Connection;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.RouteFilter;
import org.variset.archive.read.RouteReader;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingsReader;
import org.variset.reports.figures.RouteFeatureMapper;
import org.variset.reports.scoring.repetition.RouteFeatures;
import org.variset.reports.scoring.repetition.Similarity;

/**
 * Finds the archived routes most like one route. The index proposes candidates (routes sharing a hand-hold direction
 * or a move); each is then scored exactly, so the scores reported do not depend on the index's ranking.
 */
public final class SimilarRoutes {
    /** How many candidates the index proposes for exact scoring. */
    public static final int CANDIDATES = 500;

    private final Connection connection;

    /** Similar routes over a connection the caller keeps open. */
    public SimilarRoutes(Connection connection) {
        this.connection = connection;
    }

    /**
     * The result.
     *
     * @param route the route compared
     * @param comparable false when it has too little detail (fewer than four hold and move features)
     * @param candidates how many routes were scored
     * @param matches the most similar, highest Jaccard first
     */
    public record Result(RouteRecord route, boolean comparable, int candidates, List<Match> matches) {}

    /**
     * One similar route.
     *
     * @param other the route
     * @param similarity its exact similarity, with the shared features
     */
    public record Match(RouteRecord other, Similarity similarity) {}

    /**
     * Finds a route by its label, narrowed by wall and set date when the label names several.
     *
     * @throws IllegalArgumentException listing the routes the label names when it is not one
     */
    public RouteRecord route(String gymName, String label, String wall, LocalDate setOn) {
        GymRecord gym = new ArchiveCatalog(connection).gym(gymName);
        List<RouteRecord> found = new RouteReader(connection)
                        .read(RouteFilter.all().withIds(new ArchiveCatalog(connection).routesLabelled(gym.id(), label)))
                        .stream()
                        .filter(r -> wall == null || r.wall().equalsIgnoreCase(wall.strip()))
                        .filter(r -> setOn == null || r.setOn().equals(setOn))
                        .toList();
        if (found.size() == 1) {
            return found.get(0);
        }
        if (found.isEmpty()) {
            throw new IllegalArgumentException("no route labelled '" + label + "'" + (wall == null ? "" : " on " + wall)
                    + (setOn == null ? "" : " set on " + setOn) + " in " + gym.name());
        }
        throw new InputException(
                InputException.Reason.AMBIGUOUS,
                "'" + label + "' names " + found.size() + " routes of " + gym.name() + ": "
                        + String.join(
                                ", ",
                                found.stream().limit(8).map(RouteRecord::name).toList())
                        + (found.size() > 8 ? ", ..." : ""),
                Remedy.of(Remedy.Kind.NARROW_ROUTE));
    }

    /** The routes most like the given one, at most {@code limit}. */
    public Result find(RouteRecord route, SearchIndex index, GymRecord gym, int limit) {
        GymSettings settings = new SettingsReader(connection).inEffectOn(gym.id(), route.setOn());
        RouteFeatureMapper mapper = new RouteFeatureMapper(settings);
        RouteFeatures mine = mapper.features(route);
        if (!mine.comparable()) {
            return new Result(route, false, 0, List.of());
        }
        List<Long> ids = index.candidates(route, settings.vocabulary(), CANDIDATES);
        List<Match> matches = new ArrayList<>();
        for (RouteRecord other :
                new RouteReader(connection).read(RouteFilter.all().withIds(ids))) {
            Similarity s = Similarity.of(mine, mapper.features(other));
            if (s != null && s.shared() > 0) {
                matches.add(new Match(other, s));
            }
        }
        matches.sort(Comparator.comparingDouble((Match m) -> m.similarity().jaccard())
                .reversed()
                .thenComparing(m -> m.other().setOn(), Comparator.reverseOrder()));
        return new Result(route, true, ids.size(), matches.subList(0, Math.min(limit, matches.size())));
    }
}
