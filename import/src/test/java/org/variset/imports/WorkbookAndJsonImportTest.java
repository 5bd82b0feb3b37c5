package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.variset.imports.ImportFiles.write;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.CreationHelper;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Route;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

class WorkbookAndJsonImportTest {
    @TempDir
    Path dir;

    private Archive archive;

    @BeforeEach
    void open() {
        archive = TestArchives.fresh();
    }

    @AfterEach
    void close() {
        archive.close();
    }

    private void run(Path f) {
        new ArchiveImporter(archive).run(List.of(f), ImportOptions.defaults(), ImportProgress.NONE);
    }

    private Route route(String label) {
        return archive.fromTransaction(s -> {
            Route r = s.createSelectionQuery("from Route where label = :l", Route.class)
                    .setParameter("l", label)
                    .getSingleResult();
            r.holds().size();
            return r;
        });
    }

    /** A file's format is known by its ending in any case: the spec's reset document named in capitals imports. */
    @Test
    void knowsAFormatByItsEndingWhateverItsCase() throws Exception {
        Path upper = Files.copy(ImportFiles.specExample("reset.json"), dir.resolve("RESET.JSON"));
        run(upper);
        assertThat(route("N1").holds()).isNotEmpty();
    }

    /** A workbook named as a CSV file is refused by its content, naming the file and the fix. */
    @Test
    void refusesAWorkbookNamedAsText() throws Exception {
        Path book = dir.resolve("book.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook();
                OutputStream out = Files.newOutputStream(book)) {
            wb.createSheet("routes");
            wb.write(out);
        }
        Path misnamed = Files.move(book, dir.resolve("routes.csv"));
        assertThatThrownBy(() -> run(misnamed))
                .isInstanceOf(ImportException.class)
                .hasMessageContaining("routes.csv: is a zip or workbook, not CSV");
    }

    /** A workbook as a spreadsheet user makes it: a date cell, number cells, and a grip typed as a time. */
    @Test
    void readsDateNumberAndTimeCellsOfAWorkbook() throws Exception {
        Path f = dir.resolve("reset.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook();
                OutputStream out = Files.newOutputStream(f)) {
            CreationHelper h = wb.getCreationHelper();
            CellStyle date = wb.createCellStyle();
            date.setDataFormat(h.createDataFormat().getFormat("dd/mm/yyyy"));
            CellStyle time = wb.createCellStyle();
            time.setDataFormat(h.createDataFormat().getFormat("h:mm"));
            Sheet routes = wb.createSheet("routes");
            header(routes, "gym", "wall", "route", "set_on", "discipline", "grade", "angle_deg");
            Row r = routes.createRow(1);
            r.createCell(0).setCellValue("Harbour Hall");
            r.createCell(1).setCellValue("Cave");
            r.createCell(2).setCellValue(7);
            r.createCell(3).setCellValue(LocalDate.of(2026, 3, 2));
            r.getCell(3).setCellStyle(date);
            r.createCell(4).setCellValue("boulder");
            r.createCell(5).setCellValue("6B+");
            r.createCell(6).setCellValue(-15);
            Sheet holds = wb.createSheet("Holds");
            header(holds, "gym", "route", "set_on", "seq", "type", "grip", "x_m");
            Row x = holds.createRow(1);
            x.createCell(0).setCellValue("Harbour Hall");
            x.createCell(1).setCellValue("7");
            x.createCell(2).setCellValue("2026-03-02");
            x.createCell(3).setCellValue(1);
            x.createCell(4).setCellValue("crimp");
            x.createCell(5).setCellValue(4.5 / 24);
            x.getCell(5).setCellStyle(time);
            x.createCell(6).setCellValue(1.25);
            wb.write(out);
        }
        run(f);
        Route seven = route("7");
        assertThat(seven.setOn()).isEqualTo(LocalDate.of(2026, 3, 2));
        assertThat(seven.angleDeg()).isEqualTo(-15.0);
        HoldPlacement hold = seven.holds().get(0);
        // docs/spec/interchange.md: a clock position H:MM is 30 x (H mod 12) + 0.5 x MM degrees; 4:30 is 135.
        assertThat(hold.grips()).containsExactly(135.0);
        assertThat(hold.xM()).isEqualTo(1.25);
        assertThat(hold.seq()).isEqualTo(1);
    }

    @Test
    void refusesAFileThatIsNoWorkbook() {
        Path f = write(dir, "reset.xlsx", "gym,wall\n");
        assertThatThrownBy(() -> run(f))
                .isInstanceOf(ImportException.class)
                .hasMessageContaining("is not an XLSX workbook");
    }

    @Test
    void namesTheLineAndPathOfABadNestedHold() {
        Path f = write(
                dir,
                "reset.json",
                "{\n  \"gym\": \"Harbour Hall\",\n  \"routes\": [\n"
                        + "    {\"wall\": \"Cave\", \"route\": \"B1\", \"set_on\": \"2026-03-02\", \"discipline\": \"boulder\","
                        + " \"grade\": \"V1\", \"holds\": [{\"type\": \"jug\"}, {\"type\": \"jug\", \"grip\": [400]}]}\n"
                        + "  ]\n}\n");
        assertThatThrownBy(() -> run(f))
                .isInstanceOfSatisfying(
                        ImportException.class,
                        e -> assertThat(e.problems())
                                .singleElement()
                                .asString()
                                .isEqualTo(f + ":4: routes[0].holds[1].grip: grip angle '400' is outside "
                                        + "0-360 degrees"));
    }

    @Test
    void refusesBrokenJsonWithItsLine() {
        Path f = write(dir, "reset.json", "{\n \"gym\": \"Harbour Hall\",\n \"routes\": [ {\"route\": }\n]}");
        assertThatThrownBy(() -> run(f)).hasMessageContaining(f + ":3: is not valid JSON");
    }

    private static void header(Sheet s, String... names) {
        Row r = s.createRow(0);
        for (int i = 0; i < names.length; i++) {
            r.createCell(i).setCellValue(names[i]);
        }
    }
}
