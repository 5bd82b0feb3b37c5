package org.variset.archive.grade;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The IRCRA comparison table: which grade of each scale sits on which level of the axis.
 *
 * <p>Loaded once from {@code ircra-table.csv}. A grade that appears on several rows spans those levels; its
 * value on the axis is the midpoint of the first and last of them (docs/spec/grades.md: "V2 spans 15 and 16: 15.5").
 *
 * <p>Reference: Draper N. et al. (2015), Sports Technology 8(3-4):88-94, DOI 10.1080/19346182.2015.1107081.
 * The V, Font and UIAA columns are a secondary transcription and are treated as ranges.
 */
public final class GradeTable {

    /** Lowest level of the table. */
    public static final int FIRST_LEVEL = 1;
    /** Highest level of the table; grades above it extend the axis by one level per step. */
    public static final int LAST_LEVEL = 32;

    private static final GradeTable STANDARD = load();

    private final Map<GradeScale, Map<String, int[]>> spans;
    private final Map<GradeScale, List<List<String>>> rows;

    private GradeTable(Map<GradeScale, Map<String, int[]>> spans, Map<GradeScale, List<List<String>>> rows) {
        this.spans = spans;
        this.rows = rows;
    }

    /** The table as published (see the class comment for its source). */
    public static GradeTable standard() {
        return STANDARD;
    }

    /**
     * The first and last level on which a grade of the table appears.
     *
     * @param scale a scale other than IRCRA
     * @param canonical the grade in canonical spelling ({@code V2}, {@code 6A+}, {@code 5.10a}, {@code 7-})
     * @return {@code {first, last}}, or null when the table does not list that grade
     */
    public int[] span(GradeScale scale, String canonical) {
        int[] s = spans.getOrDefault(scale, Map.of()).get(canonical);
        return s == null ? null : s.clone();
    }

    /** True when the table lists the grade on some row. */
    public boolean lists(GradeScale scale, String canonical) {
        return spans.getOrDefault(scale, Map.of()).containsKey(canonical);
    }

    /** Every grade of a scale that the table lists, from easiest to hardest. */
    public List<String> grades(GradeScale scale) {
        return List.copyOf(spans.getOrDefault(scale, Map.of()).keySet());
    }

    /**
     * The grades of one scale written on one row of the table.
     *
     * @param level a level from {@link #FIRST_LEVEL} to {@link #LAST_LEVEL}
     * @return the grades in the order the table gives them; empty where the column has no entry
     */
    public List<String> gradesAt(GradeScale scale, int level) {
        if (level < FIRST_LEVEL || level > LAST_LEVEL || !rows.containsKey(scale)) {
            return List.of();
        }
        return rows.get(scale).get(level - FIRST_LEVEL);
    }

    private static GradeTable load() {
        try (InputStream in = GradeTable.class.getResourceAsStream("ircra-table.csv")) {
            if (in == null) {
                throw new IllegalStateException("ircra-table.csv is missing from the classpath");
            }
            return parse(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static GradeTable parse(BufferedReader reader) throws IOException {
        GradeScale[] columns = {GradeScale.YDS, GradeScale.FRENCH, GradeScale.UIAA, GradeScale.FONT, GradeScale.V};
        Map<GradeScale, Map<String, int[]>> spans = new EnumMap<>(GradeScale.class);
        Map<GradeScale, List<List<String>>> rows = new EnumMap<>(GradeScale.class);
        for (GradeScale s : columns) {
            spans.put(s, new LinkedHashMap<>());
            rows.put(s, new ArrayList<>());
        }
        boolean header = true;
        for (String line; (line = reader.readLine()) != null; ) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            if (header) {
                header = false;
                continue;
            }
            String[] cells = line.split(",", -1);
            int level = Integer.parseInt(cells[0]);
            for (int c = 0; c < columns.length; c++) {
                List<String> here = new ArrayList<>();
                for (String g : cells[c + 1].split("\\|")) {
                    if (!g.isEmpty()) {
                        here.add(g);
                        spans.get(columns[c]).merge(g, new int[] {level, level}, (old, now) ->
                                new int[] {Math.min(old[0], level), Math.max(old[1], level)});
                    }
                }
                rows.get(columns[c]).add(Collections.unmodifiableList(here));
            }
        }
        return new GradeTable(spans, rows);
    }
}
