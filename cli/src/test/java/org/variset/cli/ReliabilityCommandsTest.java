package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code check}, {@code backup} and {@code restore} as a user runs them, on the invented Fernhollow gym. */
class ReliabilityCommandsTest {
    private static final Path FILES = Path.of("src/test/resources/org/variset/cli/fernhollow");

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
    void findsAHealthyArchiveAndRepairsADamagedIndex() throws Exception {
        assertThat(run("check").exits(ExitCode.OK).out())
                .contains("ok      holds without their route: none")
                .contains("ok      one document per route: 15 documents, 15 routes")
                .endsWith("The archive is healthy.\n");
        try (Stream<Path> files = Files.list(archive.resolve("index"))) {
            for (Path f : files.filter(p -> p.getFileName().toString().endsWith(".cfs")
                            || p.getFileName().toString().endsWith(".si"))
                    .toList()) {
                Files.write(f, new byte[] {0, 1, 2, 3});
            }
        }
        CliRun broken = run("check").exits(ExitCode.ARCHIVE);
        assertThat(broken.out())
                .contains("PROBLEM Lucene CheckIndex")
                .contains("The database is healthy; the search "
                        + "index is not. Rebuild it with 'variset check --repair'");
        assertThat(run("check", "--repair").exits(ExitCode.OK).out())
                .contains("The search index was rebuilt")
                .endsWith("The archive is healthy.\n");
    }

    @Test
    void callsAMissingIndexANoteWithExitZero() throws Exception {
        try (Stream<Path> files = Files.walk(archive.resolve("index"))) {
            for (Path f : files.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(f);
            }
        }
        CliRun r = run("check").exits(ExitCode.OK);
        assertThat(r.out())
                .contains("note    Lucene CheckIndex: there is no index yet: the next search builds it")
                .contains("The archive is healthy. The search index is only behind the database");
        assertThat(run("check").exits(ExitCode.OK).out()).doesNotContain("PROBLEM");
    }

    @Test
    void backsUpAndRestoresAndRefusesADamagedBackup() throws Exception {
        Path backup = home.resolve("b.zip");
        assertThat(run("backup", backup.toString()).exits(ExitCode.OK).out())
                .startsWith("Backed up 15 routes, 57 " + "holds, 1 gym to " + backup);
        assertThat(run("backup", backup.toString()).exits(ExitCode.BAD_INPUT).err())
                .contains("--force");
        run("remove", "--reset", "Bay 2026-01-19", "--yes").exits(ExitCode.OK);
        assertThat(run("restore", backup.toString()).exits(ExitCode.BAD_INPUT).err())
                .contains("give --force");
        assertThat(run("restore", backup.toString(), "--force")
                        .exits(ExitCode.OK)
                        .out())
                .contains("15 routes, 57 " + "holds")
                .contains("the archive that was there is replaced");
        assertThat(run("search", "wall:Bay").exits(ExitCode.OK).out()).startsWith("3 routes match");
        Path damaged = Files.writeString(home.resolve("d.zip"), "not a backup");
        assertThat(run("restore", damaged.toString(), "--force")
                        .exits(ExitCode.BAD_INPUT)
                        .err())
                .contains("is not a backup Variset can restore");
        assertThat(run("info", "--format", "json").out()).contains("\"routes\" : 15");
    }
}
