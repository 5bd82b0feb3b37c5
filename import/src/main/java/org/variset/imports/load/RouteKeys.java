package org.variset.imports.load;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.variset.archive.settings.GymVocabularies;
import org.variset.imports.ProblemList;
import org.variset.imports.row.RouteKey;
import org.variset.imports.row.RouteRow;
import org.variset.imports.row.RowParser;
import org.variset.imports.table.RowCursor;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;

/** The route keys a routes file lists, to find the routes an import brought (to take it back). */
public final class RouteKeys {
    private RouteKeys() {}

    /** The keys of the file's route rows; problems for rows that cannot be read. */
    public static List<RouteKey> read(Path file, ProblemList problems) {
        Set<String> ignored = new TreeSet<>();
        List<RowSource> sources = InputFiles.open(List.of(file), problems, ignored);
        RowParser parser = new RowParser(GymVocabularies.DEFAULT, problems);
        List<RouteKey> keys = new ArrayList<>();
        for (RowSource s : sources) {
            if (s.kind() != TableKind.ROUTES) {
                continue;
            }
            try (RowCursor c = s.rows()) {
                while (c.hasNext()) {
                    RouteRow r = parser.route(c.next());
                    if (r != null) {
                        keys.add(r.key());
                    }
                }
            }
        }
        return keys;
    }
}
