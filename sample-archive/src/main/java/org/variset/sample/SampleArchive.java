package org.variset.sample;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

/**
 * The bundled sample gym's interchange files (written by the generator; see the README beside them), copied out of the
 * jar so they can be imported like a user's.
 */
public final class SampleArchive {
    /** The sample gym's name (invented). */
    public static final String GYM = "Lantern Rock";

    private static final List<String> FILES = List.of("walls.csv", "routes.csv", "holds.csv");

    private SampleArchive() {}

    /**
     * Copies the sample files into a folder.
     *
     * @return the files, in the order to import them
     */
    public static List<Path> copyTo(Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> out = new ArrayList<>();
        for (String name : FILES) {
            try (InputStream in = SampleArchive.class.getResourceAsStream("lantern/" + name)) {
                if (in == null) {
                    throw new IOException("the sample file " + name + " is missing from the jar");
                }
                Path target = dir.resolve(name);
                Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
                out.add(target);
            }
        }
        return out;
    }
}
