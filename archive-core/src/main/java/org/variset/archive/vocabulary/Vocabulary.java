package org.variset.archive.vocabulary;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Canonical terms and their spellings, per field. Spellings match ignoring case, surrounding spaces and runs of
 * white space. Immutable; {@link #extendedWith} gives a new vocabulary with a gym's own terms added.
 */
public final class Vocabulary {
    private static final Vocabulary DEFAULT = loadDefault();

    private final Map<VocabularyField, Map<String, String>> spellingToTerm;
    private final Map<VocabularyField, List<String>> terms;

    private Vocabulary(
            Map<VocabularyField, Map<String, String>> spellingToTerm, Map<VocabularyField, List<String>> terms) {
        this.spellingToTerm = spellingToTerm;
        this.terms = terms;
    }

    /** The default vocabulary shipped with Variset (docs/spec/vocabulary.md). */
    public static Vocabulary defaults() {
        return DEFAULT;
    }

    /** The canonical term a text spells in a field, if any. */
    public Optional<String> canonical(VocabularyField field, String text) {
        return Optional.ofNullable(spellingToTerm.get(field).get(key(text)));
    }

    /**
     * The term a text spells, or for a term the vocabulary does not know, the text itself in lower case with
     * single spaces (so that later spellings of it compare equal).
     */
    public String termOrAsWritten(VocabularyField field, String text) {
        return canonical(field, text).orElse(key(text));
    }

    /** True when the field lists a term for the text. */
    public boolean knows(VocabularyField field, String text) {
        return spellingToTerm.get(field).containsKey(key(text));
    }

    /** The canonical terms of a field, in the order they were listed. */
    public List<String> terms(VocabularyField field) {
        return terms.get(field);
    }

    /** Every spelling of a field with its term, for search synonyms. */
    public Map<String, String> spellings(VocabularyField field) {
        return Collections.unmodifiableMap(spellingToTerm.get(field));
    }

    /**
     * This vocabulary with more terms and spellings, in the file form ({@code [moves]} sections,
     * {@code term: spelling, spelling} lines).
     *
     * @throws IllegalArgumentException naming the line that is not of that form
     */
    public Vocabulary extendedWith(String text) {
        Map<VocabularyField, Map<String, String>> s = new EnumMap<>(VocabularyField.class);
        Map<VocabularyField, List<String>> t = new EnumMap<>(VocabularyField.class);
        for (VocabularyField f : VocabularyField.values()) {
            s.put(f, new LinkedHashMap<>(spellingToTerm.get(f)));
            t.put(f, new ArrayList<>(terms.get(f)));
        }
        try {
            read(new StringReader(text), s, t);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return freeze(s, t);
    }

    /** Stripped, runs of white space as one space, lower case: how spellings are compared. */
    static String key(String text) {
        if (text == null) {
            return "";
        }
        String t = text.strip();
        StringBuilder b = new StringBuilder(t.length());
        boolean afterSpace = false;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            boolean space = Character.isWhitespace(c);
            if (!space) {
                b.append(c);
            } else if (!afterSpace) {
                b.append(' ');
            }
            afterSpace = space;
        }
        return b.toString().toLowerCase(Locale.ROOT);
    }

    private static Vocabulary loadDefault() {
        Map<VocabularyField, Map<String, String>> s = new EnumMap<>(VocabularyField.class);
        Map<VocabularyField, List<String>> t = new EnumMap<>(VocabularyField.class);
        for (VocabularyField f : VocabularyField.values()) {
            s.put(f, new LinkedHashMap<>());
            t.put(f, new ArrayList<>());
        }
        try (InputStream in = Vocabulary.class.getResourceAsStream("default-vocabulary.txt")) {
            if (in == null) {
                throw new IllegalStateException("default-vocabulary.txt is missing from the classpath");
            }
            read(new InputStreamReader(in, StandardCharsets.UTF_8), s, t);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return freeze(s, t);
    }

    private static void read(
            Reader source, Map<VocabularyField, Map<String, String>> s, Map<VocabularyField, List<String>> t)
            throws IOException {
        BufferedReader r = new BufferedReader(source);
        VocabularyField field = null;
        int n = 0;
        for (String line; (line = r.readLine()) != null; ) {
            n++;
            String l = line.strip();
            if (l.isEmpty() || l.startsWith("#")) {
                continue;
            }
            if (l.startsWith("[") && l.endsWith("]")) {
                field = VocabularyField.ofSection(l.substring(1, l.length() - 1));
                if (field == null) {
                    throw new IllegalArgumentException("vocabulary line " + n + ": unknown section " + l
                            + " (expected [hold-types], [moves] or [styles])");
                }
                continue;
            }
            if (field == null) {
                throw new IllegalArgumentException("vocabulary line " + n + ": a term before any section");
            }
            int colon = l.indexOf(':');
            String term = key(colon < 0 ? l : l.substring(0, colon));
            if (!t.get(field).contains(term)) {
                t.get(field).add(term);
            }
            s.get(field).put(term, term);
            if (colon >= 0) {
                for (String spelling : l.substring(colon + 1).split(",")) {
                    if (!spelling.isBlank()) {
                        s.get(field).put(key(spelling), term);
                    }
                }
            }
        }
    }

    private static Vocabulary freeze(
            Map<VocabularyField, Map<String, String>> s, Map<VocabularyField, List<String>> t) {
        Map<VocabularyField, List<String>> frozen = new EnumMap<>(VocabularyField.class);
        t.forEach((f, list) -> frozen.put(f, List.copyOf(list)));
        return new Vocabulary(s, frozen);
    }
}
