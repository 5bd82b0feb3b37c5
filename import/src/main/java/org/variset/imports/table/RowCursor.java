package org.variset.imports.table;

import java.util.Iterator;

/** An iterator over a table's rows that must be closed (it may hold a file open). */
public interface RowCursor extends Iterator<TableRow>, AutoCloseable {
    @Override
    void close();
}
