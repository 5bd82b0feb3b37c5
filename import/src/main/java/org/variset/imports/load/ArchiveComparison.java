package org.variset.imports.load;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.hibernate.Session;
import org.variset.archive.gym.Wall;
import org.variset.archive.problem.Remedy;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.store.Archive;
import org.variset.imports.Problem;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.row.WallRow;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;

/**
 * Compares what the files bring with what the archive holds: a route is new, unchanged (fields and whole hold list
 * equal) or changed; changes are refused, listing their differences, unless the import updates. Rows of routes the
 * archive holds are read again from the files and compared with the archived routes, read in bulk per gym.
 */
final class ArchiveComparison {
    private final Session session;
    private final ImportPlan plan;
    private final RouteResolver resolver;
    private final ArchivedRoutes archived;

    ArchiveComparison(Session session, Archive archive, ImportPlan plan, RouteResolver resolver) {
        this.session = session;
        this.plan = plan;
        this.resolver = resolver;
        this.archived = new ArchivedRoutes(archive.connection());
    }

    void run(List<RowSource> sources, RowParser quiet) {
        plan.routes.keySet().stream().filter(k -> !resolver.archived(k)).forEach(plan.newRoutes::add);
        Set<RouteKey> seen = new HashSet<>();
        boolean anyArchived = plan.newRoutes.size() < plan.routes.size();
        for (RowSource s : anyArchived ? sources : List.<RowSource>of()) {
            if (s.kind() != TableKind.ROUTES) {
                continue;
            }
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    RouteRow row = quiet.route(c.next());
                    RouteKey key = row == null ? null : plan.intern(row.key());
                    ImportPlan.PlannedRoute p = key == null ? null : plan.routes.get(key);
                    if (p == null || !p.from(row) || plan.newRoutes.contains(key) || !seen.add(key)) {
                        continue;
                    }
                    RouteRecord existing = archived.get(key);
                    List<String> diff = new ArrayList<>(RouteDiff.between(existing, row));
                    holdDifference(existing, key).ifPresent(diff::add);
                    classify(key, row.file(), row.line(), diff);
                }
            }
        }
        plan.digests.forEach((key, digest) -> {
            if (!plan.routes.containsKey(key)) {
                classify(
                        key,
                        digest.firstFile(),
                        digest.firstLine(),
                        holdDifference(archived.get(key), key).stream().toList());
            }
        });
        plan.walls.values().forEach(this::compareWall);
        checkResets();
    }

    /** A reset label belongs to one wall of its gym (docs/spec/interchange.md), in the files and in the archive. */
    private void checkResets() {
        Map<List<String>, Map.Entry<RouteKey, ImportPlan.PlannedRoute>> first = new HashMap<>();
        Map<String, Map<String, String>> archivedResets = new HashMap<>();
        for (Map.Entry<RouteKey, ImportPlan.PlannedRoute> e : plan.routes.entrySet()) {
            RouteKey key = e.getKey();
            String reset = e.getValue().reset;
            var other = first.putIfAbsent(List.of(key.gym(), reset), e);
            String wall = other != null
                    ? other.getKey().wall()
                    : archivedResets
                            .computeIfAbsent(key.gym(), this::resetWalls)
                            .get(reset);
            if (wall != null && !wall.equals(key.wall())) {
                plan.problems.add(
                        e.getValue().file,
                        e.getValue().line,
                        "reset",
                        "reset '" + reset + "' belongs to "
                                + "wall " + wall
                                + (other != null ? " (" + other.getValue().where() + ")" : " in the archive")
                                + ", not " + key.wall() + " (a reset label names one wall's reset)");
                plan.refused.add(key);
            }
        }
    }

    private void classify(RouteKey key, String file, int line, List<String> diff) {
        if (diff.isEmpty()) {
            plan.unchanged++;
            return;
        }
        plan.changedRoutes.add(key);
        plan.changes.add(key + " (" + file + ":" + line + "): " + String.join("; ", diff));
        if (!plan.options.update()) {
            plan.refused.add(key);
            plan.problems.add(new Problem(
                    file,
                    line,
                    "route",
                    "changes the archived " + key + ": " + String.join("; ", diff),
                    Remedy.of(Remedy.Kind.ALLOW_UPDATE)));
        }
    }

    /** Reset label to wall name, for one gym, with one query. */
    private Map<String, String> resetWalls(String gym) {
        Map<String, String> out = new HashMap<>();
        session.createSelectionQuery("select r.label, r.wall.name from Reset r where r.gym.name = :g", Object[].class)
                .setParameter("g", gym)
                .getResultList()
                .forEach(row -> out.put((String) row[0], (String) row[1]));
        return out;
    }

    private Optional<String> holdDifference(RouteRecord existing, RouteKey key) {
        HoldDigest file = plan.digests.get(key);
        if (file == null) {
            return Optional.empty();
        }
        HoldDigest before = new HoldDigest();
        for (HoldRecord h : existing.holds()) {
            before.add(new HoldPlacement.Spec(
                    h.seq(), h.role(), h.type(), h.size(), h.grips(), h.holdRef(), h.xM(), h.yM(), h.extraFields()));
        }
        if (before.size() == file.size() && before.value() == file.value()) {
            return Optional.empty();
        }
        plan.holdsChanged.add(key);
        return Optional.of(
                "holds: " + before.size() + " placements -> " + file.size() + " placements, not the same " + "list");
    }

    private void compareWall(WallRow w) {
        Wall existing = session.createSelectionQuery("from Wall w where w.gym.name = :g and w.name = :n", Wall.class)
                .setParameter("g", w.gym())
                .setParameter("n", w.wall())
                .uniqueResult();
        List<String> key = List.of(w.gym(), w.wall());
        if (existing == null) {
            return; // a new wall: NewNames records it
        }
        List<Object> before = java.util.Arrays.asList(
                existing.discipline(),
                existing.angleDeg(),
                existing.heightM(),
                existing.widthM(),
                existing.cycleDays(),
                existing.extraFields());
        List<Object> after = java.util.Arrays.asList(
                w.discipline(), w.angleDeg(), w.heightM(), w.widthM(), w.cycleDays(), w.extraFields());
        if (before.equals(after)) {
            return;
        }
        plan.changedWalls.add(key);
        plan.changes.add("wall " + w.wall() + " (" + w.file() + ":" + w.line() + "): " + before + " -> " + after);
        if (!plan.options.update()) {
            plan.problems.add(new Problem(
                    w.file(),
                    w.line(),
                    "wall",
                    "changes the archived wall " + w.wall(),
                    Remedy.of(Remedy.Kind.ALLOW_UPDATE)));
        }
    }
}
