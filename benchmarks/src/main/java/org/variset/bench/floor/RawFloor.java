package org.variset.bench.floor;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.Date;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.sql.Types;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.DoubleDocValuesField;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.document.NumericDocValuesField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesFacetField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.FSDirectory;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.store.Archive;

/**
 * The floor an import is measured against: walls, routes and holds files read once with Commons CSV, written with
 * plain JDBC batches into the tables of an empty archive (made by {@code variset init}, so the rows, constraints and
 * indexes are the same), and one Lucene document per route with the same kinds of fields and facets, in a single
 * streaming pass and one transaction. It checks nothing, keeps no change log and reports no errors beyond failing:
 * it is what the work costs with nothing of Variset's own around it.
 *
 * <p>Reads the routes and holds files side by side, so that it keeps nothing per route: it assumes that the holds
 * file lists routes in the order of the routes file, each route's holds together (as the generator writes them), and
 * fails otherwise.
 */
public final class RawFloor {
    private static final int BATCH = 1_000;
    private static final CSVFormat CSV =
            CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();

    private final Connection db;
    private final IndexWriter index;
    private final FacetsConfig facets = new FacetsConfig();
    private final GradeReader grades = GradeReader.standard();
    private final Map<String, Long> gyms = new HashMap<>();
    private final Map<String, Long> walls = new HashMap<>();
    private final Map<String, Long> resets = new HashMap<>();
    private final Map<String, Long> setters = new HashMap<>();
    private long routes;
    private long nextId = 1;
    private long holds;

    /** What a route's document needs from the routes file, kept until its holds have been read. */
    private static final class RouteDoc {
        final long id;
        final Document doc = new Document();
        final StringBuilder text = new StringBuilder();
        final Set<String> holdTerms = new LinkedHashSet<>();
        final Set<String> grips = new LinkedHashSet<>();
        final Set<String> sizes = new LinkedHashSet<>();
        final Set<String> types = new LinkedHashSet<>();
        int ordinal;

        RouteDoc(long id) {
            this.id = id;
        }
    }

    private RawFloor(Connection db, IndexWriter index) {
        this.db = db;
        this.index = index;
        for (String dim : new String[] {"move", "hold", "grip", "setter"}) {
            facets.setMultiValued(dim, true);
        }
    }

    /**
     * Imports {@code walls.csv}, {@code routes.csv} and {@code holds.csv} into a new archive folder.
     *
     * @param args the archive folder, then the three files
     */
    public static void main(String[] args) throws Exception {
        if (args.length != 4) {
            System.err.println("usage: RawFloor ARCHIVE_DIR walls.csv routes.csv holds.csv");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        if (!Archive.existsAt(dir)) {
            System.err.println("no archive at " + dir + " (make its tables first with: variset --archive DIR init)");
            System.exit(2);
        }
        long start = System.nanoTime();
        String url = "jdbc:h2:file:" + dir.toAbsolutePath().resolve("archive") + ";WRITE_DELAY=0";
        IndexWriterConfig config = new IndexWriterConfig(new StandardAnalyzer());
        try (Connection db = DriverManager.getConnection(url);
                IndexWriter index = new IndexWriter(FSDirectory.open(dir.resolve("index")), config)) {
            db.setAutoCommit(false);
            RawFloor f = new RawFloor(db, index);
            f.walls(Path.of(args[1]));
            f.routesWithHolds(Path.of(args[2]), Path.of(args[3]));
            long t = System.nanoTime();
            db.commit();
            long commitNs = System.nanoTime() - t;
            t = System.nanoTime();
            index.commit();
            System.out.printf(
                    Locale.ROOT,
                    "floor: database commit %.1f s, index commit %.1f s%n",
                    commitNs / 1e9,
                    (System.nanoTime() - t) / 1e9);
            System.out.printf(
                    Locale.ROOT,
                    "floor: %d routes, %d holds in %.1f s%n",
                    f.routes,
                    f.holds,
                    (System.nanoTime() - start) / 1e9);
        }
    }

    private CSVParser open(Path file) throws IOException {
        Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8);
        return CSV.parse(r);
    }

    private void walls(Path file) throws IOException, SQLException {
        try (CSVParser p = open(file);
                PreparedStatement w = db.prepareStatement("insert into wall (id, gym_id, name, discipline, angle_deg,"
                        + " height_m, width_m, cycle_days) values (?, ?, ?, ?, ?, ?, ?, ?)")) {
            for (CSVRecord r : p) {
                long id = nextId++;
                walls.put(r.get("gym") + "\u0000" + r.get("wall"), id);
                w.setLong(1, id);
                w.setLong(2, gym(r.get("gym")));
                w.setString(3, r.get("wall"));
                w.setString(4, r.get("discipline").toUpperCase(Locale.ROOT));
                FloorCells.setDouble(w, 5, r.get("angle_deg"));
                FloorCells.setDouble(w, 6, r.get("height_m"));
                FloorCells.setDouble(w, 7, r.get("width_m"));
                String cycle = r.get("cycle_days");
                if (cycle.isEmpty()) {
                    w.setNull(8, Types.INTEGER);
                } else {
                    w.setInt(8, Integer.parseInt(cycle));
                }
                w.addBatch();
            }
            w.executeBatch();
        }
    }

    private long gym(String name) throws SQLException {
        Long id = gyms.get(name);
        if (id == null) {
            id = nextId++;
            try (PreparedStatement g = db.prepareStatement("insert into gym (id, name, time_zone) values (?, ?, ?)")) {
                g.setLong(1, id);
                g.setString(2, name);
                g.setString(3, "UTC");
                g.executeUpdate();
            }
            gyms.put(name, id);
        }
        return id;
    }

    private void routesWithHolds(Path routesFile, Path holdsFile) throws IOException, SQLException {
        try (CSVParser p = open(routesFile);
                CSVParser hp = open(holdsFile);
                PreparedStatement reset = db.prepareStatement(
                        "insert into reset (id, gym_id, wall_id, label, reset_on)" + " values (?, ?, ?, ?, ?)");
                PreparedStatement setter = db.prepareStatement("insert into setter (id, name) values (?, ?)");
                PreparedStatement route = db.prepareStatement("insert into route (id, gym_id, wall_id, reset_id, "
                        + "label, set_on, stripped_on, discipline, grade_text, grade_scale, grade_ircra, color, "
                        + "angle_deg, moves, styles, move_difficulty, notes) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, "
                        + "?, ?, ?, ?, ?, ?)");
                PreparedStatement routeSetter = db.prepareStatement(
                        "insert into route_setter (route_id, setter_id, " + "ord) values (?, ?, ?)");
                PreparedStatement hold = db.prepareStatement("insert into hold_placement (id, route_id, ordinal, seq, "
                        + "role, hold_type, hold_size, grip_deg, hold_ref, x_m, y_m) values (?, ?, ?, ?, ?, ?, ?, ?, "
                        + "?, ?, ?)")) {
            java.util.Iterator<CSVRecord> holdRows = hp.iterator();
            CSVRecord next = holdRows.hasNext() ? holdRows.next() : null;
            int n = 0;
            for (CSVRecord r : p) {
                String gymName = r.get("gym");
                String wallName = r.get("wall");
                long gym = gym(gymName);
                long wall = walls.get(gymName + "\u0000" + wallName);
                LocalDate setOn = LocalDate.parse(r.get("set_on"));
                Long resetId = resetId(reset, gymName, gym, wall, wallName, setOn);
                Discipline discipline = Discipline.parse(r.get("discipline"));
                Grade grade = grade(r, discipline);
                long id = nextId++;
                String label = r.get("route");
                String stripped = r.get("stripped_on");
                List<String> moves = FloorCells.list(r.get("moves"));
                List<String> styles = FloorCells.list(r.get("styles"));
                bindRoute(route, r, id, gym, wall, resetId, label, setOn, stripped, discipline, grade, moves, styles);
                route.addBatch();
                List<String> names = FloorCells.list(r.get("setters"));
                link(setter, routeSetter, id, names);
                if (++n % BATCH == 0) {
                    executeBatches(route, routeSetter);
                }
                routes++;
                RouteDoc rd = document(
                        id, gymName, wallName, label, r, discipline, grade, setOn, stripped, names, moves, styles);
                String key = key(gymName, wallName, label, r.get("set_on"));
                while (sameRoute(next, key)) {
                    hold(hold, rd, next);
                    if (holds % BATCH == 0) {
                        executeBatches(route, routeSetter, hold);
                    }
                    next = holdRows.hasNext() ? holdRows.next() : null;
                }
                finish(rd);
            }
            executeBatches(route, routeSetter, hold);
            if (next != null) {
                throw new IllegalStateException(holdsFile + " line " + hp.getCurrentLineNumber() + ": a hold of a "
                        + "route that is not next in " + routesFile + " (the floor reads both files side by side)");
            }
        }
    }

    private Grade grade(CSVRecord r, Discipline discipline) {
        String scale = r.get("grade_scale");
        return grades.read(r.get("grade"), discipline, scale.isEmpty() ? null : GradeScale.parse(scale), Set.of());
    }

    /** Sends the batches in this order: parents before children. */
    private static void executeBatches(PreparedStatement... statements) throws SQLException {
        for (PreparedStatement s : statements) {
            s.executeBatch();
        }
    }

    private Long resetId(PreparedStatement reset, String gymName, long gym, long wall, String wallName, LocalDate setOn)
            throws SQLException {
        String resetLabel = wallName + " " + setOn;
        Long resetId = resets.get(gymName + "\u0000" + resetLabel);
        if (resetId == null) {
            resetId = nextId++;
            resets.put(gymName + "\u0000" + resetLabel, resetId);
            reset.setLong(1, resetId);
            reset.setLong(2, gym);
            reset.setLong(3, wall);
            reset.setString(4, resetLabel);
            reset.setDate(5, Date.valueOf(setOn));
            reset.executeUpdate();
        }
        return resetId;
    }

    private static void bindRoute(
            PreparedStatement route,
            CSVRecord r,
            long id,
            long gym,
            long wall,
            long resetId,
            String label,
            LocalDate setOn,
            String stripped,
            Discipline discipline,
            Grade grade,
            List<String> moves,
            List<String> styles)
            throws SQLException {
        route.setLong(1, id);
        route.setLong(2, gym);
        route.setLong(3, wall);
        route.setLong(4, resetId);
        route.setString(5, label);
        route.setDate(6, Date.valueOf(setOn));
        route.setDate(7, stripped.isEmpty() ? null : Date.valueOf(LocalDate.parse(stripped)));
        route.setString(8, discipline.name());
        route.setString(9, grade.text());
        route.setString(10, grade.scale().name());
        route.setDouble(11, grade.ircra());
        route.setString(12, FloorCells.emptyToNull(r.get("color")));
        FloorCells.setDouble(route, 13, r.get("angle_deg"));
        route.setString(14, FloorCells.json(moves));
        route.setString(15, FloorCells.json(styles));
        route.setString(16, FloorCells.json(FloorCells.list(r.get("move_difficulty"))));
        route.setString(17, FloorCells.emptyToNull(r.get("notes")));
    }

    private void link(PreparedStatement setter, PreparedStatement routeSetter, long id, List<String> names)
            throws SQLException {
        for (int i = 0; i < names.size(); i++) {
            Long s = setters.get(names.get(i));
            if (s == null) {
                s = nextId++;
                setters.put(names.get(i), s);
                setter.setLong(1, s);
                setter.setString(2, names.get(i));
                setter.executeUpdate();
            }
            routeSetter.setLong(1, id);
            routeSetter.setLong(2, s);
            routeSetter.setInt(3, i);
            routeSetter.addBatch();
        }
    }

    private RouteDoc document(
            long id,
            String gym,
            String wall,
            String label,
            CSVRecord r,
            Discipline discipline,
            Grade grade,
            LocalDate setOn,
            String stripped,
            List<String> setterNames,
            List<String> moves,
            List<String> styles) {
        RouteDoc rd = new RouteDoc(id);
        Document d = rd.doc;
        d.add(new StringField("id", Long.toString(id), Field.Store.YES));
        keyword(d, "gym", gym);
        keyword(d, "wall", wall);
        keyword(d, "route", label);
        keyword(d, "color", r.get("color"));
        keyword(d, "discipline", discipline.word());
        keyword(d, "grade", grade.text());
        setterNames.forEach(s -> keyword(d, "setter", s));
        d.add(new DoublePoint("ircra", grade.ircra()));
        d.add(new DoubleDocValuesField("ircra", grade.ircra()));
        d.add(new LongPoint("set", setOn.toEpochDay()));
        d.add(new NumericDocValuesField("set", setOn.toEpochDay()));
        d.add(new LongPoint(
                "stripped",
                stripped.isEmpty() ? Long.MAX_VALUE : LocalDate.parse(stripped).toEpochDay()));
        String angle = r.get("angle_deg");
        if (!angle.isEmpty()) {
            d.add(new DoublePoint("angle", Double.parseDouble(angle)));
        }
        d.add(new SortedSetDocValuesFacetField("wall", wall));
        setterNames.forEach(s -> d.add(new SortedSetDocValuesFacetField("setter", s)));
        for (String m : moves) {
            d.add(new StringField("move", FloorCells.squash(m), Field.Store.NO));
            d.add(new SortedSetDocValuesFacetField("move", m));
            rd.text.append(' ').append(m);
        }
        for (String s : styles) {
            d.add(new StringField("style", FloorCells.squash(s), Field.Store.NO));
            rd.text.append(' ').append(s);
        }
        String notes = r.get("notes");
        if (!notes.isEmpty()) {
            d.add(new TextField("notes", notes, Field.Store.NO));
        }
        rd.text
                .append(' ')
                .append(label)
                .append(' ')
                .append(wall)
                .append(' ')
                .append(grade.text())
                .append(' ')
                .append(r.get("color"))
                .append(' ')
                .append(String.join(" ", setterNames))
                .append(' ')
                .append(notes);
        return rd;
    }

    private static boolean sameRoute(CSVRecord hold, String key) {
        return hold != null
                && key(hold.get("gym"), hold.get("wall"), hold.get("route"), hold.get("set_on"))
                        .equals(key);
    }

    private static String key(String gym, String wall, String route, String setOn) {
        return gym + "\u0000" + wall + "\u0000" + route + "\u0000" + setOn;
    }

    private void hold(PreparedStatement hold, RouteDoc rd, CSVRecord r) throws SQLException {
        String role = r.get("role").toUpperCase(Locale.ROOT);
        String type = r.get("type");
        String size = r.get("size");
        List<String> grips = FloorCells.list(r.get("grip"));
        hold.setLong(1, nextId++);
        hold.setLong(2, rd.id);
        hold.setInt(3, rd.ordinal++);
        String seq = r.get("seq");
        if (seq.isEmpty()) {
            hold.setNull(4, Types.INTEGER);
        } else {
            hold.setInt(4, Integer.parseInt(seq));
        }
        hold.setString(5, role);
        hold.setString(6, type);
        hold.setString(7, size.isEmpty() ? null : size.toUpperCase(Locale.ROOT));
        hold.setString(8, grips.isEmpty() ? null : "[" + String.join(",", grips) + "]");
        hold.setString(9, FloorCells.emptyToNull(r.get("hold_ref")));
        FloorCells.setDouble(hold, 10, r.get("x_m"));
        FloorCells.setDouble(hold, 11, r.get("y_m"));
        hold.addBatch();
        holds++;
        String key = FloorCells.squash(type);
        rd.holdTerms.add(key);
        rd.types.add(type);
        if (!size.isEmpty()) {
            rd.sizes.add(size.toLowerCase(Locale.ROOT));
        }
        if (!role.equals("FOOT")) {
            for (String g : grips) {
                int sector = 45 * Math.floorMod((int) Math.round(Double.parseDouble(g) / 45.0), 8);
                rd.holdTerms.add(key + "@" + sector);
                rd.grips.add(Integer.toString(sector));
            }
        }
    }

    private void finish(RouteDoc rd) throws IOException {
        Document d = rd.doc;
        rd.holdTerms.forEach(t -> d.add(new StringField("hold", t, Field.Store.NO)));
        rd.grips.forEach(g -> {
            d.add(new StringField("grip", g, Field.Store.NO));
            d.add(new SortedSetDocValuesFacetField("grip", g));
        });
        rd.sizes.forEach(s -> d.add(new StringField("size", s, Field.Store.NO)));
        rd.types.forEach(t -> {
            d.add(new SortedSetDocValuesFacetField("hold", t));
            rd.text.append(' ').append(t);
        });
        d.add(new TextField("text", rd.text.toString(), Field.Store.NO));
        index.addDocument(facets.build(d));
    }

    private static void keyword(Document d, String field, String value) {
        if (value != null && !value.isBlank()) {
            d.add(new StringField(field, value.strip().toLowerCase(Locale.ROOT), Field.Store.NO));
        }
    }
}
