package org.variset.imports.fuzz;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.variset.archive.store.Archive;
import org.variset.imports.ImportException;
import org.variset.imports.ImportFiles;
import org.variset.imports.export.ExportFormat;
import org.variset.imports.export.TemplateWriter;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/**
 * Seeded mutation fuzzing of the importers: valid CSV, XLSX and JSON files (the spec's examples and the XLSX
 * template) are mutated at random (bytes flipped, inserted, deleted, lines duplicated or dropped, cells made huge,
 * quotes unbalanced, delimiters changed, files cut short) and imported. Every input must import or give a user error
 * (an {@link ImportException} listing problems); anything else is a crash, saved under
 * {@code target/fuzz-crashes/} to be kept as a regression in {@code src/test/resources/fuzz-regressions/}.
 *
 * <p>The number of inputs is {@code -Dvariset.fuzz.inputs} (default 600 per run; the long run is 10,000, see
 * DEVELOPERS.md), the seed {@code -Dvariset.fuzz.seed}.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ImportFuzzTest {
    private static final int INPUTS = Integer.getInteger("variset.fuzz.inputs", 600);
    private static final long SEED = Long.getLong("variset.fuzz.seed", 20261202L);

    @TempDir
    Path dir;

    private Archive archive;
    private final List<String> crashes = new ArrayList<>();

    @BeforeAll
    void open() {
        archive = Archive.inMemory();
    }

    @AfterAll
    void close() {
        archive.close();
    }

    /** Imports one file; true when it imported or was refused as bad input, false (and saved) for a crash. */
    private boolean survives(Path file) throws IOException {
        try {
            new ArchiveImporter(archive).run(List.of(file), ImportOptions.defaults(), ImportProgress.NONE);
            return true;
        } catch (ImportException userError) {
            assertThat(userError.problems())
                    .as("a user error lists its problems")
                    .isNotEmpty();
            return true;
        } catch (RuntimeException | Error crash) {
            Path saved = Path.of("target", "fuzz-crashes");
            Files.createDirectories(saved);
            Path copy = saved.resolve(System.nanoTime() + "-" + file.getFileName());
            Files.copy(file, copy);
            StringWriter trace = new StringWriter();
            crash.printStackTrace(new PrintWriter(trace));
            crashes.add(copy + ": " + trace.toString().lines().limit(6).reduce("", (a, b) -> a + "\n    " + b));
            return false;
        }
    }

    @Test
    void everyMutatedFileImportsOrGivesAUserError() throws IOException {
        List<Path> seeds = new ArrayList<>(List.of(
                ImportFiles.specExample("routes.csv"),
                ImportFiles.specExample("holds.csv"),
                ImportFiles.specExample("reset.json")));
        seeds.addAll(TemplateWriter.write(ExportFormat.XLSX, dir.resolve("template"), false));
        Random r = new Random(SEED);
        int imported = 0;
        for (int i = 0; i < INPUTS; i++) {
            Path seed = seeds.get(i % seeds.size());
            String name = seed.getFileName().toString();
            Path input = dir.resolve("input-" + i + name.substring(name.lastIndexOf('.')));
            Files.write(input, Mutations.mutate(Files.readAllBytes(seed), r));
            survives(input);
            imported++;
            Files.delete(input);
        }
        System.out.println(
                "ImportFuzzTest: " + imported + " mutated inputs (seed " + SEED + "), " + crashes.size() + " crashes");
        assertThat(crashes).as("crashing inputs (kept in target/fuzz-crashes)").isEmpty();
    }

    /** Every input that once crashed an importer, kept for good: it must now import or give a user error. */
    @ParameterizedTest(name = "{0}", allowZeroInvocations = true)
    @MethodSource("regressions")
    void replaysEveryInputThatOnceCrashed(Path input) throws IOException {
        assertThat(survives(input)).as(crashes.toString()).isTrue();
    }

    Stream<Path> regressions() throws IOException {
        Path d = Path.of("src/test/resources/fuzz-regressions");
        return Files.list(d)
                .filter(p -> !p.getFileName().toString().equals("README.md"))
                .sorted();
    }
}
