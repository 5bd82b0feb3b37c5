package org.variset.imports.table;

import java.io.BufferedInputStream;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.variset.imports.Problem;

/**
 * A CSV file (RFC 4180) read with Commons CSV: strict UTF-8 (a spreadsheet's non-UTF-8 "CSV" is refused with a
 * hint), a byte-order mark skipped, Windows line endings accepted, and the delimiter (comma, semicolon or tab)
 * taken from the header row. A semicolon-delimited file may write numbers with a decimal comma.
 */
public final class CsvSource implements RowSource {
    private static final String NOT_UTF8 = "is not UTF-8 text (save it from the spreadsheet as 'CSV UTF-8')";

    private final Path path;
    private final String file;
    private final char delimiter;
    private final List<String> header;
    private final TableKind kind;
    /** The key of each header column in a row's cells: the spec's name in lower case, or an extra name as written. */
    private final String[] keys;

    private CsvSource(Path path, String file, char delimiter, List<String> header) {
        this.path = path;
        this.file = file;
        this.delimiter = delimiter;
        this.header = header;
        this.kind = TableKind.detect(
                path.getFileName().toString(),
                header.stream().map(Columns::normalise).collect(Collectors.toSet()));
        this.keys = header.stream()
                .map(name -> kind.knows(Columns.normalise(name)) ? Columns.normalise(name) : name.strip())
                .toArray(String[]::new);
    }

    /**
     * Opens a CSV file and reads its header.
     *
     * @param file the name to show in messages
     * @throws InputFileException when the file is empty, unreadable, or not UTF-8
     */
    public static CsvSource open(Path path, String file) {
        char delimiter;
        try (BufferedReader r = reader(path)) {
            String first = r.readLine();
            if (first == null || first.isBlank()) {
                throw new InputFileException(
                        new Problem(
                                file,
                                0,
                                "",
                                "the file is empty (expected a header row, "
                                        + "for example gym,wall,route,set_on,discipline,grade)"),
                        null);
            }
            delimiter = delimiterOf(first);
        } catch (CharacterCodingException e) {
            throw new InputFileException(new Problem(file, 1, "", NOT_UTF8), e);
        } catch (IOException e) {
            throw new InputFileException(new Problem(file, 0, "", "cannot be read: " + e.getMessage()), e);
        }
        CsvSource probe = new CsvSource(path, file, delimiter, List.of());
        try (CSVParser p = probe.parser()) {
            Iterator<CSVRecord> it = p.iterator();
            List<String> header = new ArrayList<>();
            it.next().forEach(header::add);
            return new CsvSource(path, file, delimiter, List.copyOf(header));
        } catch (IOException | UncheckedIOException | IllegalStateException e) {
            throw failure(file, 1, e);
        }
    }

    @Override
    public String file() {
        return file;
    }

    @Override
    public InputFormat format() {
        return InputFormat.CSV;
    }

    @Override
    public TableKind kind() {
        return kind;
    }

    @Override
    public List<String> header() {
        return header;
    }

    @Override
    public int headerLine() {
        return 1;
    }

    /** The delimiter found in the header row. */
    public char delimiter() {
        return delimiter;
    }

    @Override
    public RowCursor rows() {
        CSVParser p;
        try {
            p = parser();
        } catch (IOException e) {
            throw failure(file, 0, e);
        }
        Iterator<CSVRecord> it = p.iterator();
        try {
            it.next();
        } catch (UncheckedIOException | IllegalStateException e) {
            throw failure(file, 1, e);
        }
        return new Cursor(p, it);
    }

    private CSVParser parser() throws IOException {
        CSVFormat format = CSVFormat.RFC4180
                .builder()
                .setDelimiter(delimiter)
                .setIgnoreEmptyLines(true)
                .get();
        return CSVParser.builder().setReader(reader(path)).setFormat(format).get();
    }

    private static BufferedReader reader(Path path) throws IOException {
        InputStream in = new BufferedInputStream(Files.newInputStream(path));
        in.mark(3);
        byte[] bom = in.readNBytes(3);
        if (!(bom.length == 3 && (bom[0] & 0xff) == 0xEF && (bom[1] & 0xff) == 0xBB && (bom[2] & 0xff) == 0xBF)) {
            in.reset();
        }
        CharsetDecoder strict = StandardCharsets.UTF_8
                .newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        return new BufferedReader(new InputStreamReader(in, strict));
    }

    /** The most frequent of comma, semicolon and tab outside quotes in the header row; comma on a tie. */
    static char delimiterOf(String headerLine) {
        int commas = 0;
        int semicolons = 0;
        int tabs = 0;
        boolean quoted = false;
        for (char c : headerLine.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                commas += c == ',' ? 1 : 0;
                semicolons += c == ';' ? 1 : 0;
                tabs += c == '\t' ? 1 : 0;
            }
        }
        if (semicolons > commas && semicolons >= tabs) {
            return ';';
        }
        return tabs > commas ? '\t' : ',';
    }

    private static InputFileException failure(String file, long line, Exception e) {
        Throwable cause = e instanceof UncheckedIOException u ? u.getCause() : e;
        if (cause instanceof CharacterCodingException) {
            return new InputFileException(new Problem(file, (int) line, "", NOT_UTF8), e);
        }
        String why = cause == null || cause.getMessage() == null ? e.toString() : cause.getMessage();
        return new InputFileException(
                new Problem(file, (int) line, "", "cannot be read as CSV: " + why + " (check for an unclosed quote)"),
                e);
    }

    private final class Cursor implements RowCursor {
        private final CSVParser parser;
        private final Iterator<CSVRecord> records;
        /** The first line of the record the iterator fetches next; taken before it reads ahead in hasNext. */
        private long startLine = -1;

        Cursor(CSVParser parser, Iterator<CSVRecord> records) {
            this.parser = parser;
            this.records = records;
        }

        @Override
        public boolean hasNext() {
            if (startLine < 0) {
                startLine = parser.getCurrentLineNumber() + 1;
            }
            try {
                return records.hasNext();
            } catch (UncheckedIOException | IllegalStateException e) {
                throw failure(file, parser.getCurrentLineNumber() + 1, e);
            }
        }

        @Override
        public TableRow next() {
            long line = startLine < 0 ? parser.getCurrentLineNumber() + 1 : startLine;
            startLine = -1;
            CSVRecord r;
            try {
                r = records.next();
            } catch (UncheckedIOException | IllegalStateException e) {
                throw failure(file, line, e);
            }
            Map<String, Object> cells = new LinkedHashMap<>();
            for (int i = 0; i < keys.length && i < r.size(); i++) {
                cells.put(keys[i], r.get(i));
            }
            if (r.size() > header.size()) {
                for (int i = header.size(); i < r.size(); i++) {
                    if (!r.get(i).isBlank()) {
                        cells.put("#" + (i + 1), r.get(i));
                    }
                }
            }
            return new TableRow(file, (int) line, cells, delimiter == ';');
        }

        @Override
        public void close() {
            try {
                parser.close();
            } catch (IOException ignored) {
                // Read-only file: nothing to lose on a failed close.
            }
        }
    }
}
