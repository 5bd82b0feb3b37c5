package org.variset.sample.generate;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Writes one CSV file row by row (RFC 4180 quoting, UTF-8, LF line ends), so memory does not grow with the file. */
final class CsvOut implements AutoCloseable {
    private final Writer w;
    private long rows;

    CsvOut(Path file, List<String> header) {
        try {
            w = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        row(header.toArray(String[]::new));
        rows = 0;
    }

    /** One row; null cells are empty. */
    void row(String... cells) {
        try {
            for (int i = 0; i < cells.length; i++) {
                if (i > 0) {
                    w.write(',');
                }
                w.write(quote(cells[i]));
            }
            w.write('\n');
            rows++;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Rows written, the header not counted. */
    long rows() {
        return rows;
    }

    private static String quote(String s) {
        if (s == null) {
            return "";
        }
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    @Override
    public void close() {
        try {
            w.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
