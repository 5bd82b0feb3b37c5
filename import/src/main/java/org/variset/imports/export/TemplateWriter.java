package org.variset.imports.export;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.poi.ss.usermodel.DataValidation;
import org.apache.poi.ss.usermodel.DataValidationHelper;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddressList;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.variset.archive.file.AtomicFile;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;
import org.variset.imports.table.ExampleRow;
import org.variset.imports.table.TableKind;

/**
 * Writes empty interchange files with the right headers and one invented example row, so a gym can start from
 * the right layout (the example's gym is {@link ExampleRow#GYM}, which import refuses); the XLSX template has drop-down lists for hold type, role, size and discipline.
 */
public final class TemplateWriter {
    private static final Map<TableKind, List<String>> EXAMPLE = Map.of(
            TableKind.WALLS, List.of(ExampleRow.GYM, "Cave", "boulder", "35", "4.2", "9.5", "28"),
            TableKind.ROUTES,
                    List.of(
                            ExampleRow.GYM,
                            "Cave",
                            "Blue 3",
                            "2026-03-02",
                            "boulder",
                            "V4",
                            "",
                            "",
                            "Cave 2026-03-02",
                            "Ana Brook;Tomo Heikkila",
                            "blue",
                            "30",
                            "heel hook;dyno",
                            "power",
                            "3;4;8;3",
                            "the template's example: delete this row; import refuses it"),
            TableKind.HOLDS,
                    List.of(
                            ExampleRow.GYM,
                            "Blue 3",
                            "2026-03-02",
                            "crimp",
                            "Cave",
                            "1",
                            "start",
                            "s",
                            "90;270",
                            "C40",
                            "1.55",
                            "1.35"));

    private TemplateWriter() {}

    /**
     * Writes the templates into a folder.
     *
     * @return the files written
     * @throws IllegalArgumentException when a file exists and force is off
     */
    public static List<Path> write(ExportFormat format, Path dir, boolean force) throws IOException {
        List<Path> files = format == ExportFormat.XLSX
                ? List.of(dir.resolve("variset-template.xlsx"))
                : List.of(dir.resolve("walls.csv"), dir.resolve("routes.csv"), dir.resolve("holds.csv"));
        if (format == ExportFormat.JSON) {
            throw new IllegalArgumentException("templates are CSV or XLSX (JSON has no header to fill in)");
        }
        Files.createDirectories(dir);
        AtomicFile.checkWritable(files, force);
        if (format == ExportFormat.XLSX) {
            AtomicFile.writeThrough(files.get(0), force, TemplateWriter::xlsx);
        } else {
            TableKind[] kinds = {TableKind.WALLS, TableKind.ROUTES, TableKind.HOLDS};
            for (int i = 0; i < kinds.length; i++) {
                TableKind kind = kinds[i];
                AtomicFile.writeThrough(files.get(i), force, tmp -> csv(kind, tmp));
            }
        }
        return files;
    }

    private static void csv(TableKind kind, Path file) throws IOException {
        try (CSVPrinter p = new CSVPrinter(
                Files.newBufferedWriter(file, StandardCharsets.UTF_8),
                CSVFormat.RFC4180.builder().setRecordSeparator("\n").get())) {
            p.printRecord(kind.columns());
            p.printRecord(EXAMPLE.get(kind));
        }
    }

    private static void xlsx(Path file) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook();
                OutputStream out = Files.newOutputStream(file)) {
            for (TableKind kind : new TableKind[] {TableKind.WALLS, TableKind.ROUTES, TableKind.HOLDS}) {
                Sheet sheet = wb.createSheet(kind.word());
                List<String> columns = kind.columns();
                Row header = sheet.createRow(0);
                Row example = sheet.createRow(1);
                for (int c = 0; c < columns.size(); c++) {
                    header.createCell(c).setCellValue(columns.get(c));
                    example.createCell(c).setCellValue(EXAMPLE.get(kind).get(c));
                    List<String> choices = choices(kind, columns.get(c));
                    if (!choices.isEmpty()) {
                        dropDown(sheet, c, choices);
                    }
                }
            }
            wb.write(out);
        }
    }

    private static List<String> choices(TableKind kind, String column) {
        return switch (column) {
            case "type" -> Vocabulary.defaults().terms(VocabularyField.HOLD_TYPES);
            case "role" -> List.of("hand", "foot", "start", "finish");
            case "size" -> List.of("xs", "s", "m", "l", "xl");
            case "discipline" ->
                kind == TableKind.WALLS ? List.of("boulder", "rope", "both") : List.of("boulder", "rope");
            default -> List.of();
        };
    }

    private static void dropDown(Sheet sheet, int column, List<String> choices) {
        DataValidationHelper helper = sheet.getDataValidationHelper();
        DataValidation v = helper.createValidation(
                helper.createExplicitListConstraint(choices.toArray(String[]::new)),
                new CellRangeAddressList(1, 10_000, column, column));
        v.setShowErrorBox(true);
        sheet.addValidationData(v);
    }
}
