package org.variset.archive.vocabulary;

import java.util.Locale;

/** The fields that have a vocabulary. A spelling maps to a term only within its own field. */
public enum VocabularyField {
    /** Hold types (jug, crimp, ...). */
    HOLD_TYPES("hold-types"),
    /** Move descriptors (heel hook, dyno, ...). */
    MOVES("moves"),
    /** Style tags (power, technical, ...). */
    STYLES("styles");

    private final String section;

    VocabularyField(String section) {
        this.section = section;
    }

    /** The section name in vocabulary files. */
    public String section() {
        return section;
    }

    /** The field of a section name, or null. */
    static VocabularyField ofSection(String name) {
        for (VocabularyField f : values()) {
            if (f.section.equals(name.strip().toLowerCase(Locale.ROOT))) {
                return f;
            }
        }
        return null;
    }
}
