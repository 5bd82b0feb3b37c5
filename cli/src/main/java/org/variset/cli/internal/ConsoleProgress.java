package org.variset.cli.internal;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.Map;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import org.variset.imports.load.ImportProgress;

/**
 * Progress of a long import on standard error: a live bar (progressbar library) when standard error is a
 * terminal, plain counts every 100,000 rows otherwise.
 */
public final class ConsoleProgress implements ImportProgress, AutoCloseable {
    private static final long PLAIN_EVERY = 100_000;

    private final PrintWriter err;
    private final boolean terminal;
    private final Map<String, ProgressBar> bars = new HashMap<>();

    /** Progress to this writer; bars only when {@code terminal}. */
    public ConsoleProgress(PrintWriter err, boolean terminal) {
        this.err = err;
        this.terminal = terminal;
    }

    /** True when the process has a terminal for its console. */
    public static boolean onTerminal() {
        return System.console() != null;
    }

    @Override
    public void advanced(String phase, long rows) {
        if (terminal) {
            bars.computeIfAbsent(phase, p -> new ProgressBarBuilder().setTaskName(p).setInitialMax(-1)
                    .setUnit(" rows", 1).setConsumer(new ConsoleProgressBarConsumer(System.err)).build())
                    .stepTo(rows);
        } else if (rows % PLAIN_EVERY == 0) {
            err.println(phase + ": " + rows + " rows");
            err.flush();
        }
    }

    @Override
    public void close() {
        bars.values().forEach(ProgressBar::close);
        bars.clear();
    }
}
