package org.variset.imports.export;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/**
 * Writes the tables as one XLSX workbook with POI's streaming writer: numbers as number cells, everything else as
 * text cells, neutralised against formulas.
 */
final class XlsxExport {
    private XlsxExport() {}

    static void write(List<ExportTable> tables, Path file) throws IOException {
        try (SXSSFWorkbook wb = new SXSSFWorkbook(200);
                OutputStream out = Files.newOutputStream(file)) {
            for (ExportTable t : tables) {
                Sheet sheet = wb.createSheet(t.name());
                List<String> header = t.header();
                Row h = sheet.createRow(0);
                for (int c = 0; c < header.size(); c++) {
                    h.createCell(c).setCellValue(header.get(c));
                }
                int r = 1;
                for (Map<String, Object> row : t.rows()) {
                    Row x = sheet.createRow(r++);
                    for (int c = 0; c < header.size(); c++) {
                        Object v = t.cell(row, header.get(c));
                        if (v == null || v instanceof List<?> l && l.isEmpty()) {
                            continue;
                        }
                        Cell cell = x.createCell(c);
                        if (v instanceof ExportTable.Num n) {
                            cell.setCellValue(n.value());
                        } else {
                            cell.setCellValue(ExportTable.text(v, true));
                        }
                    }
                }
            }
            wb.write(out);
        }
    }
}
