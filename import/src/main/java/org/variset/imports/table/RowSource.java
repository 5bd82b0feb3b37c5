package org.variset.imports.table;

import java.util.List;

/**
 * One table of one input file. It can be read more than once (the import reads holds twice instead of keeping
 * them in memory).
 */
public interface RowSource {
    /** The file's display name, for messages. */
    String file();

    /** The format of the file it comes from. */
    InputFormat format();

    /** Which table it holds. */
    TableKind kind();

    /** The header cells as written. */
    List<String> header();

    /** The line of the header (1 in CSV). */
    int headerLine();

    /** Opens a new pass over the rows. */
    RowCursor rows();
}
