package org.variset.imports.table;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Stream;

/** The three tables of the interchange formats, with their columns (docs/spec/interchange.md). */
public enum TableKind {
    /** routes.csv: one row per route or boulder problem. */
    ROUTES(
            "routes",
            List.of("gym", "wall", "route", "set_on", "discipline", "grade"),
            List.of(
                    "grade_scale",
                    "stripped_on",
                    "reset",
                    "setters",
                    "color",
                    "angle_deg",
                    "moves",
                    "styles",
                    "move_difficulty",
                    "notes")),
    /** holds.csv: one row per hold placement. */
    HOLDS(
            "holds",
            List.of("gym", "route", "set_on", "type"),
            List.of("wall", "seq", "role", "size", "grip", "hold_ref", "x_m", "y_m")),
    /** walls.csv: one row per wall. */
    WALLS("walls", List.of("gym", "wall"), List.of("discipline", "angle_deg", "height_m", "width_m", "cycle_days"));

    private final String word;
    private final List<String> required;
    private final List<String> optional;
    private final Set<String> known;
    /** The nearest known column of a name that is not one (see {@link #nearest}), remembered per name. */
    private final Map<String, Optional<String>> nearest = new ConcurrentHashMap<>();

    TableKind(String word, List<String> required, List<String> optional) {
        this.word = word;
        this.required = required;
        this.optional = optional;
        this.known = Set.copyOf(columns(required, optional));
    }

    private static List<String> columns(List<String> required, List<String> optional) {
        return Stream.concat(required.stream(), optional.stream()).toList();
    }

    /** The table's name, also the XLSX sheet name. */
    public String word() {
        return word;
    }

    /** The columns a file of this table must have. */
    public List<String> required() {
        return required;
    }

    /** The columns in the order the spec lists them: required first, then optional. */
    public List<String> columns() {
        return columns(required, optional);
    }

    /** True for a column the spec defines for this table. */
    public boolean knows(String column) {
        return known.contains(column);
    }

    /**
     * The known column within two edits of an unknown one ({@link Columns#nearest}), or null; remembered, since it is
     * asked for every row of a file with an extra column.
     */
    public String nearest(String column) {
        Optional<String> n = nearest.get(column);
        if (n == null) {
            n = Optional.ofNullable(Columns.nearest(Columns.normalise(column), columns()));
            if (nearest.size() < 10_000) {
                nearest.put(column, n);
            }
        }
        return n.orElse(null);
    }

    /**
     * Which table a file holds: by its name when that names one (routes.csv, holds-march.csv), else by the header
     * columns it shares with each table.
     */
    public static TableKind detect(String fileName, Set<String> header) {
        String name = fileName.toLowerCase(Locale.ROOT);
        for (TableKind k : values()) {
            if (name.contains(k.word) || name.contains(k.word.substring(0, k.word.length() - 1))) {
                return k;
            }
        }
        if (header.contains("type") || header.contains("grip") || header.contains("hold_ref")) {
            return HOLDS;
        }
        if (header.contains("grade") || header.contains("route")) {
            return ROUTES;
        }
        return WALLS;
    }
}
