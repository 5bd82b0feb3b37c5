package org.variset.imports.load;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.hibernate.Session;
import org.variset.imports.ProblemList;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;

/**
 * Finds the route a hold row names, among the import's routes and the archive's. A hold names its route by
 * (gym, label, set_on); the wall is needed only when two walls have a route with that label and date.
 */
final class RouteResolver {
    private record Name(String gym, String label, LocalDate setOn) {}

    private final Session session;
    private final Map<Name, List<RouteKey>> inFile = new HashMap<>();
    private final Map<String, Map<Name, List<RouteKey>>> archivedByGym = new HashMap<>();
    private final java.util.Set<Name> badRows = new java.util.HashSet<>();

    RouteResolver(Session session, Iterable<RouteKey> fileRoutes, Iterable<RouteKey> badRouteRows) {
        this.session = session;
        for (RouteKey k : fileRoutes) {
            // Almost every name is one route: keep a one-element list until a second key comes.
            inFile.merge(new Name(k.gym(), k.label(), k.setOn()), List.of(k), RouteResolver::concat);
        }
        badRouteRows.forEach(k -> badRows.add(new Name(k.gym(), k.label(), k.setOn())));
    }

    /** The key of the hold's route, or null after recording a problem (when problems is not null). */
    RouteKey resolve(HoldRow h, ProblemList problems) {
        Name n = new Name(h.gym(), h.route(), h.setOn());
        List<RouteKey> candidates = new ArrayList<>(inFile.getOrDefault(n, List.of()));
        for (RouteKey k : archive(n)) {
            if (!candidates.contains(k)) {
                candidates.add(k);
            }
        }
        if (h.wall() != null) {
            candidates.removeIf(k -> !Objects.equals(k.wall(), h.wall()));
        }
        if (candidates.size() == 1) {
            return candidates.get(0);
        }
        if (candidates.isEmpty() && badRows.contains(n)) {
            return null; // its route row was refused and reported; its holds go with it
        }
        if (problems != null) {
            String route = "route " + h.route() + " of " + h.setOn() + " in " + h.gym();
            if (candidates.isEmpty()) {
                problems.add(
                        h.file(),
                        h.line(),
                        "route",
                        route + (h.wall() == null ? "" : " on " + h.wall())
                                + " is neither in the import nor in the archive"
                                + nearLabel(n)
                                        .map(l -> "; did you mean '" + l + "', the route of that day "
                                                + "with a label written almost the same?")
                                        .orElse(" (expected a row for it in the routes file)"));
            } else {
                problems.add(
                        h.file(),
                        h.line(),
                        "wall",
                        route + " is on more than one wall ("
                                + String.join(
                                        ", ",
                                        candidates.stream().map(RouteKey::wall).toList())
                                + "); give the wall column");
            }
        }
        return null;
    }

    /** A label of the same gym and day, in the files or the archive, that the given one is probably a slip for. */
    private Optional<String> nearLabel(Name n) {
        List<Name> known = new ArrayList<>(inFile.keySet());
        known.addAll(archivedByGym.computeIfAbsent(n.gym(), this::loadGym).keySet());
        return known.stream()
                .filter(k -> k.gym().equals(n.gym()) && k.setOn().equals(n.setOn()))
                .map(Name::label)
                .filter(l -> NearNames.near(n.label(), l))
                .sorted()
                .findFirst();
    }

    /** True when the archive already holds a route with this key. */
    boolean archived(RouteKey k) {
        return archive(new Name(k.gym(), k.label(), k.setOn())).contains(k);
    }

    private List<RouteKey> archive(Name n) {
        return archivedByGym.computeIfAbsent(n.gym(), this::loadGym).getOrDefault(n, List.of());
    }

    /** Every route key of one gym, read once with one query (not one query per hold or route). */
    private Map<Name, List<RouteKey>> loadGym(String gym) {
        Map<Name, List<RouteKey>> out = new HashMap<>();
        session.createSelectionQuery(
                        "select r.label, r.setOn, r.wall.name from Route r where r.gym.name = :g", Object[].class)
                .setParameter("g", gym)
                .getResultList()
                .forEach(row -> {
                    RouteKey k = new RouteKey(gym, (String) row[2], (String) row[0], (LocalDate) row[1]);
                    out.merge(new Name(gym, k.label(), k.setOn()), List.of(k), RouteResolver::concat);
                });
        return out;
    }

    private static List<RouteKey> concat(List<RouteKey> a, List<RouteKey> b) {
        List<RouteKey> out = new ArrayList<>(a);
        out.addAll(b);
        return List.copyOf(out);
    }
}
