package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code search}, {@code similar} and {@code reindex} on the invented Fernhollow gym, and the index kept current. */
class SearchCommandTest {
    private static final Path FILES = Path.of("src/test/resources/org/variset/cli/fernhollow");
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path home;

    private Path archive;

    private CliRun run(String... args) {
        String[] all = new String[args.length + 2];
        all[0] = "--archive";
        all[1] = archive.toString();
        System.arraycopy(args, 0, all, 2, args.length);
        return CliRun.run(home, all);
    }

    @BeforeEach
    void importTheGym() {
        archive = home.resolve("a");
        run("init").exits(ExitCode.OK);
        run(
                        "import",
                        FILES.resolve("walls.csv").toString(),
                        FILES.resolve("routes.csv").toString(),
                        FILES.resolve("holds.csv").toString())
                .exits(ExitCode.OK);
    }

    @Test
    void listsHitsWithTheirMovesAndHolds() {
        CliRun r = run("search", "heel", "hook", "standing:2026-02-15").exits(ExitCode.OK);
        assertThat(r.out())
                .startsWith("2 routes match, by relevance:")
                .contains("A2 · V2 · Arch, Fernhollow Climbing · set 2026-02-02, up · Bo Renner")
                .contains("   moves: heel hook > dyno > match; styles: power")
                .contains("   holds: 2 jug (up 2), 1 crimp (up), 1 pinch (right, left), 1 sloper (down)");
        assertThat(r.err()).isEmpty();
    }

    @Test
    void writesJsonWithFacets() throws IOException {
        JsonNode j = JSON.readTree(run("search", "wall:Bay", "--facets", "--sort", "grade", "--format", "json")
                .exits(ExitCode.OK)
                .out());
        assertThat(j.required("total").asInt()).isEqualTo(3);
        assertThat(j.requiredAt("/hits/0/route").asText()).isEqualTo("B1");
        assertThat(j.requiredAt("/hits/2/holds/0/type").asText()).isEqualTo("volume");
        assertThat(j.requiredAt("/facets/setter/Bo Renner").asInt()).isEqualTo(2);
        assertThat(j.requiredAt("/facets/band/V5").asInt()).isEqualTo(1);
    }

    @Test
    void pointsAtTheProblemInABadQuery() {
        CliRun r = run("search", "move:dyno", "grade:").exits(ExitCode.BAD_INPUT);
        assertThat(r.err())
                .contains("variset search: cannot read the query at position 17: expected a value after "
                        + "'grade:', such as grade:V4 or grade:6a..6b+")
                .contains("  move:dyno grade:\n" + " ".repeat(18) + "^")
                .doesNotContain("\tat ");
    }

    @Test
    void catchesUpAStaleIndexWithANotice() throws IOException {
        Path copy = home.resolve("old-index");
        copyTree(archive.resolve("index"), copy);
        Path more = Files.writeString(
                home.resolve("more.csv"),
                "gym,wall,route,set_on,discipline,grade,moves\n"
                        + "Fernhollow Climbing,Bay,B9,2026-03-01,boulder,V2,bicycle;heel hook\n");
        run("import", more.toString()).exits(ExitCode.OK);
        deleteTree(archive.resolve("index"));
        copyTree(copy, archive.resolve("index"));
        CliRun r = run("search", "bicycle").exits(ExitCode.OK);
        assertThat(r.err()).contains("The search index was behind the archive; brought 1 route up to date.");
        assertThat(r.out()).contains("B9 · V2 · Bay");
        assertThat(run("search", "bicycle").exits(ExitCode.OK).err()).isEmpty();
    }

    @Test
    void keepsTheImportWhenTheIndexCannotBeWritten() throws IOException {
        deleteTree(archive.resolve("index"));
        Files.writeString(archive.resolve("index"), "not a folder");
        Path more = Files.writeString(
                home.resolve("more.csv"),
                "gym,wall,route,set_on,discipline,grade,moves\n"
                        + "Fernhollow Climbing,Bay,B9,2026-03-01,boulder,V2,bicycle\n");
        CliRun imported = run("import", more.toString()).exits(ExitCode.OK);
        assertThat(imported.err())
                .contains("warning: the search index could not be updated")
                .contains("the archive itself is complete");
        Files.delete(archive.resolve("index"));
        CliRun r = run("search", "bicycle").exits(ExitCode.OK);
        assertThat(r.err()).contains("Built the search index from the archive (16 routes): there was none yet.");
        assertThat(r.out()).contains("B9");
    }

    @Test
    void followsStripsAndRemovalsAtOnce() {
        run("strip", "--wall", "Bay", "--on", "2026-03-01").exits(ExitCode.OK);
        assertThat(run("search", "wall:Bay", "standing:2026-03-02").out()).isEqualTo("No route matches.\n");
        run("remove", "--reset", "Bay 2026-01-19", "--yes").exits(ExitCode.OK);
        assertThat(run("search", "wall:Bay").out()).isEqualTo("No route matches.\n");
    }

    /** Jaccard values as make-expected.py computed them with Python's exact fractions (fernhollow/expected.json). */
    @Test
    void listsSimilarRoutesWithExactScores() throws IOException {
        JsonNode j = JSON.readTree(run("similar", "A2", "--set-on", "2026-02-02", "--limit", "3", "--format", "json")
                .exits(ExitCode.OK)
                .out());
        assertThat(j.requiredAt("/similar/0/route").asText()).isEqualTo("A1 (Arch, 2026-01-05)");
        assertThat(j.requiredAt("/similar/0/jaccard").asDouble()).isEqualTo(11 / 13.0);
        assertThat(j.requiredAt("/similar/1/jaccard").asDouble()).isEqualTo(10 / 13.0);
        assertThat(j.requiredAt("/similar/2/route").asText()).isEqualTo("A1 (Arch, 2025-12-08)");
        assertThat(j.requiredAt("/similar/2/jaccard").asDouble()).isEqualTo(8 / 12.0);
        assertThat(run("similar", "A1").exits(ExitCode.BAD_INPUT).err())
                .contains("'A1' names 3 routes")
                .contains("--wall and --set-on");
        assertThat(run("similar", "Fernhollow Climbing/A3/2026-01-05")
                        .exits(ExitCode.OK)
                        .out())
                .contains("too little detail");
    }

    @Test
    void rebuildsTheIndexOnRequest() {
        assertThat(run("reindex").exits(ExitCode.OK).out()).startsWith("Indexed 15 routes in");
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p : s.toList()) {
                Files.copy(p, to.resolve(from.relativize(p).toString()));
            }
        }
    }

    private static void deleteTree(Path p) throws IOException {
        try (Stream<Path> s = Files.walk(p)) {
            for (Path x : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(x);
            }
        }
    }
}
