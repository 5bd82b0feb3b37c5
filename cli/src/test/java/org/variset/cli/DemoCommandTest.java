package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** The demo on the bundled sample: each story planted by the generator is found in the demo's own outputs. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class DemoCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path home;

    private Path demo;
    private CliRun first;

    @BeforeAll
    void runTheDemo() {
        demo = home.resolve("demo");
        first = CliRun.run(home, "demo", "--out", demo.toString()).exits(ExitCode.OK);
    }

    private JsonNode report(String name) throws IOException {
        return JSON.readTree(demo.resolve("reports").resolve(name).toFile());
    }

    private static List<String> findings(JsonNode audit) {
        List<String> out = new ArrayList<>();
        audit.get("findings")
                .forEach(f -> out.add(
                        f.required("kind").asText() + ": " + f.required("text").asText()));
        return out;
    }

    @Test
    void saysWhatItLoadedAndWhereTheReportsAre() throws IOException {
        assertThat(first.out())
                .contains("The sample gym Lantern Rock (invented): 1444 routes, 19605 holds, 7 walls")
                .contains("Reports (PDF, with JSON beside them) in " + demo.resolve("reports"));
        for (String pdf : List.of(
                "audit-cave.pdf", "audit-prow.pdf", "audit-slab.pdf", "gym-standing.pdf", "annual-report-2026.pdf")) {
            assertThat(Files.readAllBytes(demo.resolve("reports").resolve(pdf)))
                    .as(pdf)
                    .startsWith("%PDF".getBytes());
        }
        assertThat(home.resolve(".local")).doesNotExist();
    }

    /**
     * Story: Rafe Kalder reaches for up-facing crimps far too often. Said at the level a setter thinks in: his crimps
     * lead the others' by more than his up-facing crimps do, within the margin a finer level needs to be named.
     */
    @Test
    void findsTheSetterWhoReachesForUpFacingCrimps() throws IOException {
        assertThat(findings(report("setter-rafe-kalder.json")))
                .anyMatch(f -> f.startsWith("setter_habit: ") && f.contains("Rafe Kalder's hand holds are crimps"));
        assertThat(findings(report("setter-mira-holt.json")))
                .noneMatch(f -> f.startsWith("setter_habit: ") && f.contains("crimp"));
        assertThat(first.out()).contains("of Rafe Kalder's hand holds are crimps");
    }

    /** Every font of every report is embedded, so an archived copy looks the same in any viewer. */
    @Test
    void embedsEveryFontInEveryReport() throws IOException {
        List<Path> pdfs;
        try (var files = Files.list(demo.resolve("reports"))) {
            pdfs = files.filter(p -> p.toString().endsWith(".pdf")).sorted().toList();
        }
        assertThat(pdfs).hasSize(9);
        List<String> fonts = new ArrayList<>();
        for (Path pdf : pdfs) {
            PdfFontList.of(pdf).forEach(f -> fonts.add(pdf.getFileName() + ": " + f));
        }
        assertThat(fonts).isNotEmpty().allMatch(f -> f.endsWith(" (embedded)"));
    }

    /** Story: the Prow keeps reusing the same hold shapes, turned the same way. */
    @Test
    void findsTheWallThatReusesItsHoldShapes() throws IOException {
        JsonNode prow = report("audit-prow.json");
        assertThat(prow.requiredAt("/repetition/hold_reuse_rate").asDouble()).isGreaterThan(0.5);
        assertThat(findings(prow).get(0)).startsWith("hold_reuse: ");
        assertThat(report("audit-wave.json")
                        .requiredAt("/repetition/hold_reuse_rate")
                        .asDouble())
                .isLessThan(0.3);
    }

    /** Story: a grade gap opens one summer (no V5 or V6 up in July and August). */
    @Test
    void findsTheSummerGradeGap() throws IOException {
        JsonNode annual = report("annual-report-2026.json");
        List<String> summer = new ArrayList<>();
        annual.get("months").forEach(m -> {
            if (m.required("scope").asText().equals("gym")
                    && m.required("grade_gaps").has("boulder")
                    && m.required("grade_gaps").get("boulder").toString().contains("V5")) {
                summer.add(m.required("day").asText());
            }
        });
        assertThat(summer).contains("2026-07-31", "2026-08-31").doesNotContain("2026-10-31", "2026-11-30");
    }

    /** Story: the Cave's last reset repeats a problem of about six months before. */
    @Test
    void findsTheNearRepeatOfAnEarlierProblem() throws IOException {
        JsonNode cave = report("audit-cave.json");
        assertThat(cave.requiredAt("/repetition/near_repeats").findValuesAsText("other"))
                .contains("Red 1 (Cave, 2026-06-01)");
        assertThat(findings(cave).get(0)).startsWith("near_repeat: ").contains("repeats Red 1 (Cave, 2026-06-01)");
    }

    /** Story: the Slab goes overdue. */
    @Test
    void findsTheOverdueWall() throws IOException {
        List<String> overdue = new ArrayList<>();
        report("annual-report-2026.json")
                .get("walls")
                .forEach(w -> overdue.add(
                        w.required("wall").asText() + " " + w.required("status").asText()));
        assertThat(overdue).contains("Slab overdue").doesNotContain("Cave overdue", "Prow overdue");
        assertThat(first.out()).contains("Slab is overdue");
    }

    /**
     * Snapshot: the README's audit example, on the demo archive. The expected text is Variset's own output, recorded
     * when the README was written; it guards the README against drift, not the figures (the SciPy checks do that).
     */
    @Test
    @Tag("snapshot")
    void printsTheReadmesCaveAudit() {
        String out = CliRun.run(
                        home,
                        "--archive",
                        demo.resolve("archive").toString(),
                        "audit",
                        "--wall",
                        "Cave",
                        "--on",
                        "2026-11-30")
                .exits(ExitCode.OK)
                .out();
        assertThat(out)
                .startsWith("Reset Cave 2026-11-24 · Lantern Rock · 13 routes\n"
                        + "Score 62 of 100 (a heuristic: weighted mean of grip 0.71, holds 0.72, moves 0.60, grades 0.45, "
                        + "novelty 0.55)\n\nWhat stands out\n  - Green 1 (Cave, 2026-11-24) repeats Red 1 (Cave, 2026-06-01): "
                        + "same 7 of 7 hold shapes within 20 cm once shifted 0.4 m, same move lock-off, same grade band V3, "
                        + "same wall (Jaccard 1.000).\n"
                        + "  - 53 of 104 hand grips face up.\n");
    }

    @Test
    void replacesOnlyWhatItMadeWhenRunAgain() throws IOException {
        Path mine = Files.createDirectories(home.resolve("mine"));
        Files.writeString(mine.resolve("notes.txt"), "keep me");
        CliRun r = CliRun.run(home, "demo", "--out", mine.toString()).exits(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("holds files the demo did not make");
        assertThat(Files.readString(mine.resolve("notes.txt"))).isEqualTo("keep me");
        CliRun again = CliRun.run(home, "demo", "--out", demo.toString()).exits(ExitCode.OK);
        assertThat(again.out()).isEqualTo(first.out());
    }
}
