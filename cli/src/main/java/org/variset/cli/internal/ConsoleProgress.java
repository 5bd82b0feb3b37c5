package org.variset.cli.internal;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import org.variset.archive.search.IndexProgress;
import org.variset.imports.load.ImportProgress;

/**
 * Progress of a long import on standard error: a live bar (progressbar library) when standard error is a
 * terminal, plain counts every 100,000 rows otherwise.
 */
public final class ConsoleProgress implements ImportProgress, AutoCloseable {
    private static final long PLAIN_EVERY = 100_000;

    private final PrintWriter err;
    private final boolean terminal;
    private final boolean timings;
    private final Map<String, ProgressBar> bars = new HashMap<>();

    /** Progress to this writer; bars only when {@code terminal}. */
    public ConsoleProgress(PrintWriter err, boolean terminal) {
        this(err, terminal, false);
    }

    /** Progress to this writer; bars only when {@code terminal}; with {@code timings}, how long each phase took. */
    public ConsoleProgress(PrintWriter err, boolean terminal, boolean timings) {
        this.err = err;
        this.terminal = terminal;
        this.timings = timings;
    }

    /** True when the process has a terminal for its console. */
    public static boolean onTerminal() {
        return System.console() != null;
    }

    @Override
    public void advanced(String phase, long rows) {
        if (terminal) {
            bars.computeIfAbsent(
                            phase,
                            p -> new ProgressBarBuilder()
                                    .setTaskName(p)
                                    .setInitialMax(-1)
                                    .setUnit(" rows", 1)
                                    .setConsumer(new ConsoleProgressBarConsumer(System.err))
                                    .build())
                    .stepTo(rows);
        } else if (rows % PLAIN_EVERY == 0) {
            err.println(phase + ": " + rows + " rows");
            err.flush();
        }
    }

    @Override
    public void finished(String phase, long nanos) {
        ProgressBar bar = bars.remove(phase);
        if (bar != null) {
            bar.close();
        }
        if (timings) {
            err.printf(Locale.ROOT, "variset: %s took %.1f s%n", phase, nanos / 1e9);
            err.flush();
        }
    }

    /** Progress of an index update, shown like an import's. */
    public IndexProgress indexing() {
        return (done, total) -> advanced("indexing routes", done);
    }

    @Override
    public void close() {
        bars.values().forEach(ProgressBar::close);
        bars.clear();
    }
}
