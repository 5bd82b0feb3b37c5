package org.variset.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import org.variset.sample.generate.SampleGenerator;

/**
 * A synthetic chain written by the sample generator, kept between runs of the harness (a marker file records the
 * options it was written with, so changed options write it again).
 *
 * @param name small or large
 * @param gyms how many gyms
 * @param years how many years of resets
 * @param dir the folder holding walls.csv, routes.csv and holds.csv
 */
record Workload(String name, int gyms, int years, Path dir) {
    static final long SEED = 7;
    static final LocalDate END = SampleGenerator.SAMPLE_END;

    Path walls() {
        return dir.resolve("walls.csv");
    }

    Path routes() {
        return dir.resolve("routes.csv");
    }

    Path holds() {
        return dir.resolve("holds.csv");
    }

    /** The first synthetic gym's name, present at every scale. */
    String firstGym() {
        return "Synthetic Gym 001";
    }

    String describe() {
        return String.format(Locale.ROOT, "%s: %d gyms x %d years, seed %d", name, gyms, years, SEED);
    }

    /** Writes the files unless they were written with the same options; returns route and hold counts. */
    long[] ensure() throws IOException {
        Path marker = dir.resolve("generated.txt");
        String stamp = describe() + ", end " + END;
        if (Files.exists(marker)) {
            String[] lines = Files.readString(marker, StandardCharsets.UTF_8).split("\n");
            if (lines.length == 2 && lines[0].equals(stamp)) {
                String[] n = lines[1].split(" ");
                return new long[] {Long.parseLong(n[0]), Long.parseLong(n[1])};
            }
        }
        Files.deleteIfExists(marker);
        long start = System.nanoTime();
        SampleGenerator.Summary s =
                SampleGenerator.write(new SampleGenerator.Options(gyms, years, SEED, END, false), dir);
        System.out.printf(
                Locale.ROOT,
                "  generated %s: %d routes, %d holds in %.1f s%n",
                describe(),
                s.routes(),
                s.holds(),
                (System.nanoTime() - start) / 1e9);
        Files.writeString(marker, stamp + "\n" + s.routes() + " " + s.holds(), StandardCharsets.UTF_8);
        return new long[] {s.routes(), s.holds()};
    }
}
