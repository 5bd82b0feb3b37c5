package org.variset.app.imports;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.search.IndexProgress;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;
import org.variset.imports.load.ImportSummary;

/**
 * Imports interchange files into the archive: one transaction, every row or none (the importer checks everything
 * first), each row's terms read with its gym's vocabulary of its day; then the search index catches up.
 */
public final class ImportFiles {
    private final Workspace workspace;

    /** Imports into a workspace's archive. */
    public ImportFiles(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * What an import did (or, in a dry run, would do).
     *
     * @param summary the counts, changes, skipped rows, extra columns and unknown terms
     */
    public record Result(ImportSummary summary) {
        /** The result for scripts. */
        public ObjectNode json() {
            ImportSummary s = summary;
            ObjectNode o = Json.object();
            o.put("dry_run", s.dryRun());
            o.putObject("routes")
                    .put("new", s.routesNew())
                    .put("unchanged", s.routesUnchanged())
                    .put("changed", s.routesChanged());
            o.putObject("walls").put("new", s.wallsNew()).put("changed", s.wallsChanged());
            s.newGyms().forEach(o.putArray("new_gyms")::add);
            ArrayNode walls = o.putArray("new_walls");
            s.newWalls().forEach(w -> walls.addObject().put("gym", w.gym()).put("wall", w.wall()));
            s.newSetters().forEach(o.putArray("new_setters")::add);
            o.put("holds_written", s.holdsWritten());
            s.changes().forEach(o.putArray("changes")::add);
            s.warnings().forEach(o.putArray("warnings")::add);
            o.put("skipped_rows", s.skippedCount());
            s.skipped().forEach(o.putArray("skipped")::add);
            s.extraColumns().stream().sorted().forEach(o.putArray("extra_columns")::add);
            s.unknownTerms().stream().sorted().forEach(o.putArray("unknown_terms")::add);
            return o;
        }
    }

    /**
     * Imports files.
     *
     * @param progress hears of long passes, and how long each phase took
     * @throws org.variset.imports.ImportException listing the problems (file, line, column); nothing is written
     */
    public Result run(List<Path> files, ImportOptions options, ImportProgress progress) {
        ImportSummary s = new ArchiveImporter(workspace.archive()).run(files, options, progress);
        if (!s.dryRun()) {
            long start = System.nanoTime();
            workspace.indexAfterWrite(indexing(progress));
            progress.finished("updating the search index", System.nanoTime() - start);
        }
        return new Result(s);
    }

    /** An import's progress, told of the index update as one more pass. */
    static IndexProgress indexing(ImportProgress progress) {
        return (done, total) -> progress.advanced("indexing routes", done);
    }
}
