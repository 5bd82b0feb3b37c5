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
     */
    public record Item(String part, String name, boolean ok, String detail) {}

    /** True when every check passed. */
    public boolean healthy() {
        return items.stream().allMatch(Item::ok);
    }

    /** True when every database check passed (index problems are repaired by rebuilding it). */
    public boolean databaseHealthy() {
        return items.stream().filter(i -> i.part().equals("database")).allMatch(Item::ok);
    }
}
