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
