package org.variset.app.imports;

import java.nio.file.Path;
import org.variset.app.Workspace;
import org.variset.imports.export.ArchiveExporter;
import org.variset.imports.export.ExportFormat;

/** Writes a gym's walls, routes and holds in an interchange format; importing the export gives the same content. */
public final class ExportGym {
    private ExportGym() {}

    /**
     * Exports a selection.
     *
     * @param out a folder for CSV, a file for XLSX and JSON
     * @param replace whether files there may be replaced
     * @throws IllegalArgumentException for an unknown gym or wall, or a file in the way without {@code replace}
     */
    public static ArchiveExporter.Result run(
            Workspace w, ArchiveExporter.Selection selection, ExportFormat format, Path out, boolean replace) {
        return new ArchiveExporter(w.archive()).export(selection, format, out, replace);
    }
}
