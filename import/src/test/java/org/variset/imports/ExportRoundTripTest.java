package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.variset.imports.ImportFiles.write;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.export.ArchiveExporter;
import org.variset.imports.export.ExportFormat;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

class ExportRoundTripTest {
    @TempDir
    Path dir;

    private Path walls;
    private Path routes;
    private Path holds;

    /** An invented gym with every field used: several grips, positions, difficulties, unicode, formula-like text. */
    @BeforeEach
    void writeFullReset() {
        walls = write(
                dir,
                "walls.csv",
                "gym,wall,discipline,angle_deg,height_m,width_m,cycle_days,mat\n"
                        + "Harbour Hall,Cave Ôrla,boulder,35,4.2,9.5,28,dual\n"
                        + "Harbour Hall,Slab Sul,both,-10,12,6.5,56,\n");
        routes = write(
                dir,
                "routes.csv",
                "gym,wall,route,set_on,discipline,grade,stripped_on,reset,setters,"
                        + "color,angle_deg,moves,styles,move_difficulty,notes,tag\n"
                        + "Harbour Hall,Cave Ôrla,Blue 3,2026-03-02,boulder,V4,2026-04-06,Cave March,Inês Varga;Tomo Heikkilä,"
                        + "blue,30,heel hook;dyno;match,power;coordination,3;4;8;3,\"jump to the \"\"bucket\"\", then top out"
                        + "\nずっと\",B-3\n"
                        + "Harbour Hall,Cave Ôrla,-1,2026-03-03,boulder,6a,,Cave March,Tomo Heikkilä,,,,,,=1+2,@x\n"
                        + "Harbour Hall,Slab Sul,S1,2026-03-09,rope,6b+,,,Ana Brook,,-12.5,smear,slab,,,\n");
        holds = write(
                dir,
                "holds.csv",
                "gym,wall,route,set_on,seq,role,type,size,grip,hold_ref,x_m,y_m,bolt\n"
                        + "Harbour Hall,Cave Ôrla,Blue 3,2026-03-02,1,start,jug,l,0,J12,1.2,0.8,M10\n"
                        + "Harbour Hall,Cave Ôrla,Blue 3,2026-03-02,2,hand,pinch,m,90;270,P7,1.9,1.85,\n"
                        + "Harbour Hall,Cave Ôrla,Blue 3,2026-03-02,3,,foot-chip,xs,,F3,1.3,0.45,\n"
                        + "Harbour Hall,Cave Ôrla,Blue 3,2026-03-02,4,finish,sloper,xl,1:15,,,,\n"
                        + "Harbour Hall,Cave Ôrla,-1,2026-03-03,,hand,crimp,,135,,,,\n");
    }

    private static Archive importInto(ImportOptions options, Path... files) {
        Archive a = TestArchives.fresh();
        new ArchiveImporter(a).run(List.of(files), options, ImportProgress.NONE);
        return a;
    }

    @ParameterizedTest
    @EnumSource(ExportFormat.class)
    void givesIdenticalContentWhenExportedAndImportedAgain(ExportFormat format) {
        ImportOptions rope = ImportOptions.defaults();
        try (Archive original = importInto(rope, walls, routes, holds)) {
            List<String> before = ArchiveDump.of(original);
            assertThat(before).hasSize(2 + 3 + 5);
            Path out = dir.resolve(
                    format == ExportFormat.CSV ? "out" : "out." + format.name().toLowerCase());
            new ArchiveExporter(original)
                    .export(new ArchiveExporter.Selection("Harbour Hall", null, null, null), format, out, false);
            Path[] files = format == ExportFormat.CSV
                    ? new Path[] {out.resolve("walls.csv"), out.resolve("routes.csv"), out.resolve("holds.csv")}
                    : new Path[] {out};
            try (Archive copy = importInto(rope, files)) {
                assertThat(ArchiveDump.of(copy)).containsExactlyElementsOf(before);
            }
        }
    }

    /** OWASP, "CSV Injection": cells starting with = + - @ get a leading quote; numbers stay numbers. */
    @Test
    void neutralisesFormulaTextButNotNegativeNumbers() throws Exception {
        try (Archive original = importInto(ImportOptions.defaults(), walls, routes, holds)) {
            new ArchiveExporter(original)
                    .export(
                            new ArchiveExporter.Selection("Harbour Hall", null, null, null),
                            ExportFormat.CSV,
                            dir.resolve("out"),
                            false);
            String csv = Files.readString(dir.resolve("out/routes.csv"), StandardCharsets.UTF_8);
            assertThat(csv)
                    .contains(",'-1,")
                    .contains(",'=1+2,")
                    .contains(",'@x")
                    .contains(",-12.5,");
            assertThat(Files.readString(dir.resolve("out/walls.csv"))).contains(",-10,");
        }
    }

    @Test
    void exportsADateWindowAndOneWall() {
        try (Archive original = importInto(ImportOptions.defaults(), walls, routes, holds)) {
            ArchiveExporter.Result r = new ArchiveExporter(original)
                    .export(
                            new ArchiveExporter.Selection(
                                    "Harbour Hall", LocalDate.of(2026, 3, 3), LocalDate.of(2026, 3, 31), "Cave Ôrla"),
                            ExportFormat.JSON,
                            dir.resolve("x.json"),
                            false);
            assertThat(List.of(r.walls(), r.routes(), r.holds())).containsExactly(1, 1, 1);
        }
    }

    @Test
    void refusesToOverwriteWithoutForce() {
        try (Archive original = importInto(ImportOptions.defaults(), walls, routes, holds)) {
            ArchiveExporter e = new ArchiveExporter(original);
            ArchiveExporter.Selection all = new ArchiveExporter.Selection("Harbour Hall", null, null, null);
            e.export(all, ExportFormat.XLSX, dir.resolve("a.xlsx"), false);
            assertThatThrownBy(() -> e.export(all, ExportFormat.XLSX, dir.resolve("a.xlsx"), false))
                    .isInstanceOfSatisfying(
                            InputException.class,
                            x -> assertThat(x.remedy().kind()).isEqualTo(Remedy.Kind.REPLACE_EXISTING));
            e.export(all, ExportFormat.XLSX, dir.resolve("a.xlsx"), true);
            assertThat(dir.toFile().list()).noneMatch(n -> n.endsWith(".part"));
        }
    }

    @Test
    void namesTheGymsWhenTheGymIsUnknown() {
        try (Archive original = importInto(ImportOptions.defaults(), walls, routes, holds)) {
            assertThatThrownBy(() -> new ArchiveExporter(original)
                            .export(
                                    new ArchiveExporter.Selection("Harbor", null, null, null),
                                    ExportFormat.JSON,
                                    dir.resolve("x.json"),
                                    false))
                    .hasMessageContaining("no gym named 'Harbor'")
                    .hasMessageContaining("Harbour Hall");
        }
    }
}
