package org.variset.cli.command;

/** How a command prints its result: for people, or as JSON for scripts. */
public enum OutputFormat {
    /** Aligned text for people. */
    TEXT,
    /** One JSON document on standard output. */
    JSON
}
