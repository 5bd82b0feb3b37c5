package org.variset.web.page;

import com.fasterxml.jackson.databind.JsonNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.UploadedFile;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.variset.app.imports.ImportFiles;
import org.variset.imports.ImportException;
import org.variset.imports.Problem;
import org.variset.imports.load.ImportOptions;
import org.variset.imports.load.ImportProgress;
import org.variset.web.security.FormTokens;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;
import org.variset.web.security.Refusal;

/**
 * Importing interchange files from the browser: the files are checked by content, then always dry-run first (the
 * same validation as {@code variset import}, the same located problems, nothing written); only a clean dry run offers
 * the import itself, of the very files checked, which is all or nothing.
 */
public final class ImportPages {
    private static final Duration PENDING_FOR = Duration.ofMinutes(30);
    private static final int MAX_FILES = 20;

    private final Site site;
    private final long limitBytes;
    private final Map<String, Pending> pending = new ConcurrentHashMap<>();

    /** Import pages of a site, taking files up to a size each. */
    public ImportPages(Site site, long limitBytes) {
        this.site = site;
        this.limitBytes = limitBytes;
    }

    /** Checked files waiting for their import. */
    private record Pending(String account, Path dir, List<Path> files, ImportOptions options, Instant at) {}

    /**
     * A problem as the page lists it.
     *
     * @param file the file
     * @param line its line (0 when it is about the whole file)
     * @param column the column, or empty
     * @param message what is wrong and what to do
     */
    public record ProblemRow(String file, int line, String column, String message) {}

    /**
     * The page.
     *
     * @param problems the problems found, or empty
     * @param more how many more problems there were than listed
     * @param summary what the import did or would do, line by line, or empty
     * @param dryRun true when the summary is a dry run's
     * @param token the token of checked files waiting for their import, or empty
     * @param files the files' names
     */
    public record ImportView(
            List<ProblemRow> problems, long more, List<String> summary, boolean dryRun, String token, String files) {
        static ImportView empty() {
            return new ImportView(List.of(), 0, List.of(), false, "", "");
        }
    }

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/import", ctx -> show(ctx, ImportView.empty(), 200), Need.SETTER);
        r.post("/import", this::check, Need.SETTER);
        r.post("/import/confirm", this::confirm, Need.SETTER);
    }

    private void show(Context ctx, ImportView v, int status) {
        ctx.status(status);
        site.page(ctx, "import.jte", "Import files", "view", v);
    }

    private void check(Context ctx) throws IOException {
        forgetOld();
        List<UploadedFile> uploads = ctx.uploadedFiles("files");
        if (uploads.isEmpty()
                || uploads.stream().allMatch(u -> u.size() == 0 && u.filename().isBlank())) {
            throw new Refusal(
                    400,
                    "No files",
                    "Choose the files to import (routes and holds as CSV, an XLSX "
                            + "workbook or a JSON document), then check them.");
        }
        if (uploads.size() > MAX_FILES) {
            throw new Refusal(413, "Too many files", "Give at most " + MAX_FILES + " files at a time.");
        }
        ImportOptions options = ImportOptions.defaults()
                .withUpdate(ctx.formParam("update") != null)
                .withNewNames(newNames(ctx.formParam("new_names")));
        Path dir = Files.createTempDirectory("variset-upload-");
        boolean keep = false;
        try {
            List<ProblemRow> refused = new ArrayList<>();
            List<Path> files = save(uploads, dir, refused);
            if (!refused.isEmpty()) {
                show(ctx, new ImportView(refused, 0, List.of(), true, "", names(files)), 422);
                return;
            }
            ImportView v;
            try {
                ImportFiles.Result r = site.gate()
                        .use(w -> new ImportFiles(w).run(files, options.withDryRun(true), ImportProgress.NONE));
                String token = FormTokens.next();
                pending.put(
                        token,
                        new Pending(
                                Guard.account(ctx).name(),
                                dir,
                                files,
                                options,
                                site.clock().instant()));
                keep = true;
                v = new ImportView(List.of(), 0, summary(r.json()), true, token, names(files));
            } catch (ImportException e) {
                show(ctx, problems(e, names(files)), 422);
                return;
            }
            show(ctx, v, 200);
        } finally {
            if (!keep) {
                delete(dir);
            }
        }
    }

    private void confirm(Context ctx) {
        String token = Site.param(ctx, "token");
        Pending p = pending.remove(token);
        if (p == null
                || !p.account().equals(Guard.account(ctx).name())
                || site.clock().instant().isAfter(p.at().plus(PENDING_FOR))) {
            throw new Refusal(
                    409,
                    "Check the files again",
                    "These checked files are no longer waiting (they were "
                            + "imported, or more than 30 minutes passed). Choose them again and check them first.");
        }
        try {
            ImportFiles.Result r =
                    site.gate().use(w -> new ImportFiles(w).run(p.files(), p.options(), ImportProgress.NONE));
            show(ctx, new ImportView(List.of(), 0, summary(r.json()), false, "", names(p.files())), 200);
        } catch (ImportException e) {
            show(ctx, problems(e, names(p.files())), 422);
        } finally {
            delete(p.dir());
        }
    }

    private List<Path> save(List<UploadedFile> uploads, Path dir, List<ProblemRow> refused) throws IOException {
        List<Path> files = new ArrayList<>();
        for (UploadedFile u : uploads) {
            String name = UploadCheck.safeName(u.filename());
            if (u.size() > limitBytes) {
                refused.add(new ProblemRow(
                        name,
                        0,
                        "",
                        "is larger than the " + (limitBytes / (1024 * 1024))
                                + " MB an upload may be; split it, or import it with 'variset import' on the server."));
                continue;
            }
            byte[] bytes;
            try (InputStream in = u.content()) {
                bytes = in.readAllBytes();
            }
            String problem = UploadCheck.problem(name, UploadCheck.head(bytes));
            if (problem != null) {
                refused.add(new ProblemRow(name, 0, "", problem));
                continue;
            }
            Path target = dir.resolve(name);
            if (Files.exists(target)) {
                refused.add(new ProblemRow(name, 0, "", "is given twice; give each file once."));
                continue;
            }
            Files.write(target, bytes);
            files.add(target);
        }
        return files;
    }

    private static ImportView problems(ImportException e, String files) {
        List<ProblemRow> rows = new ArrayList<>();
        for (Problem p : e.problems()) {
            rows.add(new ProblemRow(
                    p.file(),
                    p.line(),
                    p.column() == null ? "" : p.column(),
                    WebWords.withRemedy(p.message(), p.remedy())));
        }
        return new ImportView(rows, e.count() - e.problems().size(), List.of(), true, "", files);
    }

    static List<String> summary(JsonNode j) {
        List<String> out = new ArrayList<>();
        JsonNode routes = j.path("routes");
        out.add(routes.path("new").asLong() + " new routes, "
                + routes.path("changed").asLong() + " changed, "
                + routes.path("unchanged").asLong() + " unchanged; "
                + j.path("holds_written").asLong()
                + " holds written.");
        list(out, "New gyms: ", j.path("new_gyms"));
        List<String> walls = new ArrayList<>();
        j.path("new_walls")
                .forEach(w ->
                        walls.add(w.path("wall").asText() + " (" + w.path("gym").asText() + ")"));
        if (!walls.isEmpty()) {
            out.add("New walls: " + String.join(", ", walls) + ".");
        }
        list(out, "New setters: ", j.path("new_setters"));
        j.path("changes").forEach(c -> out.add("Change: " + c.asText()));
        j.path("warnings").forEach(c -> out.add("Warning: " + c.asText()));
        list(out, "Columns kept as extra fields: ", j.path("extra_columns"));
        list(out, "Terms outside the vocabulary: ", j.path("unknown_terms"));
        return out;
    }

    private static void list(List<String> out, String head, JsonNode arr) {
        List<String> v = new ArrayList<>();
        arr.forEach(x -> v.add(x.asText()));
        if (!v.isEmpty()) {
            out.add(head + String.join(", ", v) + ".");
        }
    }

    private static Set<String> newNames(String text) {
        if (text == null || text.isBlank()) {
            return Set.of();
        }
        return Arrays.stream(text.split("\\R"))
                .map(String::strip)
                .filter(s -> !s.isEmpty())
                .collect(Collectors.toSet());
    }

    private static String names(List<Path> files) {
        return files.stream().map(f -> f.getFileName().toString()).collect(Collectors.joining(", "));
    }

    private void forgetOld() {
        Instant now = site.clock().instant();
        pending.entrySet().removeIf(e -> {
            boolean old = now.isAfter(e.getValue().at().plus(PENDING_FOR));
            if (old) {
                delete(e.getValue().dir());
            }
            return old;
        });
    }

    private static void delete(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
