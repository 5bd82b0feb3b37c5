package org.variset.app;

/** Where a use case's notices go: the command line prints them on standard error, the web shows them. */
@FunctionalInterface
public interface Notices {
    /** Notices nobody reads (tests, the start-up trainer). */
    Notices NONE = n -> {};

    /** Takes one notice. */
    void note(Notice notice);
}
