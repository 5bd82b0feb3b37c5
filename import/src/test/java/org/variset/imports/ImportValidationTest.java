package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;
import static org.variset.imports.ImportFiles.HOLDS_HEADER;
import static org.variset.imports.ImportFiles.ROUTES_HEADER;
import static org.variset.imports.ImportFiles.write;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.store.Archive;
import org.variset.archive.testing.TestArchives;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/** Each validation case of docs/spec/interchange.md and the import issue: the message form is file:line: column: why. */
class ImportValidationTest {
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

    private List<String> problems(Path... files) {
        Throwable t = org.assertj.core.api.Assertions.catchThrowable(
                () -> new ArchiveImporter(archive).run(List.of(files), ImportOptions.defaults(), ImportProgress.NONE));
        assertThat(t).as("the import should fail").isInstanceOf(ImportException.class);
        assertThat(archive.stats().routes()).as("nothing written").isZero();
        return ((ImportException) t).problems().stream().map(Problem::toString).toList();
    }

    private Path routes(String... rows) {
        return write(dir, "routes.csv", ROUTES_HEADER + "\n" + String.join("\n", rows) + "\n");
    }

    private static final String GOOD = "Harbour Hall,Slab,R1,2026-03-02,boulder,V2,,,,,,,,,";

    @Nested
    class Headers {
        @Test
        void namesAMissingRequiredColumn() {
            Path f = write(
                    dir,
                    "routes.csv",
                    "gym,wall,route,set_on,discipline\nHarbour Hall,Slab,R1,2026-03-02," + "boulder\n");
            assertThat(problems(f))
                    .anySatisfy(p -> assertThat(p).startsWith(f + ":1: grade: missing required " + "column"));
        }

        @Test
        void suggestsTheNearestNameForANearMiss() {
            Path f = write(
                    dir,
                    "routes.csv",
                    "gym,wall,route,set_onn,discipline,grade\nHarbour Hall,Slab,R1," + "2026-03-02,boulder,V2\n");
            assertThat(problems(f)).contains(f + ":1: set_onn: unknown column (did you mean `set_on`?)");
        }

        @Test
        void refusesAnEmptyFile() {
            Path f = write(dir, "routes.csv", "");
            assertThat(problems(f)).singleElement().asString().contains("the file is empty");
        }

        @Test
        void refusesAHeaderWithoutRows() {
            Path f = write(dir, "routes.csv", ROUTES_HEADER + "\n");
            assertThat(problems(f)).singleElement().asString().contains("no rows after the header");
        }
    }

    @Nested
    class Cells {
        @Test
        void refusesAnAmbiguousDateWithTheIsoHint() {
            Path f = routes("Harbour Hall,Slab,R1,02/03/2026,boulder,V2,,,,,,,,,");
            assertThat(problems(f))
                    .containsExactly(f + ":2: set_on: date '02/03/2026' is ambiguous (write dates "
                            + "as ISO YYYY-MM-DD, for example 2026-03-02)");
        }

        @Test
        void refusesAnImpossibleDate() {
            assertThat(problems(routes("Harbour Hall,Slab,R1,2026-02-30,boulder,V2,,,,,,,,,")))
                    .singleElement()
                    .asString()
                    .contains("set_on: no such date '2026-02-30'");
        }

        @Test
        void refusesAStripDateBeforeTheSetDate() {
            assertThat(problems(routes("Harbour Hall,Slab,R1,2026-03-02,boulder,V2,2026-03-01,,,,,,,,")))
                    .singleElement()
                    .asString()
                    .contains("stripped_on: 2026-03-01 is not after set_on 2026-03-02");
        }

        @Test
        void refusesAnUnknownGrade() {
            assertThat(problems(routes("Harbour Hall,Slab,R1,2026-03-02,boulder,V2x,,,,,,,,,")))
                    .singleElement()
                    .asString()
                    .contains("grade: 'V2x' is not a grade for a boulder route");
        }

        @Test
        void refusesAnAmbiguousGradeNamingBothScales() {
            assertThat(problems(routes("Harbour Hall,Lead,R1,2026-03-02,rope,5+,,,,,,,,,")))
                    .singleElement()
                    .asString()
                    .contains("French 5+")
                    .contains("UIAA 5+")
                    .contains("grade_scale");
        }

        /** docs/spec/interchange.md: move difficulties are whole numbers 1 to 10; 6.0 reads as 6. */
        @Test
        void refusesADecimalMoveDifficultyWithTheWholeNumberRule() {
            List<String> p = problems(routes("Harbour Hall,Slab,R1,2026-03-02,boulder,V2,,,,,,,,6.0;6.5;7,"));
            assertThat(p)
                    .singleElement()
                    .asString()
                    .contains(":2: move_difficulty: '6.5' is not a whole number (expected whole numbers 1 to 10");
        }

        @Test
        void reportsSeveralProblemsOfOneRun() {
            List<String> p = problems(routes(
                    "Harbour Hall,Slab,R1,2026-13-01,boulder,V2,,,,,,,,,",
                    "Harbour Hall,Slab,R2,2026-03-02,boulder,V99,,,,,,,,,",
                    GOOD,
                    GOOD));
            assertThat(p).hasSize(3);
            assertThat(p.get(2))
                    .contains(":5: route: route R1 of 2026-03-02 on Slab (Harbour Hall) is already at ")
                    .contains(":4");
        }
    }

    @Nested
    class HoldCells {
        private List<String> holdProblems(String holdRow) {
            return problems(routes(GOOD), write(dir, "holds.csv", HOLDS_HEADER + "\n" + holdRow + "\n"));
        }

        @Test
        void suggestsTheNearestHoldType() {
            assertThat(holdProblems("Harbour Hall,R1,2026-03-02,1,hand,crimpp,s,90,,,"))
                    .singleElement()
                    .asString()
                    .contains("type: unknown hold type 'crimpp' (did you mean crimp?");
        }

        @Test
        void suggestsTheNearestRole() {
            assertThat(holdProblems("Harbour Hall,R1,2026-03-02,1,hnd,crimp,s,90,,,"))
                    .singleElement()
                    .asString()
                    .contains("role: unknown hold role 'hnd' (did you mean hand?");
        }

        @Test
        void refusesAGripAngleOutsideTheCircle() {
            assertThat(holdProblems("Harbour Hall,R1,2026-03-02,1,hand,crimp,s,400,,,"))
                    .singleElement()
                    .asString()
                    .contains("grip: grip angle '400' is outside 0-360 degrees");
        }

        @Test
        void refusesAnUnreadableClock() {
            assertThat(holdProblems("Harbour Hall,R1,2026-03-02,1,hand,crimp,s,14:00,,,"))
                    .singleElement()
                    .asString()
                    .contains("grip: '14:00' is not a clock position");
        }

        /** A route row with a problem is reported once; its holds do not each repeat that it is missing. */
        @Test
        void reportsARefusedRouteOnceNotOncePerHold() {
            List<String> p = problems(
                    routes("Harbour Hall,Slab,R1,2026-03-02,boulder,V99,,,,,,,,,"),
                    write(
                            dir,
                            "holds.csv",
                            HOLDS_HEADER + "\nHarbour Hall,R1,2026-03-02,1,hand,crimp,s,90,,,\n"
                                    + "Harbour Hall,R1,2026-03-02,2,hand,jug,m,0,,,\n"));
            assertThat(p).singleElement().asString().contains("routes.csv:2: grade:");
        }

        @Test
        void refusesAHoldWhoseRouteIsNowhere() {
            assertThat(holdProblems("Harbour Hall,R9,2026-03-02,1,hand,crimp,s,90,,,"))
                    .singleElement()
                    .asString()
                    .contains("route: route R9 of 2026-03-02 in Harbour Hall is neither in the import "
                            + "nor in the archive");
        }
    }

    @Nested
    class Encodings {
        @Test
        void refusesNonUtf8WithTheSaveAsHint() {
            byte[] latin1 = (ROUTES_HEADER + "\nHarbour Hall,Sal\u00e3o,R1,2026-03-02,boulder,V2,,,,,,,,,\n")
                    .getBytes(StandardCharsets.ISO_8859_1);
            Path f = ImportFiles.bytes(dir, "routes.csv", latin1);
            assertThat(problems(f))
                    .singleElement()
                    .asString()
                    .contains("is not UTF-8 text")
                    .contains("CSV UTF-8");
        }
    }
}
