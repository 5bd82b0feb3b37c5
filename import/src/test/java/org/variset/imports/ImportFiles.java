package org.variset.imports;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes small input files for import tests. Names and content are invented. */
public final class ImportFiles {
    /** The header of the spec's routes.csv example. */
    public static final String ROUTES_HEADER = "gym,wall,route,set_on,discipline,grade,stripped_on,reset,setters,"
            + "color,angle_deg,moves,styles,move_difficulty,notes";
    /** The header of the spec's holds.csv example. */
    public static final String HOLDS_HEADER = "gym,route,set_on,seq,role,type,size,grip,hold_ref,x_m,y_m";

    private ImportFiles() {}

    /** Writes text as UTF-8. */
    public static Path write(Path dir, String name, String text) {
        return bytes(dir, name, text.getBytes(StandardCharsets.UTF_8));
    }

    /** Writes bytes. */
    public static Path bytes(Path dir, String name, byte[] content) {
        try {
            Path p = dir.resolve(name);
            Files.write(p, content);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** One of the spec's example files (docs/spec/examples in the repository). */
    public static Path specExample(String name) {
        return Path.of("../docs/spec/examples", name);
    }
}
