package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Stories planted in an invented gym, each checked by the words a head setter reads (text, JSON and PDF). The
 * expected counts and shares are counted by hand from the planted rows below; the comment at each check says how.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PlantedFindingsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String GYM = "Kiln Street Bouldering";

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
        archive = TestArchive.fresh(home, "planted-findings");
        run("init").exits(ExitCode.OK);
        PlantedGym g = new PlantedGym(GYM)
                .wall("Kiln", "boulder", 35, 4.5, 10)
                .wall("Milk Slab", "boulder", -10, 4.2, 8)
                .wall("Tower", "rope", 5, 14, 8);
        kiln(g);
        slab(g);
        tower(g);
        String[] files = g.write(home.resolve("planted"));
        run("import", files[0], files[1], files[2]).exits(ExitCode.OK);
        run(
                        "settings",
                        "set",
                        "target",
                        "5=1 5+=1 6a=2 6a+=2 6b=2 6b+=2 6c=2 6c+=2 7a=1 7a+=1 7b=1",
                        "--discipline",
                        "rope")
                .exits(ExitCode.OK);
    }

    /**
     * The cave: an outlier reset with every grip facing up (December), then two resets where February's K1 repeats
     * January's K1 (the same six shapes, set 0.6 m to the right) and K2, K3 and K4 only look like January's.
     */
    private static void kiln(PlantedGym g) {
        for (int i = 1; i <= 4; i++) {
            g.route("Kiln", "D" + i, "2025-12-08", "boulder", "V" + (i + 1))
                    .stripped("2026-01-05")
                    .moves(i % 2 == 0 ? "cross-through;campus" : "lock-off;cross-through")
                    .hold("start", "jug", "l", "0", "", 1.0 + i, 0.8)
                    .hand("edge", "0", "", 1.3 + i, 1.6)
                    .hand("pocket", "0", "", 1.6 + i, 2.4)
                    .hold("finish", "jug", "l", "0", "", 1.8 + i, 3.5);
        }
        for (String day : new String[] {"2026-01-05", "2026-02-02"}) {
            boolean feb = day.startsWith("2026-02");
            double dx = feb ? 0.6 : 0;
            PlantedGym.Route k1 = g.route("Kiln", "K1", day, "boulder", "V4")
                    .by("Ilse Marrow")
                    .moves("gaston;heel hook;match");
            k1.hold("start", "jug", "l", "0", "J1", 1.0 + dx, 0.8)
                    .hand("crimp", "45", "C1", 1.5 + dx, 1.5)
                    .hand("pinch", "90", "P1", 2.0 + dx, 2.2)
                    .hand("sloper", "315", "S1", 2.6 + dx, 2.8)
                    .hand("crimp", "0", "C2", 2.4 + dx, 3.2)
                    .hold("finish", "jug", "l", "0", "J2", 3.0 + dx, 3.6)
                    .foot(1.2 + dx, 0.3);
            // K2: the same crimps facing up and the same moves (the rope wall's too), but other shapes and grades.
            PlantedGym.Route k2 = g.route("Kiln", "K2", day, "boulder", feb ? "V7" : "V1")
                    .by("Dario Penhale")
                    .moves("layback;stem;sidepull");
            for (int h = 0; h < 6; h++) {
                k2.hand("crimp", "0", (feb ? "C3" : "C2") + h, 5.0 + 0.3 * h, 0.9 + 0.5 * h);
            }
            k2.foot(5.2, 0.3);
            // K3: the same five shapes, spread over the wall in another layout.
            PlantedGym.Route k3 =
                    g.route("Kiln", "K3", day, "boulder", feb ? "V6" : "V2").moves("drop knee;undercling;toe hook");
            double[][] jan = {{7.0, 1.0}, {7.4, 1.6}, {7.8, 2.2}, {8.2, 2.8}, {8.6, 3.4}};
            double[][] febXy = {{8.9, 3.3}, {6.4, 2.9}, {9.1, 0.9}, {6.2, 1.2}, {7.6, 3.9}};
            for (int h = 0; h < 5; h++) {
                double[] p = feb ? febXy[h] : jan[h];
                k3.hand(h % 2 == 0 ? "pinch" : "pocket", h % 2 == 0 ? "180" : "270", "U" + h, p[0], p[1]);
            }
            // K4: no shapes recorded, the same moves at grades far apart (V0 then V6).
            PlantedGym.Route k4 =
                    g.route("Kiln", "K4", day, "boulder", feb ? "V6" : "V0").moves("dyno;mantle;compression");
            for (int h = 0; h < 4; h++) {
                k4.hand(h % 2 == 0 ? "volume" : "edge", h % 2 == 0 ? "90" : "270", "", 3.5 + 0.4 * h, 1.0 + 0.6 * h);
            }
            if (!feb) {
                k1.stripped("2026-02-02");
                k2.stripped("2026-02-02");
                k3.stripped("2026-02-02");
                k4.stripped("2026-02-02");
            }
        }
    }

    /** The slab: January has one route at each grade VB..V6, February nothing from V2 to V5. */
    private static void slab(PlantedGym g) {
        String[] jan = {"VB", "V0", "V1", "V2", "V3", "V4", "V5", "V6"};
        String[] feb = {"VB", "V0", "V1", "V6", "V7", "V8"};
        for (String day : new String[] {"2026-01-12", "2026-02-09"}) {
            String[] grades = day.startsWith("2026-01") ? jan : feb;
            for (int i = 0; i < grades.length; i++) {
                PlantedGym.Route r = g.route("Milk Slab", "M" + (i + 1), day, "boulder", grades[i])
                        .moves("smear;rockover;high step")
                        .hold("start", "jug", "m", "0", "", 0.5 + 0.9 * i, 0.9)
                        .hand("sloper", "0", "", 0.7 + 0.9 * i, 1.8)
                        .hand("edge", "90", "", 0.6 + 0.9 * i, 2.6)
                        .hold("finish", "jug", "m", "0", "", 0.8 + 0.9 * i, 3.8);
                if (day.startsWith("2026-01")) {
                    r.stripped("2026-02-09");
                }
            }
        }
    }

    /** The rope wall: nothing from 6a to 6c+. */
    private static void tower(PlantedGym g) {
        String[] grades = {"5b", "5c", "7a", "7a+", "7b"};
        for (int i = 0; i < grades.length; i++) {
            g.route("Tower", "T" + (i + 1), "2026-01-19", "rope", grades[i])
                    .moves("layback;stem;sidepull")
                    .hold("start", "jug", "m", "0", "", 1.0 + 1.4 * i, 1.0)
                    .hand("edge", "270", "", 1.2 + 1.4 * i, 5.0)
                    .hand("sloper", "0", "", 1.0 + 1.4 * i, 9.0)
                    .hold("finish", "jug", "m", "0", "", 1.1 + 1.4 * i, 13.5);
        }
    }

    private static List<String> pairs(JsonNode list) {
        List<String> out = new ArrayList<>();
        // "K1 (Kiln, 2026-02-02)" and "K1 (Kiln, 2026-01-05)" read as "K1~K1".
        list.forEach(p -> out.add(label(p.required("route")) + "~" + label(p.required("other"))));
        return out;
    }

    private static String label(JsonNode name) {
        return name.asText().replaceFirst(" \\(.*\\)$", "");
    }

    @Test
    void findsTheRealRepeatAndSetsTheLookAlikesAsideWithTheEvidenceInWords() throws IOException {
        JsonNode a = json("audit", "--reset", "Kiln 2026-02-02", "--format", "json");
        JsonNode rep = a.requiredAt("/repetition");
        List<String> repeats = pairs(rep.required("near_repeats"));
        List<String> setAside = pairs(rep.required("similar_not_repeats"));
        // Before the evidence, every Jaccard candidate was called a repeat; after, only those it confirms.
        int before = repeats.size() + setAside.size();
        long falseBefore =
                before - repeats.stream().filter(p -> p.equals("K1~K1")).count();
        long falseAfter = repeats.stream().filter(p -> !p.equals("K1~K1")).count();
        System.out.printf(
                "planted Kiln reset: candidates %d, real repeats found %d of 1, false alarms %d before, %d after%n",
                before, repeats.size() - falseAfter, falseBefore, falseAfter);
        assertThat(repeats).containsExactly("K1~K1");
        assertThat(setAside).contains("K2~K2");
        assertThat(setAside).contains("K3~K3");
        assertThat(setAside).contains("K4~K4");
        assertThat(falseBefore).isEqualTo(3);
        JsonNode k1 = rep.required("near_repeats").get(0).required("evidence");
        // Six shapes (J1 C1 P1 S1 C2 J2), each moved 0.6 m to the right.
        assertThat(k1.required("shared_shapes").asInt()).isEqualTo(6);
        assertThat(k1.required("shared_in_place").asInt()).isEqualTo(6);
        assertThat(k1.required("shift_m").asDouble()).isCloseTo(0.6, org.assertj.core.data.Offset.offset(1e-9));
        String words = "same 6 of 6 hold shapes within 20 cm once shifted 0.6 m";
        assertThat(k1.required("words").asText()).startsWith(words);
        String text =
                run("audit", "--reset", "Kiln 2026-02-02").exits(ExitCode.OK).out();
        assertThat(text).contains(words).contains("same grade band");
        assertThat(text).doesNotContainPattern("K2 .*repeats");
    }

    @Test
    void saysAResetsMissingGradeRangeInWordsAndItsGradesPartDoesNotImprove() throws IOException {
        JsonNode before = json("audit", "--reset", "Milk Slab 2026-01-12", "--format", "json");
        JsonNode after = json("audit", "--reset", "Milk Slab 2026-02-09", "--format", "json");
        String hole = "This reset has no boulder from V2 to V5, between its VB and its V8 routes.";
        assertThat(after.required("findings").findValuesAsText("text")).contains(hole);
        assertThat(before.required("findings").findValuesAsText("text"))
                .noneMatch(t -> t.startsWith("This reset has no boulder"));
        double partBefore = before.requiredAt("/score/parts/grades").asDouble();
        double partAfter = after.requiredAt("/score/parts/grades").asDouble();
        assertThat(partAfter).isLessThan(partBefore);
        assertThat(run("audit", "--reset", "Milk Slab 2026-02-09")
                        .exits(ExitCode.OK)
                        .out())
                .contains(hole);
        Path pdf = home.resolve("slab.pdf");
        run("audit", "--reset", "Milk Slab 2026-02-09", "--pdf", pdf.toString()).exits(ExitCode.OK);
        assertThat(firstPage(pdf).replaceAll("\\s+", " ")).contains(hole);
    }

    @Test
    void namesAWholeEmptyRopeRangeRatherThanOneBand() throws IOException {
        JsonNode a = json("audit", "--reset", "Tower 2026-01-19", "--format", "json");
        List<String> texts = a.required("findings").findValuesAsText("text");
        // Target bands 6a, 6a+, 6b, 6b+, 6c, 6c+ hold 12 of the 17 parts; 5 routes fall inside
        // the target, so 12 / 17 x 5 = 3.5 routes.
        assertThat(texts)
                .contains("No rope route from 6a to 6c+ is up in the gym on 2026-01-19, a range where the target"
                        + " expects 3.5 of its 5 routes.");
        assertThat(texts).noneMatch(t -> t.startsWith("No 6a among"));
        JsonNode runs = a.findValue("gap_runs");
        assertThat(runs).isNotNull();
        assertThat(runs.toString()).contains("\"6a\"").contains("\"6c+\"");
    }

    @Test
    void measuresASettersHabitByHoldTypeOverHandHoldsOnly() throws IOException {
        JsonNode a = json(
                "audit", "--setter", "Dario Penhale", "--from", "2026-01-01", "--to", "2026-02-28", "--format", "json");
        List<String> texts = a.required("findings").findValuesAsText("text");
        // Dario's hand holds: 12 crimps (K2 twice, 6 each); foot chips left out, so 100%. The others' hand holds
        // from January to February: K1 2x6 (4 crimps), K3 2x5, K4 2x4, slab 14x4, tower 5x4: 4 of 106.
        assertThat(texts)
                .contains("100% of Dario Penhale's hand holds are crimps, against 4% for the other setters in the"
                        + " same period.");
    }

    @Test
    void plansFromTheWallsUsualResetNotTheOutlierNorTheSlab() {
        String plan = run("plan", "--wall", "Kiln", "--on", "2026-03-02", "--routes", "4")
                .exits(ExitCode.OK)
                .out();
        assertThat(plan).contains("Plan for the next reset of Kiln");
        // December's reset had every grip facing up; a median over three resets is not moved by it.
        assertThat(plan).doesNotContain("bring back grips facing up");
        // Smear, rockover and high step are the slab's moves, 45 degrees away.
        assertThat(plan).doesNotContain("smear").doesNotContain("rockover").doesNotContain("high step");
    }

    @Test
    void startsTheTrendAtTheFirstSetMonthAndSaysOneRouteInTheSingular() {
        String trend = run("trend", "--from", "2025-06-01", "--to", "2026-03-31", "--format", "csv")
                .exits(ExitCode.OK)
                .out();
        // The first route was set on 2025-12-08: no month before December is drawn.
        assertThat(trend).contains("2025-12").doesNotContain("2025-06").doesNotContain("2025-11");
        String text =
                run("audit", "--reset", "Kiln 2026-02-02").exits(ExitCode.OK).out();
        assertThat(text).startsWith("Reset Kiln 2026-02-02 · " + GYM + " · 4 routes");
        assertThat(text).doesNotContainPattern("\\b1 routes\\b");
    }

    @Test
    void stopsAPeriodThatReachesPastTodayAtTodayAndSaysSo() throws IOException {
        java.time.LocalDate ahead =
                java.time.LocalDate.now(java.time.ZoneOffset.UTC).plusDays(40);
        String text = run("trend", "--from", "2025-12-01", "--to", ahead.toString())
                .exits(ExitCode.OK)
                .out();
        assertThat(text)
                .contains("The period runs to " + ahead + ", which has not come yet: its figures stop at today");
        JsonNode j = json("trend", "--from", "2025-12-01", "--to", ahead.toString(), "--format", "json");
        assertThat(j.required("stops_at_today").asBoolean()).isTrue();
        java.time.LocalDate asOf = java.time.LocalDate.parse(j.required("as_of").asText());
        assertThat(asOf).isBefore(ahead);
        assertThat(j.toString()).doesNotContain(ahead.toString().substring(0, 7) + "-" + ahead.lengthOfMonth());
    }

    private static String firstPage(Path pdf) throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper s = new PDFTextStripper();
            s.setStartPage(1);
            s.setEndPage(1);
            return s.getText(doc);
        }
    }
}
