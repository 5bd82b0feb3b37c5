package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Looking things up in an invented gym: names, grades, searches by setter and by one hold, a first setting. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PlantedLookupsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String GYM = "Larch Hall Climbing";

    @TempDir
    static Path home;

    private TestArchive archive;

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    private JsonNode json(String... args) throws IOException {
        return JSON.readTree(run(args).exits(ExitCode.OK).out());
    }

    @BeforeAll
    void plant() {
        archive = TestArchive.fresh(home, "planted-lookups");
        run("init").exits(ExitCode.OK);
        PlantedGym g = new PlantedGym(GYM).wall("Kiln", "boulder", 35, 4.5, 10).wall("Tower", "rope", 5, 14, 8);
        g.route("Tower", "T1", "2026-01-19", "rope", "5a")
                .by("Dario Penhale")
                .hand("edge", "0", "", 1, 2)
                .done()
                .route("Tower", "T2", "2026-01-19", "rope", "5b")
                .by("Dario Penhale")
                .hand("edge", "0", "", 3, 2)
                .done()
                .route("Kiln", "B1", "2026-02-02", "boulder", "V3")
                .by("Ilse Marrow")
                .hold("hand", "sloper", "xl", "0", "", 1, 1)
                .hold("hand", "jug", "s", "0", "", 2, 2)
                .done()
                .route("Kiln", "B2", "2026-02-02", "boulder", "V4")
                .by("Ilse Marrow")
                .hold("hand", "jug", "xl", "0", "", 4, 1)
                .hold("hand", "sloper", "s", "0", "", 5, 2);
        // Grades on both sides of V3..V5 in the V scale, a slash grade at each edge, and two in Font.
        String[][] more = {
            {"G2", "V2"},
            {"G3", "V3"},
            {"G34", "V3/4"},
            {"G5", "V5"},
            {"G56", "V5/6"},
            {"G6", "V6"},
            {"F6A", "6A"},
            {"F6B", "6B"},
            {"F6C", "6C"}
        };
        for (int i = 0; i < more.length; i++) {
            g.route("Kiln", more[i][0], "2026-02-02", "boulder", more[i][1])
                    .by("Ilse Marrow")
                    .hand("edge", "90", "", 6 + 0.3 * i, 1);
        }
        String[] files = g.write(home.resolve("planted"));
        run("import", files[0], files[1], files[2]).exits(ExitCode.OK);
    }

    private List<String> hits(String... query) throws IOException {
        List<String> args = new ArrayList<>(List.of("search"));
        args.addAll(List.of(query));
        args.addAll(List.of("--format", "json"));
        List<String> out = new ArrayList<>();
        json(args.toArray(String[]::new))
                .required("hits")
                .forEach(h -> out.add(h.required("route").asText()));
        return out;
    }

    @Test
    void readsFrenchLettersAsTheGradesTheyAre() throws IOException {
        // docs/spec/grades.md: 5a at IRCRA 9 and 5c at 10 (common practice, from memory); 5b half a level between
        // (9.5, our even spacing, so that 5a and 5b are two grades).
        assertThat(run("grade", "5b", "--discipline", "rope").exits(ExitCode.OK).out())
                .startsWith("5b: French 5b, IRCRA 9.5");
        assertThat(hits("grade:5b")).containsExactly("T2");
        assertThat(hits("grade:5a")).containsExactly("T1");
    }

    /**
     * docs/spec/grades.md, "Grade ranges", on the IRCRA table (Draper et al. 2015, secondary transcription for the V
     * and Font columns): V2 spans rows 15-16 (centre 15.5), V3 16-17 (16.5), V4 18, V5 19, V6 20; V3/4 is the mean of
     * V3 and V4 (17.25), V5/6 of V5 and V6 (19.5); Font 6A spans 15-16 (15.5), 6B 17, 6C 18-19 (18.5).
     */
    @Test
    void readsARangeInItsOwnScaleByOrderAndOtherScalesByTheCentreOfTheirSpan() throws IOException {
        // V routes by their order in V: V3 up to V5, no V2 or V6, and the slash grades by the mean of their halves.
        // Font routes by their centre within rows 16 to 19 (15.5 to 19.5 on the axis, edges included).
        assertThat(hits("grade:V3..V5")).containsExactlyInAnyOrder("B1", "B2", "G3", "G34", "G5", "F6A", "F6B", "F6C");
        // The other way round: Font 6B..6C covers rows 17 to 19 (16.5 to 19.5).
        assertThat(hits("grade:6B..6C")).containsExactlyInAnyOrder("F6B", "F6C", "B1", "G3", "G34", "B2", "G5", "G56");
        // V3 alone: the V3 routes, and the Font routes centred within its rows 16-17 (15.5 to 17.5): 6A and 6B.
        assertThat(hits("grade:V3")).containsExactlyInAnyOrder("B1", "G3", "F6A", "F6B");
    }

    @Test
    void showsAGradeItselfInItsOwnScale() {
        String v2 = run("grade", "V2").exits(ExitCode.OK).out();
        assertThat(v2).containsPattern("\\bV\\s+V2\\n");
    }

    @Test
    void findsASetterByAWordOfTheirName() throws IOException {
        assertThat(hits("setter:dario")).containsExactlyInAnyOrder("T1", "T2");
        assertThat(hits("setter:penhale")).containsExactlyInAnyOrder("T1", "T2");
    }

    @Test
    void asksForSeveralPropertiesOnTheSameHold() throws IOException {
        // B1 has an xl sloper; B2 has an xl jug and a small sloper, which is not an xl sloper.
        assertThat(hits("hold:sloper+xl")).containsExactly("B1");
        assertThat(hits("hold:sloper", "size:xl")).containsExactlyInAnyOrder("B1", "B2");
        assertThat(run("search", "hold:sloper+huge").exits(ExitCode.BAD_INPUT).err())
                .contains("huge");
    }

    @Test
    void listsTheGymsWallsResetsAndSettersInTextAndJson() throws IOException {
        JsonNode walls = json("walls", "--format", "json");
        List<String> names = new ArrayList<>();
        walls.required("walls").forEach(w -> names.add(w.required("wall").asText()));
        assertThat(names).containsExactly("Kiln", "Tower");
        assertThat(run("walls").exits(ExitCode.OK).out()).contains("Kiln").contains("Tower");
        JsonNode resets = json("resets", "--wall", "Kiln", "--format", "json");
        assertThat(resets.toString()).contains("2026-02-02").doesNotContain("2026-01-19");
        JsonNode setters = json("setters", "--format", "json");
        assertThat(setters.toString()).contains("Dario Penhale").contains("Ilse Marrow");
        assertThat(run("setters").exits(ExitCode.OK).out()).contains("Dario Penhale");
    }

    @Test
    void appliesAFirstSettingFromTheStartOfTheArchiveAndSaysSo() throws IOException {
        String said = run("settings", "set", "lookback_days", "120")
                .exits(ExitCode.OK)
                .out();
        assertThat(said).contains("From the start of the archive");
        JsonNode earlier = json("audit", "--reset", "Tower 2026-01-19", "--format", "json");
        assertThat(earlier.requiredAt("/settings_used/lookback_days").asInt()).isEqualTo(120);
        run("settings", "set", "lookback_days", "90").exits(ExitCode.OK);
        // A second value without --from starts today, so the earlier reset keeps the first.
        assertThat(json("audit", "--reset", "Tower 2026-01-19", "--format", "json")
                        .requiredAt("/settings_used/lookback_days")
                        .asInt())
                .isEqualTo(120);
    }
}
