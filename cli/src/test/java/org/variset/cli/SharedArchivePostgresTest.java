package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.testing.TestArchives;
import org.variset.sample.generate.SampleGenerator;

/**
 * The command line on a shared archive on a real PostgreSQL server ({@link TestArchives}): the same files give the
 * same audit as on the embedded archive, two clients importing different gyms at once both end with an index that
 * matches the database, {@code migrate-to} copies and verifies, and passwords never show. Runs in the
 * {@code postgresql} test execution.
 */
class SharedArchivePostgresTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path FERNHOLLOW = Path.of("src/test/resources/org/variset/cli/fernhollow");

    @TempDir
    Path home;

    private static String[] files(Path dir) {
        return new String[] {
            dir.resolve("walls.csv").toString(),
            dir.resolve("routes.csv").toString(),
            dir.resolve("holds.csv").toString()
        };
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private CliRun onServer(String url, String client, String... args) {
        return CliRun.run(
                Map.of("XDG_CACHE_HOME", home.resolve("cache-" + client).toString()),
                home,
                concat(new String[] {"--db", url}, args));
    }

    private CliRun embedded(String... args) {
        return CliRun.run(
                home, concat(new String[] {"--archive", home.resolve("embedded").toString()}, args));
    }

    private static JsonNode json(CliRun r) throws IOException {
        return JSON.readTree(r.exits(ExitCode.OK).out());
    }

    @Test
    void theSameFilesGiveTheSameAuditTrendAndSearchOnBothDatabases() throws IOException {
        String url = TestArchives.url(TestArchives.newSchema());
        CliRun init = onServer(url, "a", "init").exits(ExitCode.OK);
        assertThat(init.out()).startsWith("Created an empty archive at " + url);
        assertThat(onServer(url, "a", "init").exits(ExitCode.OK).out()).startsWith("There is already an archive at");
        onServer(url, "a", concat(new String[] {"import"}, files(FERNHOLLOW))).exits(ExitCode.OK);
        embedded("init").exits(ExitCode.OK);
        embedded(concat(new String[] {"import"}, files(FERNHOLLOW))).exits(ExitCode.OK);

        String[] audit = {"audit", "--reset", "Arch 2026-02-02", "--format", "json"};
        assertThat(json(onServer(url, "a", audit))).isEqualTo(json(embedded(audit)));
        String[] trend = {"trend", "--year", "2026", "--format", "json"};
        assertThat(json(onServer(url, "a", trend))).isEqualTo(json(embedded(trend)));
        String[] search = {"search", "heel", "hook", "--format", "json"};
        assertThat(labels(json(onServer(url, "a", search))))
                .isEqualTo(labels(json(embedded(search))))
                .isNotEmpty();
        JsonNode info = json(onServer(url, "a", "info", "--format", "json"));
        assertThat(info.required("shared").asBoolean()).isTrue();
        assertThat(info.required("routes").asLong())
                .isEqualTo(json(embedded("info", "--format", "json"))
                        .required("routes")
                        .asLong());
        onServer(url, "a", "check").exits(ExitCode.OK);
    }

    private static List<String> labels(JsonNode search) {
        List<String> out = new java.util.ArrayList<>();
        search.get("hits")
                .forEach(h -> out.add(
                        h.required("gym").asText() + "/" + h.required("route").asText()));
        return out;
    }

    @Test
    void twoClientsImportingDifferentGymsAtOnceBothEndInStepWithTheDatabase() throws Exception {
        Path all = home.resolve("all");
        SampleGenerator.Summary s =
                SampleGenerator.write(new SampleGenerator.Options(2, 1, 5, LocalDate.of(2026, 6, 30), false), all);
        Path north = splitByGym(all, "Synthetic Gym 001", home.resolve("north"));
        Path south = splitByGym(all, "Synthetic Gym 002", home.resolve("south"));
        String url = TestArchives.url(TestArchives.newSchema());
        onServer(url, "north", "init").exits(ExitCode.OK);

        ExecutorService pool = Executors.newFixedThreadPool(2);
        CountDownLatch start = new CountDownLatch(1);
        try {
            Future<CliRun> a = pool.submit(() -> {
                start.await();
                return onServer(url, "north", concat(new String[] {"import"}, files(north)));
            });
            Future<CliRun> b = pool.submit(() -> {
                start.await();
                return onServer(url, "south", concat(new String[] {"import"}, files(south)));
            });
            start.countDown();
            a.get(5, TimeUnit.MINUTES).exits(ExitCode.OK);
            b.get(5, TimeUnit.MINUTES).exits(ExitCode.OK);
        } finally {
            pool.shutdownNow();
        }
        String[] search = {"search", "crimp", "--format", "json"};
        long north1 = json(onServer(url, "north", search)).required("total").asLong();
        long south1 = json(onServer(url, "south", search)).required("total").asLong();
        assertThat(north1).isEqualTo(south1).isPositive();
        for (String client : List.of("north", "south")) {
            JsonNode info = json(onServer(url, client, "info", "--format", "json"));
            assertThat(info.required("gyms").asInt()).isEqualTo(2);
            assertThat(info.required("routes").asLong()).isEqualTo(s.routes());
            // check compares this client's index with the database: one document per route, none missing.
            CliRun check = onServer(url, client, "check").exits(ExitCode.OK);
            assertThat(check.out()).contains(s.routes() + " documents, " + s.routes() + " routes");
        }
    }

    /** Copies the three files keeping the header and the rows of one gym (its name is the first column). */
    static Path splitByGym(Path from, String gym, Path to) throws IOException {
        Files.createDirectories(to);
        for (String name : List.of("walls.csv", "routes.csv", "holds.csv")) {
            List<String> lines = Files.readAllLines(from.resolve(name));
            List<String> kept = new java.util.ArrayList<>(List.of(lines.get(0)));
            lines.stream().skip(1).filter(l -> l.startsWith(gym + ",")).forEach(kept::add);
            assertThat(kept).hasSizeGreaterThan(1);
            Files.write(to.resolve(name), kept);
        }
        return to;
    }

    @Test
    void migrateToCopiesVerifiesAndRefusesAnArchiveThatIsNotEmpty() throws IOException {
        embedded("init").exits(ExitCode.OK);
        embedded(concat(new String[] {"import"}, files(FERNHOLLOW))).exits(ExitCode.OK);
        String url = TestArchives.url(TestArchives.newSchema());

        JsonNode copied = json(embedded("migrate-to", url, "--format", "json"));
        assertThat(copied.required("verified").asBoolean()).isTrue();
        JsonNode before = json(embedded("info", "--format", "json"));
        Map<String, Long> rows = new java.util.HashMap<>();
        copied.get("tables")
                .forEach(t -> rows.put(
                        t.required("table").asText(), t.required("rows").asLong()));
        assertThat(rows)
                .containsEntry("route", before.required("routes").asLong())
                .containsEntry("hold_placement", before.required("holds").asLong())
                .containsEntry("reset", before.required("resets").asLong());

        JsonNode after = json(onServer(url, "c", "info", "--format", "json"));
        for (String k :
                List.of("gyms", "walls", "resets", "routes", "holds", "setters", "first_set_on", "last_set_on")) {
            assertThat(after.get(k)).as(k).isEqualTo(before.get(k));
        }
        String[] audit = {"audit", "--reset", "Arch 2026-02-02", "--format", "json"};
        assertThat(json(onServer(url, "c", audit))).isEqualTo(json(embedded(audit)));
        // The copy takes writes (a rename records every route of the setter in the change log).
        onServer(url, "c", "setter", "rename", "Ada Quill", "Ada Quill-Marsh").exits(ExitCode.OK);

        CliRun again = embedded("migrate-to", url);
        again.exits(ExitCode.ARCHIVE);
        assertThat(again.err()).contains("is not empty").contains("copies into an empty archive only");
        assertThat(json(onServer(url, "c", "info", "--format", "json")).get("routes"))
                .isEqualTo(before.get("routes"));

        CliRun fromServer = onServer(url, "c", "migrate-to", url);
        fromServer.exits(ExitCode.BAD_INPUT);
        assertThat(fromServer.err()).contains("name the embedded one with --archive DIR");
    }

    @Test
    void neverTakesNorShowsAPassword() {
        String url = TestArchives.url(TestArchives.newSchema());
        String withPassword = url.replace(
                "postgresql://" + TestArchives.server().user() + "@",
                "postgresql://" + TestArchives.server().user() + ":hunter2@");
        CliRun refused = onServer(withPassword, "p", "init");
        refused.exits(ExitCode.BAD_INPUT);
        assertThat(refused.err()).contains("PGPASSWORD").doesNotContain("hunter2");

        // The test server trusts local connections, so any password is accepted and none may be printed.
        Map<String, String> env =
                Map.of("XDG_CACHE_HOME", home.resolve("cache-p").toString(), "PGPASSWORD", "hunter2");
        for (String[] args : List.of(
                new String[] {"--db", url, "init"},
                new String[] {"--db", url, "info"},
                new String[] {"--db", url, "--verbose", "info", "--format", "json"},
                new String[] {"--db", url.replace(":5432/", ":1/"), "info"})) {
            CliRun r = CliRun.run(env, home, args);
            assertThat(r.out() + r.err()).as(r.describe()).doesNotContain("hunter2");
        }
    }
}
