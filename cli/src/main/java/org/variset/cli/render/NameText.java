package org.variset.cli.render;

import java.util.ArrayList;
import java.util.List;
import org.variset.app.names.ListResets;
import org.variset.app.names.ListSetters;
import org.variset.app.names.ListWalls;
import org.variset.archive.read.NameListings;
import org.variset.reports.format.FigureFormat;

/** The listings of walls, resets and setters as text: a heading, then a table with its columns aligned. */
public final class NameText {
    private NameText() {}

    /** The walls. */
    public static String walls(ListWalls.Result r) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("wall", "discipline", "angle", "cycle", "resets", "last reset", "routes up"));
        for (NameListings.WallLine w : r.walls()) {
            rows.add(List.of(
                    w.name(),
                    w.discipline() == null ? "–" : w.discipline().word(),
                    w.angleDeg() == null ? "–" : number(w.angleDeg()) + "°",
                    w.cycleDays() == null ? "–" : w.cycleDays() + " days",
                    String.valueOf(w.resets()),
                    w.lastReset() == null ? "never" : w.lastReset().toString(),
                    String.valueOf(w.routesUp())));
        }
        return FigureFormat.count(r.walls().size(), "wall") + " of " + r.gym() + " (routes up on " + r.on() + ")\n"
                + table(rows);
    }

    /** The resets. */
    public static String resets(ListResets.Result r) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("reset", "wall", "day", "routes", "still up"));
        for (NameListings.ResetLine x : r.resets()) {
            rows.add(List.of(
                    x.label(),
                    x.wall(),
                    x.resetOn().toString(),
                    String.valueOf(x.routes()),
                    String.valueOf(x.stillUp())));
        }
        String of = r.wall() == null ? r.gym() : r.wall() + " (" + r.gym() + ")";
        return FigureFormat.count(r.resets().size(), "reset") + " of " + of + ", newest first (still up on " + r.on()
                + ")\n" + table(rows);
    }

    /** The setters. */
    public static String setters(ListSetters.Result r) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("setter", "routes", "first set", "last set"));
        for (NameListings.SetterLine s : r.setters()) {
            rows.add(List.of(
                    s.name(),
                    String.valueOf(s.routes()),
                    s.firstSetOn().toString(),
                    s.lastSetOn().toString()));
        }
        return FigureFormat.count(r.setters().size(), "setter") + " who set in " + r.gym() + "\n" + table(rows);
    }

    private static String number(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    /** Rows of cells, the first the header, each column as wide as its widest cell; numbers to the right. */
    private static String table(List<List<String>> rows) {
        if (rows.size() == 1) {
            return "  (none)\n";
        }
        int[] width = new int[rows.get(0).size()];
        for (List<String> row : rows) {
            for (int i = 0; i < row.size(); i++) {
                width[i] = Math.max(width[i], row.get(i).length());
            }
        }
        StringBuilder b = new StringBuilder();
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder(" ");
            for (int i = 0; i < row.size(); i++) {
                String cell = row.get(i);
                String pad = " ".repeat(width[i] - cell.length());
                boolean right = i > 0 && rows.get(1).get(i).matches("[0-9]+");
                line.append(' ').append(right ? pad + cell : cell + pad).append(' ');
            }
            b.append(line.toString().stripTrailing()).append('\n');
        }
        return b.toString();
    }
}
