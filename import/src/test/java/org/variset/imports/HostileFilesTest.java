package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.export.ExportFormat;
import org.variset.imports.export.TemplateWriter;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/** Files made to hurt: each is refused as bad input naming the file, and nothing is written. */
class HostileFilesTest {
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

    private String refused(Path file) {
        Throwable t = catchThrowable(
                () -> new ArchiveImporter(archive).run(List.of(file), ImportOptions.defaults(), ImportProgress.NONE));
        assertThat(t).as("refused as bad input").isInstanceOf(ImportException.class);
        assertThat(archive.stats().routes()).as("nothing written").isZero();
        return t.getMessage() + " " + ((ImportException) t).problems();
    }

    /** An XLSX whose sheet inflates from about 200 KB to 200 MB: POI's zip-bomb guard refuses it. */
    @Test
    void refusesAZipBombWorkbook() throws IOException {
        Path template =
                TemplateWriter.write(ExportFormat.XLSX, dir.resolve("t"), false).get(0);
        Path bomb = dir.resolve("bomb.xlsx");
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(template));
                ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(bomb))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                out.putNextEntry(new ZipEntry(e.getName()));
                if (e.getName().startsWith("xl/worksheets/sheet")) {
                    String xml = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                    int cut = xml.indexOf("<sheetData");
                    out.write(xml.substring(0, cut).getBytes(StandardCharsets.UTF_8));
                    byte[] blanks = new byte[1 << 20];
                    java.util.Arrays.fill(blanks, (byte) ' ');
                    for (int i = 0; i < 200; i++) {
                        out.write(blanks);
                    }
                    out.write(xml.substring(cut).getBytes(StandardCharsets.UTF_8));
                } else {
                    in.transferTo(out);
                }
                out.closeEntry();
            }
        }
        assertThat(Files.size(bomb)).isLessThan(2_000_000);
        assertThat(refused(bomb)).contains("bomb.xlsx").containsIgnoringCase("zip bomb");
    }

    @Test
    void refusesATenMegabyteCell() throws IOException {
        Path big = dir.resolve("routes.csv");
        try (var w = Files.newBufferedWriter(big)) {
            w.write("gym,wall,route,set_on,discipline,grade,notes\nHarbour Hall,Slab,R1,2026-03-02,boulder,V2,");
            w.write("n".repeat(10_000_000));
            w.write("\n");
        }
        assertThat(refused(big))
                .contains("routes.csv:2: notes: 10,000,000 characters, more than the 100,000 the "
                        + "archive keeps here");
    }

    @Test
    void refusesAHugeNameAndAHugeList() throws IOException {
        Path f = ImportFiles.write(
                dir,
                "routes.csv",
                "gym,wall,route,set_on,discipline,grade,moves\n"
                        + "Harbour Hall,Slab," + "R".repeat(300) + ",2026-03-02,boulder,V2,"
                        + "dyno;".repeat(3_000) + "\n");
        assertThat(refused(f))
                .contains("route: 300 characters, more than the 255")
                .contains("moves: ");
    }

    @Test
    void refusesADeeplyNestedJsonDocument() throws IOException {
        Path nested = dir.resolve("reset.json");
        Files.writeString(
                nested,
                "{\"gym\": \"Harbour Hall\", \"routes\": [{\"notes\": " + "{\"a\": ".repeat(100_000) + "1"
                        + "}".repeat(100_000) + "}]}");
        assertThat(refused(nested))
                .contains("reset.json: is not a document Variset reads: it nests deeper")
                .contains("nesting depth (1001) exceeds the maximum allowed")
                .doesNotContain("StreamReadConstraints");
        Files.writeString(
                nested, "{\"gym\": \"Harbour Hall\", \"routes\": " + "[".repeat(100_000) + "]".repeat(100_000) + "}");
        assertThat(refused(nested)).contains("routes[0] is not an object");
    }

    @Test
    void refusesAFileThatIsNotWhatItsNameSays() throws IOException {
        Path fake = Files.write(dir.resolve("routes.xlsx"), "gym,wall\n".getBytes(StandardCharsets.UTF_8));
        assertThat(refused(fake))
                .contains("routes.xlsx: is not an XLSX workbook (expected a file saved as Excel " + "Workbook .xlsx)");
        try (InputStream ignored = Files.newInputStream(fake)) {
            assertThat(ignored.read()).isPositive();
        }
    }
}
