package org.variset.app.sample;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.sample.generate.SampleGenerator;

/** Writes invented gyms as interchange CSV files: the bundled sample again, or large synthetic chains. */
public final class GenerateSample {
    private GenerateSample() {}

    /**
     * What to write.
     *
     * @param gyms how many synthetic gyms, or null for the sample gym
     * @param years years of resets
     * @param seed the seed, or null for the sample's
     * @param end the last day of the resets, or null for the sample's
     */
    public record Request(Integer gyms, int years, Long seed, LocalDate end) {}

    /**
     * What was written.
     *
     * @param summary the counts and files
     * @param seconds how long it took
     */
    public record Result(SampleGenerator.Summary summary, double seconds) {}

    /**
     * Writes the files into a folder.
     *
     * @throws InputException when a file is there and {@code replace} is false
     */
    public static Result into(Path out, Request r, boolean replace) {
        for (String f : List.of("walls.csv", "routes.csv", "holds.csv")) {
            if (!replace && Files.exists(out.resolve(f))) {
                throw new InputException(
                        InputException.Reason.EXISTS,
                        out.resolve(f) + " exists already",
                        Remedy.of(
                                Remedy.Kind.REPLACE_EXISTING,
                                "file",
                                out.resolve(f).toString()));
            }
        }
        SampleGenerator.Options o = r.gyms() == null && r.seed() == null && r.end() == null && r.years() == 2
                ? SampleGenerator.sample()
                : new SampleGenerator.Options(
                        r.gyms() == null ? 1 : r.gyms(),
                        r.years(),
                        r.seed() == null ? SampleGenerator.SAMPLE_SEED : r.seed(),
                        r.end() == null ? SampleGenerator.SAMPLE_END : r.end(),
                        r.gyms() == null);
        long start = System.nanoTime();
        SampleGenerator.Summary s = SampleGenerator.write(o, out);
        return new Result(s, (System.nanoTime() - start) / 1e9);
    }
}
