package org.variset.archive.check;

import java.util.List;

/**
 * What a check found.
 *
 * @param items each check, in the order run
 */
public record CheckReport(List<Item> items) {

    /**
     * One check.
     *
     * @param part {@code database} or {@code index}
     * @param name what was checked
     * @param ok whether it passed
     * @param detail what was found, in words
     * @param note true when it did not pass but nothing is damaged: the index is only behind the database, or not
     *     built yet, and the next search brings it up to date by itself
     */
    public record Item(String part, String name, boolean ok, String detail, boolean note) {
        /** A check that passed or found a problem. */
        public Item(String part, String name, boolean ok, String detail) {
            this(part, name, ok, detail, false);
        }

        /** True when it found a problem: not passed, and not only a note. */
        public boolean problem() {
            return !ok && !note;
        }
    }

    /** True when no check found a problem (notes are not problems). */
    public boolean healthy() {
        return items.stream().noneMatch(Item::problem);
    }

    /** True when some check left a note: the index is behind or missing and will catch up. */
    public boolean hasNotes() {
        return items.stream().anyMatch(Item::note);
    }

    /** True when every database check passed (index problems are repaired by rebuilding it). */
    public boolean databaseHealthy() {
        return items.stream().filter(i -> i.part().equals("database")).noneMatch(Item::problem);
    }
}
