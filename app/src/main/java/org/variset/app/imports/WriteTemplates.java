package org.variset.app.imports;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.variset.imports.export.ExportFormat;
import org.variset.imports.export.TemplateWriter;

/** Writes empty interchange files with the right headers and an example row. Needs no archive. */
public final class WriteTemplates {
    private WriteTemplates() {}

    /**
     * Writes the templates into a folder.
     *
     * @return the files written
     * @throws IllegalArgumentException for JSON (it has no header to fill in), a file in the way without
     *     {@code replace}, or a folder that cannot be written
     */
    public static List<Path> into(Path dir, ExportFormat format, boolean replace) {
        try {
            return TemplateWriter.write(format, dir, replace);
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write the templates into " + dir + ": " + e.getMessage(), e);
        }
    }
}
