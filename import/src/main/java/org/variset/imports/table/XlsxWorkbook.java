package org.variset.imports.table;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.NotOfficeXmlFileException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.variset.imports.Problem;

/**
 * An XLSX workbook read with Apache POI (its zip-bomb and size limits left on). The sheets named {@code routes},
 * {@code holds} and {@code walls} are the tables. Date cells read as ISO dates, number cells as numbers, and time
 * cells (a setter typing 4:30 in the grip column) as clock positions.
 */
public final class XlsxWorkbook {
    private XlsxWorkbook() {}

    /**
     * Reads the tables of a workbook.
     *
     * @throws InputFileException when the file is not a workbook or has none of the three sheets
     */
    public static List<RowSource> read(Path path, String file) {
        try (OPCPackage pkg = OPCPackage.open(path.toFile(), PackageAccess.READ);
                XSSFWorkbook wb = new XSSFWorkbook(pkg)) {
            List<RowSource> out = new ArrayList<>();
            for (Sheet sheet : wb) {
                for (TableKind kind : TableKind.values()) {
                    if (Columns.normalise(sheet.getSheetName()).equals(kind.word())) {
                        out.add(table(sheet, file + "[" + sheet.getSheetName() + "]", kind));
                    }
                }
            }
            if (out.isEmpty()) {
                throw new InputFileException(
                        new Problem(
                                file,
                                0,
                                "",
                                "the workbook has no sheet named routes, "
                                        + "holds or walls (expected those sheet names, with the CSV columns)"),
                        null);
            }
            return out;
        } catch (NotOfficeXmlFileException | InvalidFormatException e) {
            throw new InputFileException(
                    new Problem(
                            file,
                            0,
                            "",
                            "is not an XLSX workbook (expected a file saved " + "as Excel Workbook .xlsx)"),
                    e);
        } catch (IOException | RuntimeException e) {
            if (e instanceof InputFileException ife) {
                throw ife;
            }
            throw new InputFileException(
                    new Problem(file, 0, "", "cannot be read as an XLSX workbook: " + e.getMessage()), e);
        }
    }

    private static RowSource table(Sheet sheet, String file, TableKind kind) {
        List<String> header = new ArrayList<>();
        List<TableRow> rows = new ArrayList<>();
        List<String> keys = new ArrayList<>();
        int headerLine = 0;
        for (Row row : sheet) {
            if (header.isEmpty()) {
                for (int c = 0; c < row.getLastCellNum(); c++) {
                    String v = value(row.getCell(c));
                    header.add(v == null ? "" : v);
                }
                header.forEach(
                        name -> keys.add(kind.knows(Columns.normalise(name)) ? Columns.normalise(name) : name.strip()));
                headerLine = row.getRowNum() + 1;
                continue;
            }
            Map<String, Object> cells = new LinkedHashMap<>();
            boolean any = false;
            for (int c = 0; c < header.size(); c++) {
                String v = value(row.getCell(c));
                if (v != null) {
                    cells.put(keys.get(c), v);
                    any = true;
                }
            }
            if (any) {
                rows.add(new TableRow(file, row.getRowNum() + 1, cells, false));
            }
        }
        return new ListSource(file, InputFormat.XLSX, kind, header, headerLine, rows);
    }

    static String value(Cell cell) {
        if (cell == null) {
            return null;
        }
        CellType type = cell.getCellType() == CellType.FORMULA ? cell.getCachedFormulaResultType() : cell.getCellType();
        return switch (type) {
            case STRING -> cell.getStringCellValue();
            case BOOLEAN -> String.valueOf(cell.getBooleanCellValue());
            case NUMERIC -> numeric(cell);
            default -> null;
        };
    }

    private static String numeric(Cell cell) {
        double v = cell.getNumericCellValue();
        if (DateUtil.isCellDateFormatted(cell)) {
            if (v >= 0 && v < 1) {
                long minutes = Math.round(v * 24 * 60);
                long h = (minutes / 60) % 12;
                return (h == 0 ? 12 : h) + ":" + String.format("%02d", minutes % 60);
            }
            return cell.getLocalDateTimeCellValue().toLocalDate().toString();
        }
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
