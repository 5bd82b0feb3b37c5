package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.variset.sample.generate.SampleGenerator;

/**
 * Several gyms side by side ({@code trend --all-gyms}): each row agrees with the gym's own trend, and the routes set
 * agree with a count made straight from the imported file.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ChainTrendTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String[] PERIOD = {"--from", "2026-01", "--to", "2026-05"};

    @TempDir
    static Path home;

    private Path files;

    private TestArchive archive;

    private CliRun run(String... args) {
        return archive.run(home, args);
    }

    private JsonNode json(String... args) throws IOException {
        return JSON.readTree(run(args).exits(ExitCode.OK).out());
    }

    private static String[] with(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    @BeforeAll
    void importTwoGyms() {
        archive = TestArchive.fresh(home, "archive");
        files = home.resolve("files");
        SampleGenerator.write(new SampleGenerator.Options(2, 1, 8, LocalDate.of(2026, 6, 30), false), files);
        run("init").exits(ExitCode.OK);
        run(
                        "import",
                        files.resolve("walls.csv").toString(),
                        files.resolve("routes.csv").toString(),
                        files.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
    }

    /** Routes of a gym set in the period, counted from the routes file itself (gym, wall, route, set_on, ...). */
    private long routesSetInFile(String gym) throws IOException {
        return Files.readAllLines(files.resolve("routes.csv")).stream()
                .skip(1)
                .map(l -> l.split(","))
                .filter(f -> f[0].equals(gym))
                .map(f -> LocalDate.parse(f[3]))
                .filter(d -> !d.isBefore(LocalDate.of(2026, 1, 1)) && !d.isAfter(LocalDate.of(2026, 5, 31)))
                .count();
    }

    @Test
    void setsEachGymBesideTheOthersAsItsOwnTrendReportsIt() throws IOException {
        JsonNode chain = json(with(with(new String[] {"trend", "--all-gyms"}, PERIOD), "--format", "json"));
        JsonNode rows = chain.get("comparison");
        assertThat(rows).hasSize(2);
        assertThat(chain.get("gyms")).hasSize(2);
        for (int i = 0; i < 2; i++) {
            JsonNode row = rows.get(i);
            String gym = String.format("Synthetic Gym %03d", i + 1);
            assertThat(row.required("gym").asText()).isEqualTo(gym);
            assertThat(row.required("routes_set").asLong())
                    .isEqualTo(routesSetInFile(gym))
                    .isPositive();
            JsonNode own = json(with(with(new String[] {"trend", "--gym", gym}, PERIOD), "--format", "json"));
            JsonNode lastGymPoint = null;
            for (JsonNode p : own.get("months")) {
                if (p.required("scope").asText().equals("gym")) {
                    lastGymPoint = p;
                }
            }
            assertThat(lastGymPoint).isNotNull();
            assertThat(row.get("routes_up")).isEqualTo(lastGymPoint.get("routes"));
            for (String k : List.of(
                    "score.score",
                    "grip.sector_entropy",
                    "grip.up_share",
                    "holds.hill_n1",
                    "moves.coverage",
                    "grades.emd_to_target")) {
                // The figures are keyed by their whole catalogue key ("score.score"), not nested.
                assertThat(row.required("figures").required(k))
                        .as(gym + " " + k)
                        .isEqualTo(lastGymPoint.required("figures").required(k));
            }
            int resets = 0;
            for (JsonNode w : own.get("walls")) {
                resets += w.get("resets").size();
            }
            assertThat(row.required("resets").asInt()).isEqualTo(resets);
            assertThat(row.required("near_repeats").asInt())
                    .isEqualTo(own.get("near_repeats").size());
            assertThat(chain.get("gyms").get(i)).isEqualTo(own);
        }
    }

    @Test
    void writesTextCsvAndAPdfForSeveralGyms() throws IOException {
        String text = run(with(
                        new String[] {"trend", "--gym", "Synthetic Gym 002", "--gym", "Synthetic Gym 001"}, PERIOD))
                .exits(ExitCode.OK)
                .out();
        assertThat(text)
                .startsWith("Gyms compared, 2026-01-01 to 2026-05-31 (2 gyms)")
                .contains("Trends of Synthetic Gym 001")
                .contains("Trends of Synthetic Gym 002");
        String csv = run(with(with(new String[] {"trend", "--all-gyms"}, PERIOD), "--format", "csv"))
                .exits(ExitCode.OK)
                .out();
        assertThat(csv.split("\r\n")).hasSize(3);
        assertThat(csv).startsWith("gym,from,to,routes_set,");
        Path pdf = home.resolve("chain.pdf");
        run(with(with(new String[] {"trend", "--all-gyms"}, PERIOD), "--pdf", pdf.toString()))
                .exits(ExitCode.OK);
        try (PDDocument d = Loader.loadPDF(pdf.toFile())) {
            String pages = new PDFTextStripper().getText(d);
            assertThat(pages)
                    .contains("Gyms side by side")
                    .contains("Synthetic Gym 001")
                    .contains("EN 12572");
            assertThat(d.getNumberOfPages()).isGreaterThan(4);
        }
    }

    @Test
    void explainsWhatItCannotCompare() {
        CliRun both = run(with(new String[] {"trend", "--all-gyms", "--gym", "Synthetic Gym 001"}, PERIOD));
        both.exits(ExitCode.USAGE);
        assertThat(both.err()).contains("not both");
        CliRun unknown = run(with(new String[] {"trend", "--gym", "Synthetic Gym 001", "--gym", "Nowhere"}, PERIOD));
        unknown.exits(ExitCode.BAD_INPUT);
        assertThat(unknown.err()).contains("Nowhere");
    }
}
