package org.variset.imports;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveStats;
import org.variset.imports.load.ArchiveImporter;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;

/**
 * Memory does not grow with the file: one million hold rows import in a child JVM limited to a 512 MB heap.
 * Slow (about a minute or two); tagged so that the default run leaves it out and CI runs it.
 */
@Tag("slow")
class StreamingImportIT {
    private static final int ROUTES = 50_000;
    private static final int HOLDS_PER_ROUTE = 20;

    @TempDir
    Path dir;

    @Test
    void importsAMillionHoldRowsUnderA512MegabyteHeap() throws Exception {
        writeFiles(dir);
        Path archiveDir = dir.resolve("archive");
        Process p = new ProcessBuilder(
                        Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                        "-Xmx512m",
                        "-XX:+UseSerialGC",
                        "-cp",
                        System.getProperty("java.class.path"),
                        StreamingImportIT.class.getName(),
                        dir.toString(),
                        archiveDir.toString())
                .redirectErrorStream(true)
                .redirectOutput(dir.resolve("child.log").toFile())
                .start();
        assertThat(p.waitFor(20, TimeUnit.MINUTES)).as("child finished").isTrue();
        String log = Files.readString(dir.resolve("child.log"));
        assertThat(p.exitValue()).as(log).isZero();
        try (Archive a = Archive.open(archiveDir)) {
            ArchiveStats s = a.stats();
            assertThat(s.routes()).isEqualTo(ROUTES);
            assertThat(s.holds()).isEqualTo((long) ROUTES * HOLDS_PER_ROUTE);
        }
        System.out.println("StreamingImportIT: " + log.strip());
    }

    /**
     * The child: imports the files and prints the time and the heap it used.
     *
     * @param args the folder with routes.csv and holds.csv, then the archive folder
     */
    public static void main(String[] args) {
        long t0 = System.nanoTime();
        try (Archive a = Archive.create(Path.of(args[1]))) {
            new ArchiveImporter(a)
                    .run(
                            List.of(Path.of(args[0], "routes.csv"), Path.of(args[0], "holds.csv")),
                            ImportOptions.defaults(),
                            ImportProgress.NONE);
        }
        Runtime rt = Runtime.getRuntime();
        System.out.printf(
                "imported %d holds in %.1f s, max heap %d MB%n",
                ROUTES * HOLDS_PER_ROUTE, (System.nanoTime() - t0) / 1e9, rt.maxMemory() >> 20);
    }

    private static void writeFiles(Path dir) throws IOException {
        try (BufferedWriter r = Files.newBufferedWriter(dir.resolve("routes.csv"), StandardCharsets.UTF_8);
                BufferedWriter h = Files.newBufferedWriter(dir.resolve("holds.csv"), StandardCharsets.UTF_8)) {
            r.write("gym,wall,route,set_on,discipline,grade,setters,moves\n");
            h.write("gym,route,set_on,seq,role,type,size,grip,hold_ref,x_m,y_m\n");
            String[] types = {"jug", "crimp", "sloper", "pinch", "edge"};
            for (int i = 0; i < ROUTES; i++) {
                String date =
                        java.time.LocalDate.of(2016, 1, 1).plusDays(i / 100).toString();
                r.write("Test Chain Gym,Wall " + (i % 8) + ",R" + i + "," + date + ",boulder,V" + (i % 8) + ",Setter "
                        + (i % 12) + ",dyno;heel hook\n");
                for (int k = 1; k <= HOLDS_PER_ROUTE; k++) {
                    h.write("Test Chain Gym,R" + i + "," + date + "," + k + ",hand," + types[k % 5] + ",m,"
                            + (k * 45 % 360) + ",H" + k + "," + (k * 0.1) + "," + (k * 0.2) + "\n");
                }
            }
        }
    }
}
