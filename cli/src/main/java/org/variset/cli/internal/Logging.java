package org.variset.cli.internal;

import java.util.logging.ConsoleHandler;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * Keeps the libraries' log lines (Hibernate, Flyway, H2) off the console unless {@code --verbose} is given; then
 * they go to standard error, never to standard output.
 */
public final class Logging {
    private Logging() {}

    /** Sets java.util.logging's root logger for this command. */
    public static void configure(boolean verbose) {
        Logger root = Logger.getLogger("");
        for (Handler h : root.getHandlers()) {
            root.removeHandler(h);
        }
        if (verbose) {
            ConsoleHandler h = new ConsoleHandler();
            h.setLevel(Level.INFO);
            root.addHandler(h);
            root.setLevel(Level.INFO);
        } else {
            root.setLevel(Level.OFF);
        }
    }
}
