package org.variset.imports.table;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.variset.imports.Problem;

/**
 * The input formats of docs/spec/interchange.md: how a file of each is recognised, opened into tables, and which of
 * its tables may be empty. The one place that knows formats; adding one means an entry here and its reader.
 */
public enum InputFormat {
    /** One table per file, UTF-8, delimiter from the header row. */
    CSV(List.of(".csv", ".txt")),
    /** One workbook with sheets routes, holds and walls. */
    XLSX(List.of(".xlsx")),
    /** One document with a routes array (each route may nest its holds) and a walls array. */
    JSON(List.of(".json"));

    private final List<String> endings;

    InputFormat(List<String> endings) {
        this.endings = endings;
    }

    /** The format a file name ends with, whatever its case ({@code RESET.JSON}), if any. */
    public static Optional<InputFormat> of(Path file) {
        String name =
                file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        for (InputFormat f : values()) {
            if (f.endings.stream().anyMatch(name::endsWith)) {
                return Optional.of(f);
            }
        }
        return Optional.empty();
    }

    /** The endings the formats are recognised by, for messages ({@code .csv, .txt, .xlsx or .json}). */
    public static String endingsInWords() {
        List<String> all = java.util.Arrays.stream(values())
                .flatMap(f -> f.endings.stream())
                .toList();
        return String.join(", ", all.subList(0, all.size() - 1)) + " or " + all.get(all.size() - 1);
    }

    /**
     * Opens a file of this format into its tables.
     *
     * @param name the file's name for messages
     * @throws InputFileException when the file is not of this format by its content, or cannot be read
     */
    public List<RowSource> open(Path path, String name) {
        refuseOtherContent(path, name);
        return switch (this) {
            case CSV -> List.of(CsvSource.open(path, name));
            case XLSX -> XlsxWorkbook.read(path, name);
            case JSON -> JsonDocument.read(path, name);
        };
    }

    /**
     * True when a table of this format may hold no rows: a JSON document need not list walls, nor give holds apart
     * from its routes; a CSV file or sheet that is there but empty is a mistake.
     */
    public boolean emptyAllowed(TableKind kind) {
        return this == JSON && kind != TableKind.ROUTES;
    }

    /** A workbook (a zip) named as text is refused by its content; the readers refuse the rest themselves. */
    private void refuseOtherContent(Path path, String name) {
        byte[] head = new byte[512];
        int n;
        try (InputStream in = Files.newInputStream(path)) {
            n = in.readNBytes(head, 0, head.length);
        } catch (IOException e) {
            throw new InputFileException(new Problem(name, 0, "", "cannot be read: " + e.getMessage()), e);
        }
        boolean zip = n >= 4 && head[0] == 'P' && head[1] == 'K' && head[2] == 3 && head[3] == 4;
        if (this != XLSX && zip) {
            throw new InputFileException(
                    new Problem(
                            name,
                            0,
                            "",
                            "is a zip or workbook, not " + this + " (save it as " + this
                                    + ", or name it .xlsx if it is a workbook)"),
                    null);
        }
    }
}
