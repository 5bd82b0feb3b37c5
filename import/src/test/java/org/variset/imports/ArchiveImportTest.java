package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.variset.imports.ImportFiles.HOLDS_HEADER;
import static org.variset.imports.ImportFiles.ROUTES_HEADER;
import static org.variset.imports.ImportFiles.specExample;
import static org.variset.imports.ImportFiles.write;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.problem.Remedy;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.Route;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;
import org.variset.imports.load.ImportSummary;

class ArchiveImportTest {
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

    private ImportSummary run(ImportOptions options, Path... files) {
        return new ArchiveImporter(archive).run(List.of(files), options, ImportProgress.NONE);
    }

    private ImportSummary run(Path... files) {
        return run(ImportOptions.defaults(), files);
    }

    private Route route(String label) {
        return archive.fromTransaction(s -> {
            Route r = s.createSelectionQuery("from Route where label = :l", Route.class)
                    .setParameter("l", label)
                    .getSingleResult();
            r.holds().size();
            r.setters().size();
            r.reset().label();
            r.gym().name();
            return r;
        });
    }

    @Nested
    class SpecExamples {
        @Test
        void importsTheRoutesAndHoldsOfTheSpec() {
            ImportSummary s = run(specExample("routes.csv"), specExample("holds.csv"));
            assertThat(List.of(s.routesNew(), s.holdsWritten(), s.wallsNew())).containsExactly(3L, 10L, 2L);
            Route n1 = route("N1");
            assertThat(n1.gradeIrcra()).isEqualTo(15.5);
            assertThat(n1.moveDifficulty()).containsExactly(3, 4, 6, 3);
            assertThat(n1.holds())
                    .extracting(HoldPlacement::grips)
                    .containsExactly(List.of(0.0), List.of(90.0), List.of(), List.of(90.0, 270.0), List.of(0.0));
            assertThat(n1.holds().get(2).role()).isEqualTo(HoldRole.FOOT);
            Route n2 = route("N2");
            assertThat(n2.notes()).isEqualTo("big jump to the \"bucket\", then top out");
            assertThat(n2.holds().get(0).grips()).containsExactly(45.0);
            assertThat(route("S1").holds())
                    .extracting(HoldPlacement::grips)
                    .containsExactly(List.of(270.0), List.of(225.0));
            assertThat(route("S1").reset().label()).isEqualTo("South Lead 2026-03-09");
        }

        @Test
        void readsTheJsonExampleAsTheSameRouteAsTheCsv() {
            run(specExample("routes.csv"), specExample("holds.csv"));
            ImportSummary again = run(specExample("reset.json"));
            assertThat(List.of(again.routesNew(), again.routesUnchanged(), again.routesChanged()))
                    .containsExactly(0L, 1L, 0L);
        }
    }

    @Nested
    class Idempotence {
        @Test
        void addsNothingTheSecondTime() {
            run(specExample("routes.csv"), specExample("holds.csv"));
            ArchiveStats before = archive.stats();
            ImportSummary s = run(specExample("routes.csv"), specExample("holds.csv"));
            assertThat(List.of(s.routesNew(), s.routesUnchanged(), s.routesChanged(), s.holdsWritten()))
                    .containsExactly(0L, 3L, 0L, 0L);
            assertThat(archive.stats()).isEqualTo(before);
        }

        @Test
        void refusesAChangedRowListingTheDifferencesUnlessUpdating() {
            Path v1 = write(
                    dir,
                    "routes.csv",
                    ROUTES_HEADER + "\nHarbour Hall,Slab,R1,2026-03-02,boulder,V2,,," + "Ana Brook,red,,,,,\n");
            run(v1);
            Path v2 = write(
                    dir,
                    "routes2.csv",
                    ROUTES_HEADER + "\nHarbour Hall,Slab,R1,2026-03-02,boulder,V3,,," + "Ana Brook,blue,,,,,\n");
            assertThatThrownBy(() -> run(v2))
                    .isInstanceOf(ImportException.class)
                    .hasMessageContaining("grade: V2 (v) -> V3 (v)")
                    .hasMessageContaining("color: red -> blue")
                    .isInstanceOfSatisfying(
                            ImportException.class,
                            e -> assertThat(e.problems())
                                    .extracting(Problem::remedy)
                                    .containsExactly(Remedy.of(Remedy.Kind.ALLOW_UPDATE)));
            assertThat(route("R1").gradeText()).isEqualTo("V2");
            ImportSummary s = run(ImportOptions.defaults().withUpdate(true), v2);
            assertThat(s.routesChanged()).isEqualTo(1);
            assertThat(route("R1").gradeText()).isEqualTo("V3");
            assertThat(route("R1").color()).isEqualTo("blue");
        }

        @Test
        void comparesTheWholeHoldListOfARoute() {
            run(specExample("routes.csv"), specExample("holds.csv"));
            Path fewer = write(
                    dir,
                    "holds.csv",
                    HOLDS_HEADER + "\nExample Gym,N2,2026-03-02,1,start,sloper,m," + "1:30,S9,3.00,1.00\n");
            assertThatThrownBy(() -> run(fewer)).hasMessageContaining("holds: 3 placements -> 1 placements");
            run(ImportOptions.defaults().withUpdate(true), fewer);
            assertThat(route("N2").holds()).hasSize(1);
            assertThat(archive.stats().holds()).isEqualTo(8);
        }
    }

    @Nested
    class AllOrNothing {
        @Test
        void leavesTheArchiveAsItWasWhenWritingFailsHalfWay() {
            StringBuilder holds = new StringBuilder(HOLDS_HEADER + "\n");
            for (int i = 1; i <= 5000; i++) {
                holds.append("Example Gym,N1,2026-03-02,").append(i).append(",hand,crimp,s,90,,,\n");
            }
            Path h = write(dir, "holds.csv", holds.toString());
            ImportProgress failHalfWay = (phase, rows) -> {
                if (phase.equals("writing holds") && rows >= 2000) {
                    throw new IllegalStateException("injected failure after " + rows + " holds");
                }
            };
            assertThatThrownBy(() -> new ArchiveImporter(archive)
                            .run(List.of(specExample("routes.csv"), h), ImportOptions.defaults(), failHalfWay))
                    .hasMessageContaining("injected failure");
            ArchiveStats s = archive.stats();
            assertThat(List.of(s.gyms(), s.walls(), s.routes(), s.holds(), s.setters()))
                    .containsExactly(0L, 0L, 0L, 0L, 0L);
        }

        @Test
        void writesNothingInADryRun() {
            ImportSummary s =
                    run(ImportOptions.defaults().withDryRun(true), specExample("routes.csv"), specExample("holds.csv"));
            assertThat(List.of(s.routesNew(), s.holdsWritten())).containsExactly(3L, 10L);
            assertThat(archive.stats().routes()).isZero();
        }

        @Test
        void importsTheGoodRowsAndListsTheSkippedOnesWhenAsked() {
            Path f = write(
                    dir,
                    "routes.csv",
                    ROUTES_HEADER + "\nHarbour Hall,Slab,R1,2026-03-02,boulder,V2,,,,,,,,,"
                            + "\nHarbour Hall,Slab,R2,2026-03-32,boulder,V2,,,,,,,,,\n");
            ImportSummary s = run(ImportOptions.defaults().withSkipBadRows(true), f);
            assertThat(s.routesNew()).isEqualTo(1);
            assertThat(s.skippedCount()).isEqualTo(1);
            assertThat(s.skipped()).singleElement().asString().startsWith(f + ":3: set_on:");
        }
    }

    @Nested
    class CsvDialects {
        @Test
        void readsAByteOrderMarkAndWindowsLineEndings() {
            Path f = write(
                    dir,
                    "routes.csv",
                    "\uFEFF" + ROUTES_HEADER + "\r\nHarbour Hall,Slab,R1,2026-03-02," + "boulder,V2,,,,,,,,,\r\n");
            assertThat(run(f).routesNew()).isEqualTo(1);
            assertThat(route("R1").gym().name()).isEqualTo("Harbour Hall");
        }

        @Test
        void readsSemicolonsWithDecimalCommas() {
            Path r = write(
                    dir,
                    "routes.csv",
                    "gym;wall;route;set_on;discipline;grade;angle_deg\n"
                            + "Harbour Hall;Slab;R1;2026-03-02;boulder;6A;-7,5\n");
            Path h = write(
                    dir,
                    "holds.csv",
                    "gym;route;set_on;type;x_m;y_m;grip\n" + "Harbour Hall;R1;2026-03-02;crimp;1,25;2,5;\"90;270\"\n");
            run(r, h);
            assertThat(route("R1").angleDeg()).isEqualTo(-7.5);
            HoldPlacement hold = route("R1").holds().get(0);
            assertThat(List.of(hold.xM(), hold.yM())).containsExactly(1.25, 2.5);
        }

        @Test
        void countsPhysicalLinesAcrossQuotedNewlines() {
            Path f = write(
                    dir,
                    "routes.csv",
                    ROUTES_HEADER + "\nHarbour Hall,Slab,R1,2026-03-02,boulder,V2,,,,,,,,,"
                            + "\"two\nlines, and a comma\"\nHarbour Hall,Slab,R2,2026-03-02,boulder,V2x,,,,,,,,,\n");
            assertThatThrownBy(() -> run(f))
                    .isInstanceOfSatisfying(
                            ImportException.class,
                            e -> assertThat(e.problems())
                                    .singleElement()
                                    .asString()
                                    .startsWith(f + ":4: grade:"));
        }

        @Test
        void keepsUnknownColumnsAsExtraFieldsAndNamesThem() {
            Path f = write(
                    dir,
                    "routes.csv",
                    "gym,wall,route,set_on,discipline,grade,tag colour\n"
                            + "Harbour Hall,Slab,R1,2026-03-02,boulder,V2,=mint\n");
            ImportSummary s = run(f);
            assertThat(s.extraColumns()).containsExactly("routes.tag colour");
            assertThat(route("R1").extraFields()).isEqualTo(Map.of("tag colour", "=mint"));
        }

        @Test
        void restoresTextThatExportNeutralised() {
            Path f = write(
                    dir,
                    "routes.csv",
                    "gym,wall,route,set_on,discipline,grade,notes\n"
                            + "Harbour Hall,Slab,R1,2026-03-02,boulder,V2,'=SUM(A1)\n");
            run(f);
            assertThat(route("R1").notes()).isEqualTo("=SUM(A1)");
        }
    }

    @Test
    void mapsVocabularySpellingsToTheirTermsAndListsUnknownOnes() {
        Path f = write(
                dir,
                "routes.csv",
                "gym,wall,route,set_on,discipline,grade,moves\n"
                        + "Harbour Hall,Slab,R1,2026-03-02,boulder,V2,Heelhook;lunge;bat hang\n");
        ImportSummary s = run(f);
        assertThat(route("R1").moves()).containsExactly("heel hook", "dyno", "bat hang");
        assertThat(s.unknownTerms()).containsExactly("move: bat hang");
        assertThat(route("R1").setOn()).isEqualTo(LocalDate.of(2026, 3, 2));
    }
}
