package org.variset.imports.load;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import org.variset.archive.settings.GymVocabularies;
import org.variset.archive.store.Archive;
import org.variset.imports.ImportException;
import org.variset.imports.ProblemList;
import org.variset.imports.row.HoldRow;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.table.InputFileException;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;
import org.variset.imports.table.TableRow;

/**
 * Imports interchange files into an archive in one transaction: every row or none. Files are checked whole first
 * (headers, then each row, then each hold's route), then compared with the archive ({@link ArchiveComparison}): a
 * route is new, unchanged (fields and whole hold list equal), or changed. Changes are refused, listing their
 * differences, unless {@link ImportOptions#update()}. Rows are read again for each phase rather than kept, so memory
 * grows with the number of routes (a few hundred bytes each), not with what they hold.
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
        ImportPlan plan = new ImportPlan(options, new ProblemList());
        GymVocabularies vocabularies = GymVocabularies.of(archive.connection());
        RowParser parser = new RowParser(vocabularies, plan.problems);
        RowParser quiet = new RowParser(vocabularies, new ProblemList());
        Stopwatch clock = new Stopwatch(progress);
        read(sources, parser, plan);
        clock.lap("reading routes");
        ImportSummary summary = archive.fromTransaction(session -> {
            RouteResolver resolver = new RouteResolver(session, plan.routes.keySet(), plan.badRows);
            HoldChecks holdChecks = new HoldChecks(session, plan);
            checkHolds(sources, parser, resolver, holdChecks, plan, progress);
            plan.warnings.addAll(holdChecks.warnings());
            clock.lap("checking holds");
            refuseUnlessSkipping(plan);
            new ArchiveComparison(session, archive, plan, resolver).run(sources, quiet);
            new NewNames(session, plan).run();
            clock.lap("comparing with the archive");
            refuseUnlessSkipping(plan);
            if (plan.options.dryRun()) {
                return plan.summary(plan.holdCount(), extraColumns, parser.unknownTerms());
            }
            ArchiveWriter writer = new ArchiveWriter(session, plan, quiet);
            long holds = writer.write(sources, resolver, progress, clock);
            return plan.summary(holds, extraColumns, parser.unknownTerms());
        });
        if (!summary.dryRun()) {
            clock.lap("committing");
        }
        return summary;
    }

    /** Times the phases of an import for {@link ImportProgress#finished}. */
    static final class Stopwatch {
        private final ImportProgress progress;
        private long last = System.nanoTime();

        Stopwatch(ImportProgress progress) {
            this.progress = progress;
        }

        /** Reports the time since the last lap as a phase's. */
        void lap(String phase) {
            long now = System.nanoTime();
            progress.finished(phase, now - last);
            last = now;
        }
    }

    private static void refuseUnlessSkipping(ImportPlan plan) {
        if (!plan.problems.isEmpty() && !plan.options.skipBadRows()) {
            throw new ImportException(plan.problems);
        }
    }

    private static void read(List<RowSource> sources, RowParser parser, ImportPlan plan) {
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
                        RouteKey refusedKey = r == null ? parser.keyOf(row) : null;
                        if (refusedKey != null) {
                            plan.badRows.add(plan.intern(refusedKey));
                        }
                    }
                }
            } catch (InputFileException e) {
                plan.problems.add(e.problem());
            }
            if (rows == 0 && !s.format().emptyAllowed(s.kind())) {
                plan.problems.add(s.file(), 0, "", "no rows after the header (nothing to import from it)");
            }
        }
    }

    private static void checkHolds(
            List<RowSource> sources,
            RowParser parser,
            RouteResolver resolver,
            HoldChecks checks,
            ImportPlan plan,
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
                        checks.check(key, h);
                        plan.addHold(key, h, resolver.archived(key));
                    }
                    if (++n % PROGRESS_EVERY == 0) {
                        progress.advanced("checking holds", n);
                    }
                }
            } catch (InputFileException e) {
                plan.problems.add(e.problem());
            }
            if (rows == 0 && !s.format().emptyAllowed(s.kind())) {
                plan.problems.add(s.file(), 0, "", "no rows after the header (nothing to import from it)");
            }
        }
    }
}
