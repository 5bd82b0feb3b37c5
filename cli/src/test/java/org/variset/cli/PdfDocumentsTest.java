package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;

/**
 * The PDF documents of the invented Fernhollow gym, read back with PDFBox (an independent PDF reader): the figures
 * printed equal those of the JSON output, every section is there, pages are numbered and fonts embedded.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PdfDocumentsTest {
    private static final Path FILES = Path.of("src/test/resources/org/variset/cli/fernhollow");

    @TempDir
    static Path home;

    private TestArchive archive;

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    @BeforeAll
    void importTheGym() {
        archive = TestArchive.fresh(home, "a");
        run("init").exits(ExitCode.OK);
        run(
                        "import",
                        FILES.resolve("walls.csv").toString(),
                        FILES.resolve("routes.csv").toString(),
                        FILES.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
    }

    /** The text in the order it was written (sorting by position splits words at OpenPDF's line ends). */
    private static String text(PDDocument d) throws IOException {
        return new PDFTextStripper().getText(d);
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class ResetAudit {
        private Path pdf;
        private JsonNode json;
        private String text;
        private int pages;

        @BeforeAll
        void write() throws IOException {
            pdf = home.resolve("arch.pdf");
            CliRun r = run("audit", "--reset", "Arch 2026-02-02", "--pdf", pdf.toString())
                    .exits(ExitCode.OK);
            assertThat(r.err()).contains("Wrote " + pdf);
            json = new ObjectMapper()
                    .readTree(run("audit", "--reset", "Arch 2026-02-02", "--format", "json")
                            .out());
            try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
                text = text(d);
                pages = d.getNumberOfPages();
            }
        }

        @Test
        void printsTheScoreAndTheFirstTenFindingsOfTheJson() {
            assertThat(text)
                    .contains("Score "
                            + Figures.SCORE.text(json.requiredAt("/score/score").asDouble()) + " of 100");
            for (int i = 0; i < Math.min(10, json.get("findings").size()); i++) {
                String start =
                        json.get("findings").get(i).required("text").asText().substring(0, 40);
                assertThat(text.replace("\n", " ")).as(start).contains(start);
            }
        }

        /** Every headline row reads its label, then each column's figure as the JSON gives it, rounded. */
        @Test
        void printsTheSideBySideFiguresOfTheJson() {
            List<String> lines = text.lines().toList();
            for (Figure k : Figures.HEADLINE) {
                JsonNode row = json.requiredAt("/context/figures/" + k.key());
                assertThat(row.isArray()
                                && row.size()
                                        == json.requiredAt("/context/columns").size())
                        .as("a value per column for %s", k.key())
                        .isTrue();
                List<String> values = new ArrayList<>();
                row.forEach(v -> values.add(k.text(v.isNull() ? null : v.asDouble())));
                String expected = k.label() + " " + String.join(" ", values);
                assertThat(lines).as(k.key()).contains(expected);
            }
        }

        @Test
        void printsTheGripFigures() {
            assertThat(text.replace("\n", " "))
                    .contains("Resultant length "
                            + Figures.GRIP_RESULTANT.text(
                                    json.requiredAt("/grip/resultant_length").asDouble()))
                    .contains("circular standard deviation "
                            + Figures.GRIP_SD.text(
                                    json.requiredAt("/grip/circular_sd_deg").asDouble()) + "°")
                    .contains("Rayleigh test p < 0.001");
            assertThat(text).contains("up " + json.requiredAt("/grip/sectors/0").asInt());
        }

        @Test
        void hasEverySectionAndTheCautions() {
            for (String section : List.of(
                    "What stands out",
                    "Since the previous reset Arch 2026-01-05",
                    "Figures side by side",
                    "Grip directions",
                    "Holds",
                    "Grades against the target",
                    "Moves and styles",
                    "Difficulty profiles",
                    "Repetition",
                    "Near-repeats of earlier routes",
                    "Route lines and reach",
                    "Next reset of Arch, due 2026-03-02: 4 boulder routes",
                    "Settings used",
                    "Safety.")) {
                assertThat(text).as(section).contains(section);
            }
            String flat = text.replace("\n", " ");
            assertThat(flat)
                    .contains("EN 12572")
                    .contains("does not judge whether a route or wall is safe")
                    .contains("The score is a heuristic")
                    .contains("a heuristic (arm span is close to height")
                    .contains("The target is an example pyramid");
        }

        @Test
        void numbersItsPagesAndNamesItsMaker() {
            assertThat(pages).isEqualTo(6);
            assertThat(text)
                    .contains("page 1 of 6")
                    .contains("page 6 of 6")
                    .contains("Generated 2026-12-02 by Variset");
        }

        @Test
        void embedsEveryFont() throws IOException {
            List<String> fonts = PdfFontList.of(pdf);
            assertThat(fonts).isNotEmpty().allMatch(f -> f.endsWith(" (embedded)"));
            assertThat(fonts).anyMatch(f -> f.contains("DejaVuSans"));
        }
    }

    @Test
    void writesTheTrendReportWithTheJsonsWallStatus() throws IOException {
        Path pdf = home.resolve("trend.pdf");
        run("trend", "--from", "2025-12-01", "--to", "2026-03-10", "--pdf", pdf.toString())
                .exits(ExitCode.OK);
        JsonNode json = new ObjectMapper()
                .readTree(run("trend", "--from", "2025-12-01", "--to", "2026-03-10", "--format", "json")
                        .out());
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            String text = text(d);
            assertThat(text)
                    .contains("Trend report")
                    .contains("Walls (status on 2026-03-10)")
                    .contains("Month-end figures of the gym's routes up")
                    .contains("Grades of the routes set in the " + "period")
                    .contains("Setters")
                    .contains("Notable repeats")
                    .contains("Safety.");
            assertThat(json.required("walls")).hasSize(3);
            for (JsonNode w : json.get("walls")) {
                assertThat(text)
                        .contains(w.required("wall").asText() + " "
                                + w.get("resets").size() + " "
                                + Figures.SCORE.text(w.required("mean_score").asDouble()) + " "
                                + w.required("last_reset").asText()
                                + " " + w.required("days_since_reset").asInt() + " "
                                + w.required("cycle_days").asInt() + " "
                                + w.required("status").asText() + " "
                                + w.required("days_past_due").asInt());
            }
        }
    }

    @Test
    void writesAStudySheetOnLetterPaper() throws IOException {
        Path pdf = home.resolve("study.pdf");
        run("search", "heel", "hook", "--pdf", pdf.toString(), "--paper", "letter")
                .exits(ExitCode.OK);
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            assertThat(d.getPage(0).getMediaBox().getWidth()).isEqualTo(612f);
            assertThat(d.getPage(0).getMediaBox().getHeight()).isEqualTo(792f);
            String text = text(d);
            assertThat(text)
                    .contains("Study sheet")
                    .contains("search: heel hook")
                    .contains("4 routes match.")
                    .contains("holds: 2 jug (up 2), 1 crimp (up), 1 pinch (right, left), 1 sloper (down)");
        }
    }

    @Test
    void refusesToReplaceAFileUnlessForced() throws IOException {
        Path pdf = Files.writeString(home.resolve("kept.pdf"), "mine");
        assertThat(run("audit", "--reset", "Arch 2026-02-02", "--pdf", pdf.toString())
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("exists already; give --force to replace it");
        assertThat(Files.readString(pdf)).isEqualTo("mine");
        run("audit", "--reset", "Arch 2026-02-02", "--pdf", pdf.toString(), "--force")
                .exits(ExitCode.OK);
        assertThat(Files.readAllBytes(pdf)).startsWith("%PDF".getBytes());
        assertThat(run(
                                "audit",
                                "--reset",
                                "Arch 2026-02-02",
                                "--pdf",
                                home.resolve("no/such/dir/x.pdf").toString())
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("does not exist");
        try (var leftovers = Files.list(home)) {
            assertThat(leftovers.map(p -> p.getFileName().toString())).noneMatch(n -> n.endsWith(".part"));
        }
    }
}
