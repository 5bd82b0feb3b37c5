package org.variset.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.variset.sample.generate.SampleGenerator;

/**
 * A PDF audit from a cold start: the bundled two-year sample gym plus one new wall whose reset has 60 boulders
 * (copied, holds and all, from the sample's own routes), audited with {@code variset audit --pdf}: start-up, reads,
 * figures, the next reset's plan, charts and the document. The budget is 10 seconds.
 */
final class PdfPhase {
    static final int ROUTES = 60;
    static final double BUDGET_SECONDS = 10;
    private static final String WALL = "Benchmark Annex";

    private final Bench b;

    PdfPhase(Bench b) {
        this.b = b;
    }

    void run() throws IOException {
        Path data = b.work.resolve("data/pdf");
        Path dir = b.work.resolve("archives/pdf");
        Bench.delete(dir);
        SampleGenerator.Summary s = SampleGenerator.write(SampleGenerator.sample(), data);
        String day = SampleGenerator.SAMPLE_END.minusDays(3).toString();
        writeAnnex(data, day);
        b.variset("pdf-init", List.of(), false, "--archive", dir.toString(), "init")
                .orFail("variset init");
        List<String> args = new ArrayList<>(List.of("--archive", dir.toString(), "import"));
        s.files().forEach(f -> args.add(f.toString()));
        args.addAll(List.of(
                data.resolve("annex-walls.csv").toString(),
                data.resolve("annex-routes.csv").toString(),
                data.resolve("annex-holds.csv").toString()));
        b.variset("pdf-import", List.of(), false, args.toArray(String[]::new)).orFail("importing the PDF workload");
        List<Double> times = new ArrayList<>();
        Path pdf = b.work.resolve("annex-audit.pdf");
        for (int i = 0; i < b.runs; i++) {
            ChildRun.Result r = b.variset(
                            "pdf-audit",
                            List.of(),
                            false,
                            "--archive",
                            dir.toString(),
                            "audit",
                            "--wall",
                            WALL,
                            "--on",
                            SampleGenerator.SAMPLE_END.toString(),
                            "--pdf",
                            pdf.toString(),
                            "--force")
                    .orFail("variset audit --pdf");
            times.add(r.seconds());
        }
        double t = Stats.median(times);
        b.results.add(new Results.Row(
                "PDF audit of a 60-route reset, two-year archive",
                String.format(Locale.ROOT, "%.2f s", t),
                "10 s budget",
                t / BUDGET_SECONDS,
                1.0,
                String.format(
                        Locale.ROOT,
                        "variset audit "
                                + "--pdf from a fresh JVM (start-up included), median of %d runs (%s); %d routes in the "
                                + "archive; PDF %,d bytes",
                        b.runs,
                        ImportPhase.seconds(times),
                        s.routes() + ROUTES,
                        Files.size(pdf))));
    }

    /** One new wall with a reset of 60 boulders copied from the sample's latest routes. */
    private static void writeAnnex(Path data, String day) throws IOException {
        CSVFormat in = CSVFormat.RFC4180
                .builder()
                .setHeader()
                .setSkipHeaderRecord(true)
                .get();
        List<CSVRecord> picked = new ArrayList<>();
        List<String> routeHeader;
        String gym = null;
        try (Reader r = Files.newBufferedReader(data.resolve("routes.csv"), StandardCharsets.UTF_8);
                CSVParser p = in.parse(r)) {
            routeHeader = p.getHeaderNames();
            List<CSVRecord> boulders = p.stream()
                    .filter(x -> x.get("discipline").equals("boulder"))
                    .toList();
            picked.addAll(boulders.subList(Math.max(0, boulders.size() - ROUTES), boulders.size()));
            gym = picked.get(0).get("gym");
        }
        if (picked.size() < ROUTES) {
            throw new IllegalStateException("the sample has only " + picked.size() + " boulders");
        }
        Map<String, String> newLabel = writeAnnexRoutes(data, day, gym, routeHeader, picked);
        writeAnnexHolds(data, day, in, newLabel);
    }

    /** The annex wall and its routes; returns each copied route's new label by the original's key. */
    private static Map<String, String> writeAnnexRoutes(
            Path data, String day, String gym, List<String> routeHeader, List<CSVRecord> picked) throws IOException {
        Map<String, String> newLabel = new HashMap<>();
        try (BufferedWriter w = Files.newBufferedWriter(data.resolve("annex-walls.csv"), StandardCharsets.UTF_8);
                CSVPrinter out = CSVFormat.RFC4180
                        .builder()
                        .setHeader("gym", "wall", "discipline", "angle_deg", "height_m", "width_m", "cycle_days")
                        .get()
                        .print(w)) {
            out.printRecord(gym, WALL, "boulder", "30", "4.5", "12", "28");
        }
        try (BufferedWriter w = Files.newBufferedWriter(data.resolve("annex-routes.csv"), StandardCharsets.UTF_8);
                CSVPrinter out = CSVFormat.RFC4180
                        .builder()
                        .setHeader(routeHeader.toArray(String[]::new))
                        .get()
                        .print(w)) {
            int n = 0;
            for (CSVRecord r : picked) {
                String label = "Annex " + (++n);
                newLabel.put(key(r), label);
                List<String> row = new ArrayList<>();
                for (String h : routeHeader) {
                    row.add(
                            switch (h) {
                                case "wall" -> WALL;
                                case "route" -> label;
                                case "set_on" -> day;
                                case "stripped_on" -> "";
                                default -> r.get(h);
                            });
                }
                out.printRecord(row);
            }
        }
        return newLabel;
    }

    /** The holds of the copied routes, moved onto the annex wall. */
    private static void writeAnnexHolds(Path data, String day, CSVFormat in, Map<String, String> newLabel)
            throws IOException {
        try (Reader r = Files.newBufferedReader(data.resolve("holds.csv"), StandardCharsets.UTF_8);
                CSVParser p = in.parse(r);
                BufferedWriter w = Files.newBufferedWriter(data.resolve("annex-holds.csv"), StandardCharsets.UTF_8);
                CSVPrinter out = CSVFormat.RFC4180
                        .builder()
                        .setHeader(p.getHeaderNames().toArray(String[]::new))
                        .get()
                        .print(w)) {
            for (CSVRecord h : p) {
                String label = newLabel.get(key(h));
                if (label == null) {
                    continue;
                }
                List<String> row = new ArrayList<>();
                for (String name : p.getHeaderNames()) {
                    row.add(
                            switch (name) {
                                case "wall" -> WALL;
                                case "route" -> label;
                                case "set_on" -> day;
                                default -> h.get(name);
                            });
                }
                out.printRecord(row);
            }
        }
    }

    private static String key(CSVRecord r) {
        return String.join("\u0000", r.get("gym"), r.get("wall"), r.get("route"), r.get("set_on"))
                .toLowerCase(Locale.ROOT);
    }
}
