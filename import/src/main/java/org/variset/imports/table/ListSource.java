package org.variset.imports.table;

import java.util.Iterator;
import java.util.List;

/** A table already in memory (a JSON document's routes, an XLSX sheet). */
final class ListSource implements RowSource {
    private final String file;
    private final InputFormat format;
    private final TableKind kind;
    private final List<String> header;
    private final int headerLine;
    private final List<TableRow> rows;

    ListSource(
            String file, InputFormat format, TableKind kind, List<String> header, int headerLine, List<TableRow> rows) {
        this.file = file;
        this.format = format;
        this.kind = kind;
        this.header = List.copyOf(header);
        this.headerLine = headerLine;
        this.rows = rows;
    }

    @Override
    public String file() {
        return file;
    }

    @Override
    public InputFormat format() {
        return format;
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
        return headerLine;
    }

    @Override
    public RowCursor rows() {
        Iterator<TableRow> it = rows.iterator();
        return new RowCursor() {
            @Override
            public boolean hasNext() {
                return it.hasNext();
            }

            @Override
            public TableRow next() {
                return it.next();
            }

            @Override
            public void close() {
                // Nothing held open.
            }
        };
    }
}
