package org.variset.imports.export;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/** Writes one table as RFC 4180 CSV in UTF-8 with Commons CSV; text cells neutralised. */
final class CsvExport {
    private CsvExport() {}

    static void write(ExportTable t, Path file) throws IOException {
        List<String> header = t.header();
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
                CSVPrinter p = new CSVPrinter(
                        w, CSVFormat.RFC4180.builder().setRecordSeparator("\n").get())) {
            p.printRecord(header);
            for (Map<String, Object> row : t.rows()) {
                for (String column : header) {
                    p.print(ExportTable.text(t.cell(row, column), true));
                }
                p.println();
            }
        }
    }
}
