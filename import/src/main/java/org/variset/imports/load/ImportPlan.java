package org.variset.imports.load;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.variset.imports.ProblemList;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.WallRow;

/**
 * What an import found and decided, shared by its phases. It keeps little per route (its key, where it was read,
 * its reset, how many holds the files bring) so that memory does not grow with the routes' content: the rows
 * themselves are read again when they are compared and written. Names repeated on every row (gym, wall, reset) are
 * kept once.
 */
final class ImportPlan {
    final ImportOptions options;
    final ProblemList problems;
    final Map<List<String>, WallRow> walls = new LinkedHashMap<>();
    final Map<RouteKey, PlannedRoute> routes = new LinkedHashMap<>();
    /** Hold-list fingerprints of routes the archive already holds, to compare with it. */
    final Map<RouteKey, HoldDigest> digests = new HashMap<>();

    final Set<RouteKey> newRoutes = new LinkedHashSet<>();
    final Set<RouteKey> changedRoutes = new LinkedHashSet<>();
    /** Archived routes whose hold lists the files change (the others keep theirs, even when updated). */
    final Set<RouteKey> holdsChanged = new LinkedHashSet<>();

    final Set<RouteKey> refused = new LinkedHashSet<>();
    /** Route rows with problems, by key: their holds are left out without a problem of their own. */
    final Set<RouteKey> badRows = new LinkedHashSet<>();

    final Set<List<String>> newWalls = new LinkedHashSet<>();
    final List<String> newGymNames = new ArrayList<>();
    final List<String> newSetterNames = new ArrayList<>();

    /** Where a name is first written in the files. */
    record Where(String file, int line) {}

    /** The gyms, walls (gym and wall) and setters the files name, with where each first appears. */
    final Map<String, Where> gymsSeen = new LinkedHashMap<>();

    final Map<List<String>, Where> wallsSeen = new LinkedHashMap<>();
    final Map<String, Where> settersSeen = new LinkedHashMap<>();
    final Set<List<String>> changedWalls = new LinkedHashSet<>();
    final List<String> changes = new ArrayList<>();
    /** Located lines about rows imported as written that may still be wrong. */
    final List<String> warnings = new ArrayList<>();

    long unchanged;
    private final Map<String, String> names = new HashMap<>();

    /**
     * A route the files bring: where its row is, its reset, and how many holds the files bring for it.
     */
    static final class PlannedRoute {
        final String file;
        final int line;
        final String reset;
        int holds;

        PlannedRoute(String file, int line, String reset) {
            this.file = file;
            this.line = line;
            this.reset = reset;
        }

        String where() {
            return file + ":" + line;
        }

        /** True when a row is the one this route was planned from (a duplicate row is not). */
        boolean from(RouteRow r) {
            return line == r.line() && file.equals(r.file());
        }
    }

    ImportPlan(ImportOptions options, ProblemList problems) {
        this.options = options;
        this.problems = problems;
    }

    /** The one copy of a name. */
    String intern(String s) {
        return s == null ? null : names.computeIfAbsent(s, x -> x);
    }

    /** A key whose gym and wall names are the plan's copies. */
    RouteKey intern(RouteKey k) {
        return new RouteKey(intern(k.gym()), intern(k.wall()), k.label(), k.setOn());
    }

    void addWall(WallRow w) {
        if (w == null) {
            return;
        }
        gymsSeen.putIfAbsent(intern(w.gym()), new Where(intern(w.file()), w.line()));
        wallsSeen.putIfAbsent(List.of(intern(w.gym()), intern(w.wall())), new Where(intern(w.file()), w.line()));
        WallRow before = walls.putIfAbsent(List.of(w.gym(), w.wall()), w);
        if (before != null) {
            problems.add(w.file(), w.line(), "wall", "the same wall as line " + before.line());
        }
    }

    void addRoute(RouteRow r) {
        if (r == null) {
            return;
        }
        Where where = new Where(intern(r.file()), r.line());
        gymsSeen.putIfAbsent(intern(r.key().gym()), where);
        wallsSeen.putIfAbsent(List.of(intern(r.key().gym()), intern(r.key().wall())), where);
        r.setters().forEach(s -> settersSeen.putIfAbsent(intern(s.strip()), where));
        PlannedRoute before =
                routes.putIfAbsent(intern(r.key()), new PlannedRoute(intern(r.file()), r.line(), intern(r.reset())));
        if (before != null) {
            problems.add(
                    r.file(),
                    r.line(),
                    "route",
                    "route " + r.key().label() + " of " + r.key().setOn() + " on "
                            + r.key().wall() + " ("
                            + r.key().gym() + ") is already at " + before.where()
                            + "; a route is identified by gym, wall, route and set_on, so give one of them another "
                            + "label or date, or delete the second row");
        }
    }

    /** Counts a hold of a route; for a route the archive holds, adds it to the route's fingerprint too. */
    void addHold(RouteKey k, HoldRow h, boolean archived) {
        if (archived) {
            digests.computeIfAbsent(k, x -> new HoldDigest()).add(h.spec(), h.file(), h.line());
        } else {
            routes.get(k).holds++;
        }
    }

    /** The routes the files bring holds for. */
    Set<RouteKey> keysWithHolds() {
        Set<RouteKey> out = new LinkedHashSet<>(digests.keySet());
        routes.forEach((k, p) -> {
            if (p.holds > 0) {
                out.add(k);
            }
        });
        return out;
    }

    private long holdsOf(RouteKey k) {
        HoldDigest d = digests.get(k);
        return d != null ? d.size() : routes.containsKey(k) ? routes.get(k).holds : 0;
    }

    /**
     * True when the route's holds are written: it is new, or an update changes its hold list, and the files bring
     * holds. An update of a route's fields alone leaves its holds as they are.
     */
    boolean writesHoldsOf(RouteKey k) {
        return holdsOf(k) > 0
                && !refused.contains(k)
                && (newRoutes.contains(k) || holdsChanged.contains(k) && options.update());
    }

    long holdCount() {
        return keysWithHolds().stream()
                .filter(this::writesHoldsOf)
                .mapToLong(this::holdsOf)
                .sum();
    }

    ImportSummary summary(long holdsWritten, Set<String> extraColumns, Set<String> unknownTerms) {
        return new ImportSummary(
                options.dryRun(),
                newRoutes.size(),
                unchanged,
                changedRoutes.size(),
                List.copyOf(newGymNames),
                newWalls.stream()
                        .map(k -> new ImportSummary.NewWall(k.get(0), k.get(1)))
                        .toList(),
                List.copyOf(newSetterNames),
                changedWalls.size(),
                holdsWritten,
                List.copyOf(changes),
                List.copyOf(warnings),
                problems.lines(),
                problems.count(),
                Set.copyOf(extraColumns),
                Set.copyOf(unknownTerms));
    }
}
