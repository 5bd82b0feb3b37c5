package org.variset.archive.search;

import java.text.Normalizer;
import java.util.Collections;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.WeakHashMap;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;

/**
 * Keys under which moves, styles and hold types are indexed and searched, so that every way of writing a term finds
 * it: case, spaces and hyphens do not count ({@code heel hook}, {@code heel-hook}, {@code heelhook}), a plural
 * {@code s} or {@code es} does not count ({@code heel hooks}), and every spelling the vocabulary lists (the gym's own
 * included) leads to its term's key ({@code hooky heel} to {@code heelhook}).
 */
final class TermKeys {
    /** Keys per vocabulary, built once: indexing and every query ask for them. */
    private static final Map<Vocabulary, TermKeys> CACHE = Collections.synchronizedMap(new WeakHashMap<>());

    private final Map<VocabularyField, Map<String, String>> byKey = new HashMap<>();

    /** The keys of a vocabulary. */
    static TermKeys of(Vocabulary v) {
        return CACHE.computeIfAbsent(v, TermKeys::new);
    }

    private TermKeys(Vocabulary v) {
        for (VocabularyField f : VocabularyField.values()) {
            Map<String, String> m = new HashMap<>();
            v.terms(f).forEach(t -> m.put(squash(t), t));
            v.spellings(f).forEach((spelling, term) -> m.put(squash(spelling), term));
            byKey.put(f, m);
        }
    }

    /** The key of a text in a field. */
    String key(VocabularyField f, String text) {
        String term = term(f, text);
        return term != null ? squash(term) : singular(squash(text));
    }

    /** The vocabulary term a text spells in a field (plurals included), or null. */
    String term(VocabularyField f, String text) {
        Map<String, String> m = byKey.get(f);
        String s = squash(text);
        String t = m.get(s);
        if (t == null && s.endsWith("es")) {
            t = m.get(s.substring(0, s.length() - 2));
        }
        if (t == null && s.endsWith("s")) {
            t = m.get(s.substring(0, s.length() - 1));
        }
        return t;
    }

    /** Lower case, NFKC, letters and digits only: {@code Heel-Hook} to {@code heelhook}. */
    static String squash(String text) {
        String n = Normalizer.normalize(text == null ? "" : text, Normalizer.Form.NFKC)
                .toLowerCase(Locale.ROOT);
        StringBuilder b = new StringBuilder(n.length());
        n.codePoints().filter(Character::isLetterOrDigit).forEach(b::appendCodePoint);
        return b.toString();
    }

    /** A keyword as indexed: NFC, trimmed, lower case, single spaces ({@code Lantern Rock} to {@code lantern rock}). */
    static String keyword(String text) {
        return Normalizer.normalize(text == null ? "" : text, Normalizer.Form.NFC)
                .strip()
                .replaceAll("\\s+", " ")
                .toLowerCase(Locale.ROOT);
    }

    private static String singular(String s) {
        return s.length() > 3 && s.endsWith("s") && !s.endsWith("ss") ? s.substring(0, s.length() - 1) : s;
    }
}
