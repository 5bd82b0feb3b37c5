package org.variset.imports.export;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.hibernate.Session;
import org.variset.archive.file.AtomicFile;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Unknown;
import org.variset.archive.gym.Wall;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.imports.table.TableKind;

/**
 * Exports one gym's walls, routes and holds, optionally limited to a date window and a wall. Files are written
 * beside their target and moved into place only when complete, so a failure leaves nothing half-written.
 */
public final class ArchiveExporter {

    /**
     * What to export.
     *
     * @param gym the gym's name
     * @param from first set_on included, or null
     * @param to last set_on included, or null
     * @param wall only this wall, or null
     */
    public record Selection(String gym, LocalDate from, LocalDate to, String wall) {
        /** Checks the gym is named. */
        public Selection {
            Objects.requireNonNull(gym, "gym");
        }
    }

    /**
     * What was written.
     *
     * @param files the files, in order
     * @param walls walls exported
     * @param routes routes exported
     * @param holds hold placements exported
     */
    public record Result(List<Path> files, int walls, int routes, int holds) {}

    private final Archive archive;

    /** An exporter of an open archive. */
    public ArchiveExporter(Archive archive) {
        this.archive = archive;
    }

    /**
     * Writes the selection.
     *
     * @param out a folder for CSV (created if needed), a file for XLSX and JSON
     * @param force replace files that exist
     * @throws IllegalArgumentException for an unknown gym or wall, or a file that exists without force
     */
    public Result export(Selection sel, ExportFormat format, Path out, boolean force) {
        List<ExportTable> tables = archive.fromTransaction(s -> tables(s, sel));
        List<Path> targets = format == ExportFormat.CSV
                ? tables.stream().map(t -> out.resolve(t.name() + ".csv")).toList()
                : List.of(out);
        try {
            Files.createDirectories(
                    format == ExportFormat.CSV ? out : out.toAbsolutePath().getParent());
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot create the folder for " + out + ": " + e.getMessage(), e);
        }
        AtomicFile.checkWritable(targets, force);
        if (format == ExportFormat.CSV) {
            for (int i = 0; i < tables.size(); i++) {
                ExportTable t = tables.get(i);
                AtomicFile.writeThrough(targets.get(i), force, tmp -> CsvExport.write(t, tmp));
            }
        } else if (format == ExportFormat.XLSX) {
            AtomicFile.writeThrough(out, force, tmp -> XlsxExport.write(tables, tmp));
        } else {
            AtomicFile.writeThrough(out, force, tmp -> JsonExport.write(sel.gym(), tables, tmp));
        }
        return new Result(
                targets,
                tables.get(0).rows().size(),
                tables.get(1).rows().size(),
                tables.get(2).rows().size());
    }

    private static List<ExportTable> tables(Session s, Selection sel) {
        ArchiveQueries q = new ArchiveQueries(s);
        Gym gym = q.gym(sel.gym())
                .orElseThrow(() ->
                        Unknown.gym(sel.gym(), q.gyms().stream().map(Gym::name).toList()));
        if (sel.wall() != null && q.wall(gym, sel.wall()).isEmpty()) {
            throw Unknown.wall(
                    gym.name(),
                    sel.wall(),
                    q.walls(gym).stream().map(Wall::name).toList());
        }
        LocalDate from = sel.from() == null ? LocalDate.of(1, 1, 1) : sel.from();
        LocalDate to = sel.to() == null ? LocalDate.of(9999, 12, 31) : sel.to();
        List<Route> routes = q.routesSetBetween(gym, from, to).stream()
                .filter(r -> sel.wall() == null || r.wall().name().equals(sel.wall()))
                .toList();
        Set<Wall> walls = new LinkedHashSet<>();
        if (sel.from() == null && sel.to() == null) {
            q.walls(gym).stream()
                    .filter(w -> sel.wall() == null || w.name().equals(sel.wall()))
                    .forEach(walls::add);
        }
        routes.forEach(r -> walls.add(r.wall()));
        ExportTable wallTable = new ExportTable("walls", TableKind.WALLS.columns());
        walls.forEach(w -> wallTable.add(wallCells(w), w.extraFields()));
        ExportTable routeTable = new ExportTable("routes", TableKind.ROUTES.columns());
        ExportTable holdTable = new ExportTable("holds", TableKind.HOLDS.columns());
        for (Route r : routes) {
            routeTable.add(routeCells(r), r.extraFields());
            for (HoldPlacement h : r.holds()) {
                holdTable.add(holdCells(r, h), h.spec().extraFields());
            }
        }
        return List.of(wallTable, routeTable, holdTable);
    }

    private static Map<String, Object> wallCells(Wall w) {
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("gym", w.gym().name());
        c.put("wall", w.name());
        c.put("discipline", w.discipline() == null ? null : w.discipline().word());
        c.put("angle_deg", num(w.angleDeg()));
        c.put("height_m", num(w.heightM()));
        c.put("width_m", num(w.widthM()));
        c.put("cycle_days", w.cycleDays() == null ? null : new ExportTable.Num(w.cycleDays()));
        return c;
    }

    private static Map<String, Object> routeCells(Route r) {
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("gym", r.gym().name());
        c.put("wall", r.wall().name());
        c.put("route", r.label());
        c.put("set_on", r.setOn().toString());
        c.put("discipline", r.discipline().word());
        c.put("grade", r.gradeText());
        c.put("grade_scale", r.gradeScale().word());
        c.put("stripped_on", r.strippedOn() == null ? null : r.strippedOn().toString());
        c.put("reset", r.reset().label());
        c.put("setters", r.setters().stream().map(Setter::name).toList());
        c.put("color", r.color());
        c.put("angle_deg", num(r.angleDeg()));
        c.put("moves", List.copyOf(r.moves()));
        c.put("styles", List.copyOf(r.styles()));
        c.put(
                "move_difficulty",
                r.moveDifficulty().stream()
                        .map(d -> (Object) new ExportTable.Num(d))
                        .toList());
        c.put("notes", r.notes());
        return c;
    }

    private static Map<String, Object> holdCells(Route r, HoldPlacement h) {
        Map<String, Object> c = new LinkedHashMap<>();
        c.put("gym", r.gym().name());
        c.put("route", r.label());
        c.put("set_on", r.setOn().toString());
        c.put("wall", r.wall().name());
        c.put("seq", h.seq() == null ? null : new ExportTable.Num(h.seq()));
        c.put("role", h.role().word());
        c.put("type", h.type());
        c.put("size", h.size() == null ? null : h.size().word());
        c.put("grip", new ArrayList<Object>(h.grips()));
        c.put("hold_ref", h.holdRef());
        c.put("x_m", num(h.xM()));
        c.put("y_m", num(h.yM()));
        return c;
    }

    private static ExportTable.Num num(Double v) {
        return v == null ? null : new ExportTable.Num(v);
    }
}
