package org.variset.bench;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The benchmark harness. Phases run in a fixed order (generate, import, search, audit, start-up, PDF) so that each
 * sees the same state of caches and files from one run of the harness to the next; every figure is a median over
 * repeated measurements beside a baseline measured in the same run.
 */
@Command(
        name = "benchmarks",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Measure Variset against floors of plain library calls on synthetic chains and write the "
                    + "figures to a Markdown file.",
            "",
            "Phases, in this order: generate the chains (kept between runs), import (variset import against a raw "
                    + "Commons CSV + JDBC + Lucene floor), search (p50/p95 against hand-built Lucene queries), audit "
                    + "(one reset in the small against the large chain), start-up (variset info against a bare picocli "
                    + "jar), PDF (a 60-route reset's PDF audit against a 10 s budget).",
            ""
        })
public final class Benchmarks implements Callable<Integer> {
    private static final String BEGIN = "<!-- measured: begin (written by benchmarks/run; edit outside) -->";
    private static final String END = "<!-- measured: end -->";
    private static final List<String> PHASES = List.of("import", "search", "audit", "start-up", "pdf");

    @Option(names = "--repo", required = true, paramLabel = "DIR", description = "The Variset checkout (built).")
    Path repo;

    @Option(
            names = "--work",
            paramLabel = "DIR",
            description = "Where chains, archives and logs go (default: " + "benchmarks/target/work in the checkout).")
    Path work;

    @Option(
            names = "--runs",
            paramLabel = "N",
            defaultValue = "3",
            description =
                    "Runs of each child-process " + "measurement (default: ${DEFAULT-VALUE}); medians are reported.")
    int runs;

    @Option(
            names = "--quick",
            description = "Tiny chains (1 and 3 gyms over 2 years) and one run: checks that the "
                    + "harness works, in a few minutes; the figures mean little.")
    boolean quick;

    @Option(
            names = "--only",
            split = ",",
            paramLabel = "PHASE",
            description =
                    "Run only these phases (import, "
                            + "search, audit, start-up, pdf); search, audit and start-up need the archives an earlier import left.")
    Set<String> only;

    @Option(
            names = "--out",
            paramLabel = "FILE",
            description = "The Markdown file to write the figures into, "
                    + "between its measured markers (created if missing).")
    Path out;

    @Option(
            names = "--command",
            paramLabel = "TEXT",
            defaultValue = "benchmarks/run",
            description = "The command line to name in the output (default: ${DEFAULT-VALUE}).")
    String command;

    @Override
    public Integer call() throws IOException {
        Set<String> phases = new LinkedHashSet<>(only == null ? PHASES : only);
        for (String p : phases) {
            if (!PHASES.contains(p)) {
                throw new CommandLine.ParameterException(
                        new CommandLine(this),
                        "unknown phase '" + p + "' (expected" + " one of " + String.join(", ", PHASES) + ")");
            }
        }
        Path w = (work != null ? work : repo.resolve("benchmarks/target/work")).toAbsolutePath();
        Bench b = new Bench(repo.toAbsolutePath(), w, quick ? 1 : runs, quick);
        Workload small = new Workload("small", quick ? 1 : 5, quick ? 2 : 10, w.resolve("data/small"));
        Workload large = new Workload("large", quick ? 3 : 50, quick ? 2 : 10, w.resolve("data/large"));
        String machine = Machine.describe();
        System.out.println("Variset benchmarks on " + machine);
        long started = System.nanoTime();

        Files.createDirectories(w);
        b.prepare();
        System.out.println("generate:");
        long[] smallCounts = small.ensure();
        long[] largeCounts = large.ensure();
        b.results.fact(String.format(
                Locale.ROOT,
                "chains: %s (%,d routes, %,d holds); %s (%,d routes, %,d holds)",
                small.describe(),
                smallCounts[0],
                smallCounts[1],
                large.describe(),
                largeCounts[0],
                largeCounts[1]));
        runPhases(b, phases, small, large, smallCounts, largeCounts);
        double minutes = (System.nanoTime() - started) / 6e10;
        System.out.printf(
                Locale.ROOT,
                "done in %.1f min; %s%n",
                minutes,
                b.results.allMet() ? "every target met" : "some targets MISSED");
        if (out != null) {
            write(b, machine, minutes, phases);
            System.out.println("wrote " + out);
        }
        return 0;
    }

    /** Runs the chosen phases in their fixed order (JIT warm-up makes the order matter). */
    private static void runPhases(
            Bench b, Set<String> phases, Workload small, Workload large, long[] smallCounts, long[] largeCounts)
            throws IOException {
        if (phases.contains("import")) {
            System.out.println("import:");
            ImportPhase imp = new ImportPhase(b);
            imp.run(small, smallCounts[1]);
            imp.run(large, largeCounts[1]);
        }
        if (phases.contains("search")) {
            System.out.println("search:");
            new SearchPhase(b).run(large);
        }
        if (phases.contains("audit")) {
            System.out.println("audit:");
            AuditPhase audit = new AuditPhase(b);
            audit.measure(small);
            audit.measure(large);
            audit.compare();
        }
        if (phases.contains("start-up")) {
            System.out.println("start-up:");
            new StartUpPhase(b).run(small);
        }
        if (phases.contains("pdf")) {
            System.out.println("pdf:");
            new PdfPhase(b).run();
        }
    }

    private void write(Bench b, String machine, double minutes, Set<String> phases) throws IOException {
        StringBuilder m = new StringBuilder();
        m.append(BEGIN).append("\n\n");
        m.append("Measured on ")
                .append(LocalDate.now())
                .append(" by `")
                .append(command)
                .append("`")
                .append(phases.size() == PHASES.size() ? "" : " (phases: " + String.join(", ", phases) + ")")
                .append(String.format(Locale.ROOT, " in %.0f minutes.%n%n", minutes));
        m.append("Machine: ").append(machine).append(".\n\n");
        m.append(b.results.markdownTable()).append('\n');
        m.append("How each figure was taken:\n\n")
                .append(b.results.markdownNotes())
                .append('\n');
        m.append("Other figures from the same run:\n\n");
        b.results.facts().forEach(f -> m.append("- ").append(f).append('\n'));
        m.append('\n').append(END);
        String text = Files.exists(out)
                ? Files.readString(out, StandardCharsets.UTF_8)
                : "# Benchmarks\n\n" + BEGIN + "\n" + END + "\n";
        int i = text.indexOf(BEGIN);
        int j = text.indexOf(END);
        String next =
                i < 0 || j < i ? text + "\n" + m + "\n" : text.substring(0, i) + m + text.substring(j + END.length());
        Path tmp = out.resolveSibling(out.getFileName() + ".tmp");
        Files.writeString(tmp, next, StandardCharsets.UTF_8);
        Files.move(
                tmp,
                out,
                java.nio.file.StandardCopyOption.REPLACE_EXISTING,
                java.nio.file.StandardCopyOption.ATOMIC_MOVE);
    }

    /**
     * Runs the harness.
     *
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(new CommandLine(new Benchmarks()).execute(args));
    }
}
