package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The commands a setting team uses between imports, on the spec's example files. */
class DayToDayCommandsTest {
    @TempDir
    Path home;

    private TestArchive archive;

    private static Path example(String name) {
        return Path.of("../docs/spec/examples", name);
    }

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    @BeforeEach
    void importExamples() {
        archive = TestArchive.fresh(home, "a");
        run("init").exits(ExitCode.OK);
        CliRun r = run(
                        "import",
                        example("routes.csv").toString(),
                        example("holds.csv").toString())
                .exits(ExitCode.OK);
        assertThat(r.out()).contains("3 routes new").contains("10 holds written");
    }

    @Test
    void reportsAnUnchangedSecondImportAndJsonCounts() throws Exception {
        CliRun r = run("import", example("routes.csv").toString(), "--format", "json")
                .exits(ExitCode.OK);
        var j = new ObjectMapper().readTree(r.out());
        assertThat(j.requiredAt("/routes/unchanged").asInt()).isEqualTo(3);
        assertThat(j.requiredAt("/routes/new").asInt()).isZero();
    }

    @Test
    void namesHowLongEachPhaseOfAnImportTookWhenVerbose() {
        Path routes = example("routes.csv");
        Path holds = example("holds.csv");
        CliRun quiet =
                run("import", routes.toString(), holds.toString(), "--update").exits(ExitCode.OK);
        assertThat(quiet.err()).doesNotContain(" took ");
        CliRun r = run("--verbose", "import", routes.toString(), holds.toString(), "--update")
                .exits(ExitCode.OK);
        for (String phase : new String[] {
            "reading routes",
            "checking holds",
            "comparing with the archive",
            "writing routes",
            "writing holds",
            "recording the change log",
            "committing",
            "updating the search index"
        }) {
            assertThat(r.err()).containsPattern("variset: " + phase + " took \\d+\\.\\d s");
        }
    }

    @Test
    void listsLocatedProblemsForABadFileAndWritesNothing() throws Exception {
        Path bad = Files.writeString(
                home.resolve("routes.csv"),
                "gym,wall,route,set_on,discipline,grade\n" + "Example Gym,North Arch,N9,2026-02-30,boulder,V2\n");
        CliRun r = run("import", bad.toString()).exits(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains(bad + ":2: set_on: no such date '2026-02-30'");
        assertThat(r.err()).doesNotContain("\tat ");
        assertThat(run("info", "--format", "json").out()).contains("\"routes\" : 3");
    }

    @Test
    void stripsAWallsOldRoutesOnResetDay() {
        CliRun r = run("strip", "--wall", "South Lead", "--on", "2026-04-01").exits(ExitCode.OK);
        assertThat(r.out()).contains("Stripped 1 route").contains("0 set that day");
        CliRun again =
                run("strip", "--wall", "North Arch", "--on", "2026-03-02").exits(ExitCode.OK);
        assertThat(again.out()).contains("Stripped 0 routes").contains("2 set that day stay up");
    }

    @Test
    void correctsOneRouteAndMergesSetters() throws java.io.IOException {
        CliRun amend = run(
                        "amend",
                        "N1",
                        "--wall",
                        "North Arch",
                        "--set-on",
                        "2026-03-02",
                        "--grade",
                        "V3",
                        "--setters",
                        "K. Ames")
                .exits(ExitCode.OK);
        assertThat(amend.out())
                .contains("Amended N1 (2026-03-02, North Arch):")
                .contains("grade: V2 -> V3")
                .contains("setters: ")
                .contains("-> [K. Ames]");
        CliRun exported = run(
                        "export",
                        "--gym",
                        "Example Gym",
                        "--format",
                        "json",
                        "--out",
                        home.resolve("amended.json").toString())
                .exits(ExitCode.OK);
        assertThat(exported.out()).contains("Exported");
        String routes = java.nio.file.Files.readString(home.resolve("amended.json"));
        assertThat(routes)
                .containsPattern("\"route\" : \"N1\"[^}]*\"grade\" : \"V3\"")
                .containsPattern("\"route\" : \"N1\"[^}]*\"setters\" : \\[ \"K. Ames\" \\]");
        CliRun merge = run("setter", "merge", "K. Ames", "Kit Ames").exits(ExitCode.OK);
        assertThat(merge.out()).contains("1 route now names 'Kit Ames'");
        CliRun rename = run("setter", "rename", "Rui Sol", "Kit Ames").exits(ExitCode.BAD_INPUT);
        assertThat(rename.err()).contains("exists already").contains("setter merge");
    }

    @Test
    void asksBeforeRemovingAResetAndRemovesWithYes() {
        CliRun no = archive.runWithInput("n\n", home, "remove", "--reset", "N-2026-03-02")
                .exits(ExitCode.OK);
        assertThat(no.out()).contains("This removes 2 routes and 8 holds").contains("Nothing removed");
        CliRun yes = run("remove", "--reset", "N-2026-03-02", "--yes").exits(ExitCode.OK);
        assertThat(yes.out()).contains("Removed 2 routes and 8 holds");
        assertThat(run("info", "--format", "json").out())
                .contains("\"routes\" : 1")
                .contains("\"resets\" : 1");
    }

    @Test
    void removesTheRoutesAFileBrought() {
        run("remove", "--file", example("routes.csv").toString(), "--yes").exits(ExitCode.OK);
        assertThat(run("info", "--format", "json").out())
                .contains("\"routes\" : 0")
                .contains("\"holds\" : 0");
    }

    @Test
    void exportsAndRefusesToOverwrite() {
        Path out = home.resolve("export");
        run("export", "--gym", "Example Gym", "--format", "csv", "--out", out.toString())
                .exits(ExitCode.OK);
        assertThat(out.resolve("holds.csv")).exists();
        CliRun again = run("export", "--gym", "Example Gym", "--format", "csv", "--out", out.toString())
                .exits(ExitCode.BAD_INPUT);
        assertThat(again.err()).contains("--force");
    }

    @Test
    void writesTemplatesWhoseExampleRowImportRefusesUntilReplaced() throws java.io.IOException {
        Path t = home.resolve("t");
        CliRun.run(home, "template", "--format", "csv", "--out", t.toString()).exits(ExitCode.OK);
        String[] files = {
            t.resolve("walls.csv").toString(),
            t.resolve("routes.csv").toString(),
            t.resolve("holds.csv").toString()
        };
        CliRun refused = run("import", files[0], files[1], files[2]).exits(ExitCode.BAD_INPUT);
        assertThat(refused.err())
                .contains(files[1] + ":2: gym: this is the template's example row: delete it")
                .contains(files[2] + ":2: gym: this is the template's example row");
        // A gym fills in its own row in the example's place: the layout imports cleanly.
        for (String f : files) {
            Path p = Path.of(f);
            Files.writeString(p, Files.readString(p).replace("EXAMPLE ROW (delete it)", "Harbour Hall"));
        }
        CliRun r = run("import", files[0], files[1], files[2]).exits(ExitCode.OK);
        assertThat(r.out())
                .contains("1 route new")
                .contains("1 hold written")
                .contains("gyms new: Harbour Hall")
                .contains("walls new: Cave (Harbour Hall)");
        CliRun.run(home, "template", "--format", "xlsx", "--out", t.toString()).exits(ExitCode.OK);
        assertThat(t.resolve("variset-template.xlsx")).exists();
    }
}
