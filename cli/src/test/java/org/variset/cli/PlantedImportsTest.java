package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Corrections and second imports as a setting team makes them, planted in an invented gym: what a re-import after a
 * strip keeps, what a second spelling of a name does, and which silent data problems are now said.
 */
class PlantedImportsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String GYM = "Saltmarsh Bouldering";

    @TempDir
    Path home;

    private TestArchive archive;
    private String[] files;

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    private static PlantedGym gym() {
        PlantedGym g =
                new PlantedGym(GYM).wall("Kiln", "boulder", 35, 4.5, 10).wall("Milk Slab", "boulder", -10, 4.2, 8);
        for (int i = 1; i <= 2; i++) {
            g.route("Kiln", "Green " + i, "2026-01-05", "boulder", "V" + (i + 2))
                    .by("Dario Penhale")
                    .moves("heel hook;match")
                    .hold("start", "jug", "l", "0", "J" + i, 1.0 + 3 * i, 0.8)
                    .hand("crimp", "45", "C" + i, 1.4 + 3 * i, 1.8)
                    .hand("pinch", "90", "P" + i, 1.8 + 3 * i, 2.6)
                    .hold("finish", "jug", "l", "0", "J9" + i, 2.0 + 3 * i, 3.7)
                    .foot(1.1 + 3 * i, 0.3);
        }
        return g;
    }

    @BeforeEach
    void importTheGym() {
        archive = TestArchive.fresh(home, "planted-imports");
        run("init").exits(ExitCode.OK);
        files = gym().write(home.resolve("first"));
        run("import", files[0], files[1], files[2]).exits(ExitCode.OK);
    }

    private JsonNode standing(String day) throws IOException {
        return JSON.readTree(run("audit", "--standing-on", day, "--format", "json")
                .exits(ExitCode.OK)
                .out());
    }

    @Test
    void reimportingTheSpreadsheetAfterAStripKeepsTheStripAndUpdateChangesOnlyWhatChanged() throws IOException {
        run("strip", "--wall", "Kiln", "--on", "2026-02-02").exits(ExitCode.OK);
        assertThat(standing("2026-02-10").requiredAt("/routes").asInt()).isZero();
        // The same file again, with its empty stripped_on cells: nothing to change, nothing refused.
        JsonNode again = JSON.readTree(run("import", files[1], files[2], "--format", "json")
                .exits(ExitCode.OK)
                .out());
        assertThat(again.requiredAt("/routes/unchanged").asInt()).isEqualTo(2);
        assertThat(standing("2026-02-10").requiredAt("/routes").asInt()).isZero();
        // One grade corrected in the spreadsheet: refused without --update, and the remedy loses nothing.
        Path edited = home.resolve("edited.csv");
        Files.writeString(
                edited,
                Files.readString(Path.of(files[1]))
                        .replace("Green 1,2026-01-05,boulder,V3", "Green 1,2026-01-05,boulder,V5"));
        CliRun refused = run("import", edited.toString(), files[2]).exits(ExitCode.BAD_INPUT);
        assertThat(refused.err()).contains("--update --dry-run").doesNotContain("stripped_on");
        String dry = run("import", edited.toString(), files[2], "--update", "--dry-run")
                .exits(ExitCode.OK)
                .out();
        assertThat(dry).contains("V3").contains("V5").doesNotContain("stripped");
        JsonNode updated = JSON.readTree(run("import", edited.toString(), files[2], "--update", "--format", "json")
                .exits(ExitCode.OK)
                .out());
        assertThat(updated.requiredAt("/routes/changed").asInt()).isEqualTo(1);
        assertThat(updated.required("holds_written").asInt()).isZero();
        assertThat(standing("2026-02-10").requiredAt("/routes").asInt()).isZero();
        assertThat(standing("2026-01-20").requiredAt("/routes").asInt()).isEqualTo(2);
    }

    @Test
    void refusesASecondSpellingOfAWallOrASetterUntilConfirmedAndNamesWhatIsNew() throws IOException {
        PlantedGym more = new PlantedGym(GYM);
        more.route("Milk slab", "M1", "2026-01-12", "boulder", "V1")
                .by("Dario Penhal")
                .hand("sloper", "0", "", 1, 1);
        more.route("Milk Slab", "M2", "2026-01-12", "boulder", "V2")
                .by("Ilse Marrow")
                .hand("sloper", "0", "", 2, 1);
        String[] second = more.write(home.resolve("second"));
        CliRun r = run("import", second[1], "--dry-run").exits(ExitCode.BAD_INPUT);
        assertThat(r.err())
                .contains("wall 'Milk slab' would be new, but the archive has 'Milk Slab'")
                .contains("setter 'Dario Penhal' would be new, but the archive has 'Dario Penhale'")
                .contains("--new-name");
        assertThat(run("info", "--format", "json").out()).contains("\"routes\" : 2");
        String dry = run("import", second[1], "--dry-run", "--new-name", "Milk slab", "--new-name", "Dario Penhal")
                .exits(ExitCode.OK)
                .out();
        assertThat(dry)
                .contains("walls would be new: Milk slab (" + GYM + ")")
                .contains("setters would be new: Dario Penhal, Ilse Marrow");
        JsonNode j = JSON.readTree(
                run("import", second[1], "--new-name", "Milk slab", "--new-name", "Dario Penhal", "--format", "json")
                        .exits(ExitCode.OK)
                        .out());
        assertThat(j.required("new_walls").toString()).contains("Milk slab");
        assertThat(j.required("new_setters").toString())
                .contains("Dario Penhal")
                .contains("Ilse Marrow");
    }

    @Test
    void suggestsTheRouteOfThatDayForALabelWrittenWithoutItsSpace() throws IOException {
        Path holds = Files.writeString(
                home.resolve("holds.csv"),
                PlantedGym.HOLDS_HEADER + "\n" + GYM + ",Kiln,Green2,2026-01-05,6,hand,sloper,m,0,S1,5.0,3.0\n");
        CliRun r = run("import", holds.toString()).exits(ExitCode.BAD_INPUT);
        assertThat(r.err())
                .contains(holds + ":2")
                .contains("did you mean 'Green 2', the route of that day with a label written almost the same?");
    }

    @Test
    void saysDuplicatedSequenceNumbersHoldsOffTheWallAndGripsWithoutADirection() throws IOException {
        String head = PlantedGym.HOLDS_HEADER + "\n";
        String row = GYM + ",Kiln,Green 1,2026-01-05,";
        Path dup = Files.writeString(
                home.resolve("dup.csv"),
                head + row + "1,start,jug,l,0,J1,4.0,0.8\n" + row + "2,hand,crimp,s,45,C1,4.4,1.8\n" + row
                        + "2,hand,pinch,m,90,P1,4.8,2.6\n");
        assertThat(run("import", dup.toString(), "--update")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains(dup + ":4: seq: route Green 1 of 2026-01-05 has a hold 2 already");
        Path off = Files.writeString(
                home.resolve("off.csv"),
                head + row + "1,start,jug,l,0,J1,12.5,0.8\n" + row + "2,hand,crimp,s,45,C1,4.4,1.8\n");
        assertThat(run("import", off.toString(), "--update")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains(off + ":2: x_m: 12.5 m is beyond the wall's width of 10 m (in the archive)");
        Path noGrip = Files.writeString(
                home.resolve("nogrip.csv"),
                head + row + "1,start,jug,l,0,J1,4.0,0.8\n" + row + "2,hand,crimp,s,,C1,4.4,1.8\n");
        CliRun warned = run("import", noGrip.toString(), "--update").exits(ExitCode.OK);
        assertThat(warned.err())
                .contains("variset: warning: " + noGrip + ": 1 hand hold has no grip direction (line 3)");
    }
}
