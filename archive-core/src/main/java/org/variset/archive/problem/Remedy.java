package org.variset.archive.problem;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * What a person can do about a problem, with the facts a front end needs to say it in its own words: the command
 * line names its options ("give --force to replace it"), the web names its buttons. A front end renders every kind
 * with an exhaustive {@code switch} over {@link Kind}, so a new kind cannot go unsaid.
 *
 * @param kind what can be done
 * @param facts what the words need, by name (each kind's javadoc lists its facts)
 */
public record Remedy(Kind kind, Map<String, String> facts) {

    /** Nothing to suggest beyond the message itself. */
    public static final Remedy NONE = new Remedy(Kind.NONE, Map.of());

    /** The kinds of remedy, and the facts each carries. */
    public enum Kind {
        /** Nothing to suggest. */
        NONE,
        /** A file is there already: replace it, or choose another name. Facts: {@code file}. */
        REPLACE_EXISTING,
        /** No archive is there: create one. Facts: {@code where}, {@code shared} ({@code true} or {@code false}). */
        CREATE_ARCHIVE,
        /** The archive cannot be read: check it for details. */
        CHECK_ARCHIVE,
        /** The search index cannot be read or written: build it again from the database. */
        REBUILD_INDEX,
        /** The archive holds several gyms: say which. Facts: {@code gyms}, the names joined by {@code , }. */
        NAME_GYM,
        /** A reset label is unknown: look up the archive's resets. Facts: {@code gym}. */
        LIST_RESETS,
        /** A row changes what the archive holds: allow the import to replace it. */
        ALLOW_UPDATE,
        /** There is no grade target for a discipline: set one. Facts: {@code discipline} (its word). */
        SET_TARGET,
        /** A new setter name is taken: merge the two names into one. Facts: {@code from}, {@code into}. */
        MERGE_SETTERS,
        /** A label names several routes: say which by wall and set date. */
        NARROW_ROUTE,
        /**
         * A setting applies to another scope than the one given. Facts: {@code scope}: {@code gym} (no discipline or
         * wall), {@code discipline}, or {@code discipline_or_wall}.
         */
        CHOOSE_SCOPE,
        /** Both an embedded and a shared archive were named at one level: name one. Facts: {@code level}. */
        CHOOSE_LOCATION,
        /** The work is for an embedded archive and this one is shared: use the server's own tools. */
        USE_SERVER_TOOLS,
        /** The work needs an embedded archive as its source, and a shared one was named: name the embedded one. */
        NAME_EMBEDDED_ARCHIVE,
        /** A grade fits more than one scale: say which. Facts: {@code scales}, their words joined by {@code , }. */
        CHOOSE_SCALE,
        /**
         * A new name is close to one the archive or the files already have: write it as that one, or confirm that it
         * is another. Facts: {@code name} (the new one), {@code known} (the close one), {@code what} (its word).
         */
        CONFIRM_NEW_NAME
    }

    /** Checks the fields; the facts are copied. */
    public Remedy {
        Objects.requireNonNull(kind, "kind");
        facts = Map.copyOf(facts);
    }

    /** A remedy with facts given as name, value, name, value... */
    public static Remedy of(Kind kind, String... namesAndValues) {
        if (namesAndValues.length % 2 != 0) {
            throw new IllegalArgumentException("facts come in pairs of name and value");
        }
        Map<String, String> facts = new LinkedHashMap<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            facts.put(namesAndValues[i], namesAndValues[i + 1]);
        }
        return new Remedy(kind, facts);
    }

    /**
     * A fact of this remedy.
     *
     * @throws IllegalStateException when the remedy does not carry it (a bug in whoever made it)
     */
    public String fact(String name) {
        String v = facts.get(name);
        if (v == null) {
            throw new IllegalStateException(kind + " carries no fact '" + name + "' (it has " + facts.keySet() + ")");
        }
        return v;
    }
}
