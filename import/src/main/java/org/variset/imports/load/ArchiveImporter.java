package org.variset.imports.load;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import org.hibernate.Session;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Route;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.imports.ImportException;
import org.variset.imports.ProblemList;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.row.WallRow;
import org.variset.imports.table.InputFileException;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;
import org.variset.imports.table.TableRow;

/**
 * Imports interchange files into an archive in one transaction: every row or none. Files are checked whole first
 * (headers, then each row, then each hold's route), then compared with the archive: a route is new, unchanged
 * (fields and whole hold list equal), or changed. Changes are refused, listing their differences, unless
 * {@link ImportOptions#update()}.
 */
public final class ArchiveImporter {
    private static final int PROGRESS_EVERY = 10_000;

    private final Archive archive;

    /** An importer into an open archive. */
    public ArchiveImporter(Archive archive) {
        this.archive = Objects.requireNonNull(archive, "archive");
    }

    /**
     * Imports files.
     *
     * @throws ImportException listing the problems, when any row is bad (and bad rows are not skipped), any
     *     header or file is bad, or a route changed without {@code update}; nothing is written then
     */
    public ImportSummary run(List<Path> files, ImportOptions options, ImportProgress progress) {
        Set<String> extraColumns = new TreeSet<>();
        ProblemList fatal = new ProblemList();
        List<RowSource> sources = InputFiles.open(files, fatal, extraColumns);
        if (!fatal.isEmpty()) {
            throw new ImportException(fatal);
        }
        Plan plan = new Plan(options, new ProblemList());
        RowParser parser = new RowParser(options.vocabulary(), plan.problems);
        read(sources, parser, plan);
        return archive.fromTransaction(session -> {
            RouteResolver resolver = new RouteResolver(session, plan.routes.keySet(), plan.badRows);
            checkHolds(sources, parser, resolver, plan, progress);
            refuseUnlessSkipping(plan);
            new Comparison(session, plan, resolver).run();
            refuseUnlessSkipping(plan);
            if (plan.options.dryRun()) {
                return plan.summary(plan.holdCount(), plan.newWalls.size(), extraColumns, parser.unknownTerms());
            }
            ArchiveWriter writer = new ArchiveWriter(session, plan);
            long holds = writer.write(sources, resolver, progress);
            return plan.summary(holds, writer.wallsCreated(), extraColumns, parser.unknownTerms());
        });
    }

    private static void refuseUnlessSkipping(Plan plan) {
        if (!plan.problems.isEmpty() && !plan.options.skipBadRows()) {
            throw new ImportException(plan.problems);
        }
    }

    private static void read(List<RowSource> sources, RowParser parser, Plan plan) {
        for (RowSource s : sources) {
            if (s.kind() == TableKind.HOLDS) {
                continue;
            }
            long rows = 0;
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    TableRow row = c.next();
                    rows++;
                    if (s.kind() == TableKind.WALLS) {
                        plan.addWall(parser.wall(row));
                    } else {
                        RouteRow r = parser.route(row);
                        plan.addRoute(r);
                        if (r == null) {
                            RouteKey refusedKey = parser.keyOf(row);
                            if (refusedKey != null) {
                                plan.badRows.add(refusedKey);
                            }
                        }
                    }
                }
            } catch (InputFileException e) {
                plan.problems.add(e.problem());
            }
            if (rows == 0 && (s.kind() == TableKind.ROUTES || !s.file().endsWith(".json"))) {
                plan.problems.add(s.file(), 0, "", "no rows after the header (nothing to import from it)");
            }
        }
    }

    private static void checkHolds(List<RowSource> sources, RowParser parser, RouteResolver resolver, Plan plan,
            ImportProgress progress) {
        long n = 0;
        for (RowSource s : sources) {
            if (s.kind() != TableKind.HOLDS) {
                continue;
            }
            long rows = 0;
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    rows++;
                    HoldRow h = parser.hold(c.next());
                    RouteKey key = h == null ? null : resolver.resolve(h, plan.problems);
                    if (key != null) {
                        plan.holds.computeIfAbsent(key, k -> new HoldDigest()).add(h.spec(), h.file(), h.line());
                    }
                    if (++n % PROGRESS_EVERY == 0) {
                        progress.advanced("checking holds", n);
                    }
                }
            } catch (InputFileException e) {
                plan.problems.add(e.problem());
            }
            if (rows == 0 && !s.file().endsWith(".json")) {
                plan.problems.add(s.file(), 0, "", "no rows after the header (nothing to import from it)");
            }
        }
    }

    /** What the import found and decided, shared by its phases. */
    static final class Plan {
        final ImportOptions options;
        final ProblemList problems;
        final Map<List<String>, WallRow> walls = new LinkedHashMap<>();
        final Map<RouteKey, RouteRow> routes = new LinkedHashMap<>();
        final Map<RouteKey, HoldDigest> holds = new HashMap<>();
        final Set<RouteKey> newRoutes = new LinkedHashSet<>();
        final Set<RouteKey> changedRoutes = new LinkedHashSet<>();
        final Set<RouteKey> refused = new LinkedHashSet<>();
        /** Route rows with problems, by key: their holds are left out without a problem of their own. */
        final Set<RouteKey> badRows = new LinkedHashSet<>();
        final Set<List<String>> newWalls = new LinkedHashSet<>();
        final Set<List<String>> changedWalls = new LinkedHashSet<>();
        final List<String> changes = new ArrayList<>();
        long unchanged;

        Plan(ImportOptions options, ProblemList problems) {
            this.options = options;
            this.problems = problems;
        }

        void addWall(WallRow w) {
            if (w == null) {
                return;
            }
            WallRow before = walls.putIfAbsent(List.of(w.gym(), w.wall()), w);
            if (before != null) {
                problems.add(w.file(), w.line(), "wall", "the same wall as line " + before.line());
            }
        }

        void addRoute(RouteRow r) {
            if (r == null) {
                return;
            }
            RouteRow before = routes.putIfAbsent(r.key(), r);
            if (before != null) {
                problems.add(r.file(), r.line(), "route", "the same route as " + before.where()
                        + " (a route is identified by gym, wall, route and set_on)");
            }
        }

        /** True when the route's holds are written: it is new, or changed and updated, and the file has holds. */
        boolean writesHoldsOf(RouteKey k) {
            return holds.containsKey(k) && !refused.contains(k)
                    && (newRoutes.contains(k) || changedRoutes.contains(k) && options.update());
        }

        long holdCount() {
            return holds.entrySet().stream().filter(e -> writesHoldsOf(e.getKey()))
                    .mapToLong(e -> e.getValue().size()).sum();
        }

        ImportSummary summary(long holdsWritten, long wallsNew, Set<String> extraColumns, Set<String> unknownTerms) {
            return new ImportSummary(options.dryRun(), newRoutes.size(), unchanged, changedRoutes.size(),
                    wallsNew, changedWalls.size(), holdsWritten, List.copyOf(changes), problems.lines(),
                    problems.count(), Set.copyOf(extraColumns), Set.copyOf(unknownTerms));
        }
    }

    /** Compares the plan's routes and walls with the archive. */
    private record Comparison(Session session, Plan plan, RouteResolver resolver) {
        void run() {
            for (RouteRow row : plan.routes.values()) {
                Route existing = resolver.archived(row.key()) ? find(row.key()) : null;
                if (existing == null) {
                    plan.newRoutes.add(row.key());
                    continue;
                }
                List<String> diff = new ArrayList<>(RouteDiff.between(existing, row));
                holdDifference(existing, row.key()).ifPresent(diff::add);
                classify(row.key(), row.file(), row.line(), diff);
            }
            for (Map.Entry<RouteKey, HoldDigest> e : plan.holds.entrySet()) {
                if (!plan.routes.containsKey(e.getKey())) {
                    Route existing = Objects.requireNonNull(find(e.getKey()), "resolved route");
                    classify(e.getKey(), e.getValue().firstFile(), e.getValue().firstLine(),
                            holdDifference(existing, e.getKey()).stream().toList());
                }
            }
            for (WallRow w : plan.walls.values()) {
                compareWall(w);
            }
            checkResets();
        }

        /** A reset label belongs to one wall of its gym (interchange.md), in the file and in the archive. */
        private void checkResets() {
            Map<List<String>, RouteRow> first = new HashMap<>();
            Map<String, Map<String, String>> archivedResets = new HashMap<>();
            for (RouteRow row : plan.routes.values()) {
                List<String> label = List.of(row.key().gym(), row.reset());
                RouteRow other = first.putIfAbsent(label, row);
                String archived = other != null ? null : archivedResets.computeIfAbsent(row.key().gym(),
                        this::resetWalls).get(row.reset());
                String wall = other != null ? other.key().wall() : archived;
                if (wall != null && !wall.equals(row.key().wall())) {
                    plan.problems.add(row.file(), row.line(), "reset", "reset '" + row.reset() + "' belongs to wall "
                            + wall + (other != null ? " (" + other.where() + ")" : " in the archive")
                            + ", not " + row.key().wall() + " (a reset label names one wall's reset)");
                    plan.refused.add(row.key());
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
                plan.problems.add(file, line, "route", "changes the archived " + key + ": " + String.join("; ", diff)
                        + " (give --update to replace it)");
            }
        }

        /** Reset label to wall name, for one gym, with one query. */
        private Map<String, String> resetWalls(String gym) {
            Map<String, String> out = new HashMap<>();
            session.createSelectionQuery("select r.label, r.wall.name from Reset r where r.gym.name = :g",
                    Object[].class).setParameter("g", gym).getResultList()
                    .forEach(row -> out.put((String) row[0], (String) row[1]));
            return out;
        }

        private java.util.Optional<String> holdDifference(Route existing, RouteKey key) {
            HoldDigest file = plan.holds.get(key);
            if (file == null) {
                return java.util.Optional.empty();
            }
            HoldDigest archived = new HoldDigest();
            session.createSelectionQuery("from HoldPlacement h where h.route = :r order by h.ordinal",
                    HoldPlacement.class).setParameter("r", existing).getResultList()
                    .forEach(h -> archived.add(h.spec()));
            return archived.size() == file.size() && archived.value() == file.value() ? java.util.Optional.empty()
                    : java.util.Optional.of("holds: " + archived.size() + " placements -> " + file.size()
                            + " placements, not the same list");
        }

        private void compareWall(WallRow w) {
            Wall existing = session.createSelectionQuery("from Wall w where w.gym.name = :g and w.name = :n",
                    Wall.class).setParameter("g", w.gym()).setParameter("n", w.wall()).uniqueResult();
            List<String> key = List.of(w.gym(), w.wall());
            if (existing == null) {
                plan.newWalls.add(key);
                return;
            }
            List<Object> before = java.util.Arrays.asList(existing.discipline(), existing.angleDeg(),
                    existing.heightM(), existing.widthM(), existing.cycleDays(), existing.extraFields());
            List<Object> after = java.util.Arrays.asList(w.discipline(), w.angleDeg(), w.heightM(), w.widthM(),
                    w.cycleDays(), w.extraFields());
            if (before.equals(after)) {
                return;
            }
            plan.changedWalls.add(key);
            plan.changes.add("wall " + w.wall() + " (" + w.file() + ":" + w.line() + "): " + before + " -> " + after);
            if (!plan.options.update()) {
                plan.problems.add(w.file(), w.line(), "wall", "changes the archived wall " + w.wall()
                        + " (give --update to replace it)");
            }
        }

        private Route find(RouteKey k) {
            return new ArchiveQueries(session).route(k.gym(), k.wall(), k.label(), k.setOn()).orElse(null);
        }
    }
}
