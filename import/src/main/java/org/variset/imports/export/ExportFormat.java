package org.variset.imports.export;

/** The formats export writes. */
public enum ExportFormat {
    /** Three CSV files (walls.csv, routes.csv, holds.csv) in a folder. */
    CSV,
    /** One XLSX workbook with sheets walls, routes and holds. */
    XLSX,
    /** One JSON document. */
    JSON
}
