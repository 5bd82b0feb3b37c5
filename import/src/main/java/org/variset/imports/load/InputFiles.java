package org.variset.imports.load;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.variset.imports.ProblemList;
import org.variset.imports.table.Columns;
import org.variset.imports.table.InputFileException;
import org.variset.imports.table.InputFormat;
import org.variset.imports.table.RowSource;
import org.variset.imports.table.TableKind;

/** Opens the input files by extension and checks every header before any row is read. */
final class InputFiles {
    private InputFiles() {}

    /** The tables of the files; problems for files that cannot be opened and for bad headers. */
    static List<RowSource> open(List<Path> files, ProblemList problems, Set<String> extraColumns) {
        List<RowSource> out = new ArrayList<>();
        for (Path p : files) {
            String name = p.toString();
            if (!Files.isRegularFile(p)) {
                problems.add(name, 0, "", "no such file");
                continue;
            }
            java.util.Optional<InputFormat> format = InputFormat.of(p);
            if (format.isEmpty()) {
                problems.add(name, 0, "", "unsupported file type (expected " + InputFormat.endingsInWords() + ")");
                continue;
            }
            try {
                out.addAll(format.get().open(p, name));
            } catch (InputFileException e) {
                problems.add(e.problem());
            }
        }
        for (RowSource s : out) {
            checkHeader(s, problems, extraColumns);
        }
        return out;
    }

    private static void checkHeader(RowSource s, ProblemList problems, Set<String> extraColumns) {
        TableKind kind = s.kind();
        Set<String> seen = new HashSet<>();
        for (String h : s.header()) {
            String n = Columns.normalise(h);
            if (n.isEmpty()) {
                continue;
            }
            if (!seen.add(n)) {
                problems.add(s.file(), s.headerLine(), h, "the column appears twice in the header");
            } else if (!kind.knows(n)) {
                String near = Columns.nearest(n, kind.columns());
                if (near != null) {
                    problems.add(s.file(), s.headerLine(), h, "unknown column (did you mean `" + near + "`?)");
                } else {
                    extraColumns.add(kind.word() + "." + h.strip());
                }
            }
        }
        for (String r : kind.required()) {
            if (!seen.contains(r)) {
                problems.add(
                        s.file(),
                        s.headerLine(),
                        r,
                        "missing required column (a " + kind.word() + " file needs "
                                + String.join(", ", kind.required()) + ")");
            }
        }
    }
}
