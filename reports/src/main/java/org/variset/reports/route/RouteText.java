package org.variset.reports.route;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.GripDirection;

/** A route in words: heading, moves and styles, holds by type with the directions their grips face. */
public final class RouteText {
    private RouteText() {}

    /** {@code C2 · V5 · Cave, Lantern Rock · set 2026-02-07, up · Ada Quill, Bo Renner}. */
    public static String heading(RouteRecord r) {
        return r.label() + " · " + r.gradeText() + " · " + r.wall() + ", " + r.gym() + " · set " + r.setOn()
                + (r.strippedOn() == null ? ", up" : ", stripped " + r.strippedOn())
                + (r.setters().isEmpty() ? "" : " · " + String.join(", ", r.setters()));
    }

    /** {@code moves: heel hook > dyno; styles: power}, or empty when neither is recorded. */
    public static String moves(RouteRecord r) {
        List<String> parts = new ArrayList<>();
        if (!r.moves().isEmpty()) {
            parts.add("moves: " + String.join(" > ", r.moves()));
        }
        if (!r.styles().isEmpty()) {
            parts.add("styles: " + String.join(", ", r.styles()));
        }
        return String.join("; ", parts);
    }

    /** {@code holds: 3 crimp (up 2, up-right 1), 2 jug (up), 1 volume}, or {@code holds: none recorded}. */
    public static String holds(RouteRecord r) {
        if (r.holds().isEmpty()) {
            return "holds: none recorded";
        }
        Map<String, Integer> count = new LinkedHashMap<>();
        Map<String, Map<String, Integer>> directions = new LinkedHashMap<>();
        for (HoldRecord h : r.holds()) {
            count.merge(h.type(), 1, Integer::sum);
            for (double g : h.grips()) {
                directions
                        .computeIfAbsent(h.type(), k -> new LinkedHashMap<>())
                        .merge(GripDirection.sectorWord(GripDirection.sector(g)), 1, Integer::sum);
            }
        }
        List<String> parts = new ArrayList<>();
        count.entrySet().stream()
                .sorted(Map.Entry.<String, Integer>comparingByValue().reversed())
                .forEach(e -> {
                    Map<String, Integer> d = directions.get(e.getKey());
                    String dirs = d == null
                            ? ""
                            : " ("
                                    + String.join(
                                            ", ",
                                            d.entrySet().stream()
                                                    .map(x -> x.getValue() > 1
                                                            ? x.getKey() + " " + x.getValue()
                                                            : x.getKey())
                                                    .toList())
                                    + ")";
                    parts.add(e.getValue() + " " + e.getKey() + dirs);
                });
        return "holds: " + String.join(", ", parts);
    }
}
