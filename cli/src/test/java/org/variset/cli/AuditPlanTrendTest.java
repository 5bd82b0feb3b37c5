package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;

/**
 * Audit, plan and trend of the invented gym Fernhollow Climbing (test resources {@code fernhollow/}), each figure
 * checked against {@code expected.json}, computed from the same files by {@code make-expected.py} with Python and
 * SciPy 1.17.1 straight from docs/spec/metrics.md (the command is in that folder's README). Tolerance 1e-9 absolute.
 * Where the spec prescribes a formula rather than a library call (the Rayleigh p-value's approximation, the score),
 * the script codes it a second time from the spec: a check that Variset follows the spec, not of the formula itself;
 * the approximation is checked against the exact distribution in {@code CircularStatisticsTest}.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class AuditPlanTrendTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path FILES = Path.of("src/test/resources/org/variset/cli/fernhollow");
    private static final double TOL = 1e-9;

    @TempDir
    static Path home;

    private TestArchive archive;
    private JsonNode expected;

    @BeforeAll
    void importTheGym() throws IOException {
        archive = TestArchive.fresh(home, "archive");
        run("init").exits(ExitCode.OK);
        run(
                        "import",
                        FILES.resolve("walls.csv").toString(),
                        FILES.resolve("routes.csv").toString(),
                        FILES.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
        expected = JSON.readTree(FILES.resolve("expected.json").toFile());
    }

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    private JsonNode json(String... args) throws IOException {
        return JSON.readTree(run(args).exits(ExitCode.OK).out());
    }

    private static void close(JsonNode actual, JsonNode expected, String... keys) {
        for (String k : keys) {
            assertThat(actual.get(k).asDouble()).as(k).isCloseTo(expected.get(k).asDouble(), within(TOL));
        }
    }

    /** The objects of an array by the text of one of their fields. */
    private static Map<String, JsonNode> byName(JsonNode array, String field) {
        Map<String, JsonNode> out = new java.util.LinkedHashMap<>();
        array.forEach(x -> out.put(x.required(field).asText(), x));
        return out;
    }

    /** The field names of an object. */
    private static List<String> names(JsonNode object) {
        List<String> out = new ArrayList<>();
        object.fieldNames().forEachRemaining(out::add);
        return out;
    }

    /** Pairs as "route | other | jaccard" from objects (Variset) or [route, other, jaccard] arrays (expected). */
    private static List<String> pairs(JsonNode a) {
        List<String> out = new ArrayList<>();
        a.forEach(p -> {
            boolean array = p.isArray();
            out.add((array ? p.get(0) : p.get("route")).asText() + " | " + (array ? p.get(1) : p.get("other")).asText()
                    + " | " + String.format("%.12f", (array ? p.get(2) : p.get("jaccard")).asDouble()));
        });
        return out;
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class ResetAudit {
        private JsonNode a;
        private JsonNode e;

        @BeforeAll
        void audit() throws IOException {
            a = json("audit", "--reset", "Arch 2026-02-02", "--format", "json");
            e = expected.get("reset_audit");
        }

        @Test
        void measuresGripsAsScipyDoes() {
            close(
                    a.get("grip"),
                    e.requiredAt("/figures/grip"),
                    "n",
                    "resultant_length",
                    "mean_direction_deg",
                    "circular_variance",
                    "circular_sd_deg",
                    "rayleigh_p",
                    "sector_entropy",
                    "horizontal_edge_share");
            assertThat(a.requiredAt("/grip/sectors").toString())
                    .isEqualTo(e.requiredAt("/figures/grip/sectors").toString());
        }

        @Test
        void measuresVarietyAsScipyDoes() {
            for (String block : List.of("holds", "moves", "styles", "sizes")) {
                close(
                        a.get(block),
                        e.requiredAt("/figures/" + block),
                        "n",
                        "richness",
                        "shannon",
                        "gini_simpson",
                        "hill_n1",
                        "hill_n2",
                        "coverage");
            }
        }

        @Test
        void findsTheSameRepeatsNoveltyAndHoldReuse() {
            assertThat(pairs(a.requiredAt("/repetition/near_repeats")))
                    .containsExactlyInAnyOrderElementsOf(pairs(e.get("near_repeats")));
            assertThat(pairs(a.requiredAt("/repetition/internal_repeats")))
                    .containsExactlyInAnyOrderElementsOf(pairs(e.get("internal_repeats")));
            // Look-alikes the evidence sets aside: other hold shapes, or too few of the same ones.
            assertThat(pairs(a.requiredAt("/repetition/similar_not_repeats")))
                    .isNotEmpty()
                    .containsExactlyInAnyOrderElementsOf(pairs(e.get("similar_not_repeats")));
            assertThat(a.requiredAt("/repetition/novelty").asDouble())
                    .isCloseTo(e.required("novelty").asDouble(), within(TOL));
            assertThat(a.requiredAt("/repetition/window_routes").asInt())
                    .isEqualTo(e.required("window_routes").asInt());
            assertThat(a.requiredAt("/repetition/hold_reuse_rate").asDouble())
                    .isCloseTo(e.required("hold_reuse_rate").asDouble(), within(TOL));
        }

        @Test
        void scoresWithTheGymsStandingGrades() {
            close(a.get("score").get("parts"), e.get("parts"), "grip", "holds", "moves", "grades", "novelty");
            assertThat(a.requiredAt("/score/score").asDouble())
                    .isCloseTo(e.required("score").asDouble(), within(TOL));
            assertThat(a.requiredAt("/reference/grades/boulder/emd_to_target").asDouble())
                    .isCloseTo(e.requiredAt("/gym_grades/emd_to_target").asDouble(), within(TOL));
        }

        @Test
        void classifiesProfilesAndMeasuresLines() {
            for (String c : List.of("steady", "sustained", "single_crux", "multi_crux", "unclassified")) {
                assertThat(a.requiredAt("/profiles/" + c).asInt())
                        .as(c)
                        .isEqualTo(e.requiredAt("/figures/profiles/" + c).asInt());
            }
            close(a.get("profiles"), e.requiredAt("/figures/profiles"), "split_entropy");
            close(a.get("line"), e, "gie_mean", "gie_min", "gie_max");
        }

        @Test
        void showsThePreviousResetAndTheChange() {
            assertThat(a.requiredAt("/context/columns/1/name").asText()).isEqualTo("previous reset Arch 2026-01-05");
            JsonNode row = a.requiredAt("/context/figures/score.score");
            assertThat(a.requiredAt("/context/change_since_previous/score.score")
                            .asDouble())
                    .isCloseTo(row.get(0).asDouble() - row.get(1).asDouble(), within(TOL));
        }

        @Test
        void saysWhatStandsOutInPlainWords() {
            String text = run("audit", "--reset", "Arch 2026-02-02", "--findings", "20")
                    .exits(ExitCode.OK)
                    .out();
            assertThat(text)
                    .contains("Score 48 of 100")
                    // The evidence in words: the same five shapes in the same layout one metre nine to the right.
                    .contains(
                            "A2 (Arch, 2026-02-02) repeats A1 (Arch, 2026-01-05): same 5 of 5 hold shapes within "
                                    + "20 cm once shifted 1.9 m, same moves heel hook > dyno > match, same wall (Jaccard 0.846).")
                    // A3 shares A1's types, directions and moves (Jaccard 0.769) on other shapes: not called a repeat.
                    .doesNotContain("A3 (Arch, 2026-02-02) repeats")
                    .contains("No boulder from V7 to V9 is up in the gym on 2026-02-02, a range where the target "
                            + "expects 1.0 of its 7 routes")
                    .contains("13 of 19 hand grips face up; no gaston in this set.")
                    .contains("35% of this reset's placements put a hold shape back")
                    .contains("Safety: Route setting is work at height");
        }
    }

    @Test
    void auditsTheWholeGymsStandingSet() throws IOException {
        JsonNode a = json("audit", "--standing-on", "2026-02-15", "--format", "json");
        JsonNode e = expected.get("standing_audit");
        assertThat(a.required("routes").asInt()).isEqualTo(e.required("routes").asInt());
        close(a.get("grip"), e.requiredAt("/figures/grip"), "resultant_length", "sector_entropy");
        close(a.requiredAt("/grades/boulder"), e.get("grades"), "emd_to_target", "chi_square", "chi_square_p");
        assertThat(a.requiredAt("/grades/boulder/gaps").toString())
                .isEqualTo(e.requiredAt("/grades/gaps").toString());
        assertThat(a.requiredAt("/score/score").asDouble())
                .isCloseTo(e.required("score").asDouble(), within(TOL));
        assertThat(a.requiredAt("/score/dropped/0").asText()).isEqualTo("novelty");
        assertThat(a.requiredAt("/undefined/repetition.novelty").asText()).contains("not one reset");
    }

    @Test
    void auditsOneSettersRoutesAgainstTheOthers() throws IOException {
        JsonNode a = json("audit", "--setter", "Bo Renner", "--from", "2025-12", "--to", "2026-02", "--format", "json");
        JsonNode e = expected.get("setter_audit");
        assertThat(a.required("routes").asInt()).isEqualTo(e.required("routes").asInt());
        assertThat(a.requiredAt("/reference/routes").asInt())
                .isEqualTo(e.required("others").asInt());
        close(a.get("grip"), e.get("grip"), "resultant_length", "sector_entropy");
        close(a.get("holds"), e.get("holds"), "shannon", "coverage");
    }

    @Test
    void plansTheSlotsBruteForceFindsBest() throws IOException {
        JsonNode p = json("plan", "--wall", "Arch", "--on", "2026-03-02", "--routes", "4", "--format", "json");
        JsonNode e = expected.get("plan");
        List<Integer> slots = new ArrayList<>();
        List<Integer> rest = new ArrayList<>();
        p.requiredAt("/grade_slots/bands").forEach(b -> {
            slots.add(b.required("proposed").asInt());
            rest.add(b.required("up_elsewhere").asInt());
        });
        assertThat(rest.toString().replace(" ", "")).isEqualTo(e.get("rest").toString());
        assertThat(e.get("optimal_slots").toString().replace(" ", ""))
                .contains(slots.toString().replace(" ", ""));
        assertThat(p.requiredAt("/grade_slots/emd_to_target_after").asDouble())
                .isCloseTo(e.required("least_distance").asDouble(), within(TOL));
        assertThat(p.requiredAt("/shapes_to_rest").has("J1")).isTrue();
    }

    @Test
    void tracksLifetimesWallStatusAndSetters() throws IOException {
        JsonNode t = json("trend", "--from", "2025-12-01", "--to", "2026-03-10", "--format", "json");
        JsonNode e = expected.get("trend");
        close(t.get("lifetime"), e.get("lifetime"), "stripped", "median_days", "still_up");
        // Walk the expected walls and setters, so that one missing from the output fails rather than passes unseen.
        Map<String, JsonNode> walls = byName(t.required("walls"), "wall");
        assertThat(walls.keySet()).containsExactlyInAnyOrderElementsOf(names(e.required("walls")));
        e.required("walls").fields().forEachRemaining(x -> {
            JsonNode w = walls.get(x.getKey());
            assertThat(w.required("days_since_reset").asInt())
                    .isEqualTo(x.getValue().required("days_since_reset").asInt());
            assertThat(w.required("cycle_days").asInt())
                    .isEqualTo(x.getValue().required("cycle_days").asInt());
            assertThat(w.required("status").asText())
                    .as(x.getKey())
                    .isEqualTo(x.getValue().required("status").asText());
        });
        Map<String, JsonNode> setters = byName(t.required("setters"), "setter");
        assertThat(setters.keySet()).containsExactlyInAnyOrderElementsOf(names(e.required("setter_routes")));
        e.required("setter_routes")
                .fields()
                .forEachRemaining(x -> assertThat(
                                setters.get(x.getKey()).required("routes").asInt())
                        .as(x.getKey())
                        .isEqualTo(x.getValue().asInt()));
        String csv = run("trend", "--from", "2025-12-01", "--to", "2026-03-10", "--format", "csv")
                .exits(ExitCode.OK)
                .out();
        assertThat(csv.lines().findFirst().orElseThrow()).startsWith("day,scope,routes,score.score");
        assertThat(csv.lines().count()).isEqualTo(1 + 4 * 4); // four month-ends, gym and three walls
    }

    /**
     * The figure catalogue against what the JSON really writes: every number an audit or trend reports is a
     * catalogued figure (or a count of one category, listed as such below), and every catalogued figure is reported.
     */
    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class Catalogue {
        /** Maps of counts per category, and the score's parts and weights: numbers named by their category. */
        private static final List<String> PER_CATEGORY = List.of(
                ".counts.",
                ".histogram.",
                ".target.",
                "score.parts.",
                "score.weights_used.",
                "profiles.steady",
                "profiles.sustained",
                "profiles.single_crux",
                "profiles.multi_crux",
                "profiles.unclassified",
                "grip.sectors",
                "line.routes.long_spans");

        private final java.util.Set<String> reported = new java.util.TreeSet<>();

        @BeforeAll
        void readEveryFigure() throws IOException {
            JsonNode audit = json("audit", "--reset", "Arch 2026-02-02", "--format", "json");
            for (String block : List.of(
                    "score",
                    "grip",
                    "holds",
                    "hold_shapes",
                    "sizes",
                    "moves",
                    "styles",
                    "angles",
                    "grades",
                    "profiles",
                    "line",
                    "repetition")) {
                walk(block, audit.get(block));
            }
            audit.requiredAt("/context/figures").fieldNames().forEachRemaining(reported::add);
            walk("lifetime", json("trend", "--year", "2026", "--format", "json").get("lifetime"));
        }

        private void walk(String path, JsonNode n) {
            assertThat(n).as(path).isNotNull();
            if (n.isObject()) {
                n.fields().forEachRemaining(e -> walk(path + "." + e.getKey(), e.getValue()));
            } else if (n.isArray()) {
                n.forEach(x -> walk(path, x));
            } else if ((n.isNumber() || n.isNull()) && PER_CATEGORY.stream().noneMatch(path::contains)) {
                reported.add(path.replaceFirst("^grades\\.(boulder|rope)\\.", "grades.")
                        .replaceFirst(
                                "^repetition\\.(near_repeats|internal_repeats|similar_not_repeats)\\.", "repetition."));
            }
        }

        @Test
        void catalogueEveryNumberTheJsonReports() {
            List<String> missing = reported.stream()
                    .filter(k -> Figures.all().stream().noneMatch(f -> f.key().equals(k)))
                    .toList();
            assertThat(missing)
                    .as("numbers in the JSON that are not in the catalogue")
                    .isEmpty();
        }

        @Test
        void reportEveryCataloguedFigure() {
            List<String> unreported = Figures.all().stream()
                    .map(Figure::key)
                    .filter(k -> !reported.contains(k))
                    .toList();
            assertThat(unreported).as("catalogued figures no JSON reports").isEmpty();
        }

        @Test
        void giveEveryFigureALabelAndASource() {
            assertThat(Figures.all()).allSatisfy(f -> {
                assertThat(f.label()).as(f.key()).isNotBlank();
                assertThat(f.shortLabel()).as(f.key()).isNotBlank();
                assertThat(f.source()).as(f.key()).isNotBlank();
            });
        }
    }

    @Nested
    class WithoutEnoughData {
        @Test
        void auditsAWallsFirstResetWithAnEmptyWindow() throws IOException {
            JsonNode a = json("audit", "--reset", "Arch 2025-12-08", "--format", "json");
            assertThat(a.requiredAt("/repetition/novelty").asDouble()).isEqualTo(1.0);
            assertThat(a.requiredAt("/repetition/window_routes").asInt()).isZero();
            assertThat(a.requiredAt("/undefined/repetition.hold_reuse_rate").asText())
                    .isEqualTo("the wall has no earlier " + "reset");
            assertThat(a.has("previous")).isFalse();
        }

        @Test
        void auditsAndPlansAWallWithOneReset() {
            assertThat(run("audit", "--wall", "Bay", "--on", "2026-02-01")
                            .exits(ExitCode.OK)
                            .out())
                    .contains("Reset Bay 2026-01-19")
                    .doesNotContain("previous reset");
            assertThat(run("plan", "--wall", "Bay", "--on", "2026-02-01", "--routes", "3")
                            .exits(ExitCode.OK)
                            .out())
                    .contains("Grade slots:");
        }

        @Test
        void saysSoWhenNoRouteIsUp() {
            assertThat(run("audit", "--standing-on", "2020-01-01")
                            .exits(ExitCode.OK)
                            .out())
                    .contains("No route in this set: there is nothing to audit.");
            assertThat(run("trend", "--year", "2020").exits(ExitCode.OK).out()).contains("Notable repeats: none");
        }

        @Test
        void plansARopeWallWithoutATarget() {
            assertThat(run("plan", "--wall", "Spire", "--on", "2026-03-02", "--routes", "2")
                            .exits(ExitCode.OK)
                            .out())
                    .contains("Grade slots: none proposed: the gym has no grade target for rope routes");
        }

        @Test
        void auditsRoutesWithoutHolds() throws IOException {
            Path routes = Files.writeString(
                    home.resolve("loft.csv"),
                    "gym,wall,route,set_on,discipline,grade\n"
                            + "Upstairs Gym,Loft,L1,2026-02-10,boulder,V2\nUpstairs Gym,Loft,L2,2026-02-10,boulder,V3\n");
            String other = home.resolve("other").toString();
            CliRun.run(home, "--archive", other, "init").exits(ExitCode.OK);
            CliRun.run(home, "--archive", other, "import", routes.toString()).exits(ExitCode.OK);
            String text = CliRun.run(home, "--archive", other, "audit", "--wall", "Loft", "--on", "2026-02-10")
                    .exits(ExitCode.OK)
                    .out();
            assertThat(text).contains("No hold placements are recorded for these routes");
            JsonNode a = JSON.readTree(CliRun.run(
                            home,
                            "--archive",
                            other,
                            "audit",
                            "--wall",
                            "Loft",
                            "--on",
                            "2026-02-10",
                            "--format",
                            "json")
                    .exits(ExitCode.OK)
                    .out());
            assertThat(a.requiredAt("/grip/resultant_length").isNull()).isTrue();
            assertThat(a.requiredAt("/undefined/grip.resultant_length").asText())
                    .isEqualTo("no hand hold with a grip " + "direction");
            assertThat(a.requiredAt("/undefined/repetition.novelty").asText()).contains("enough detail");
        }

        @Test
        void namesWhatThereIsForAWrongTarget() {
            assertThat(run("audit", "--reset", "Arch 1999-01-01")
                            .exits(ExitCode.BAD_INPUT)
                            .err())
                    .contains("no reset labelled 'Arch 1999-01-01'")
                    .contains("latest:");
            assertThat(run("audit", "--wall", "Arch", "--on", "2025-01-01")
                            .exits(ExitCode.BAD_INPUT)
                            .err())
                    .contains("its first is Arch 2025-12-08");
            assertThat(run("audit").exits(ExitCode.USAGE).err()).contains("say what to audit");
            assertThat(run("audit", "--setter", "Nobody", "--from", "2026")
                            .exits(ExitCode.BAD_INPUT)
                            .err())
                    .contains("no setter named 'Nobody'")
                    .contains("Bo Renner");
        }
    }
}
