package org.variset.imports.export;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/** Writes the JSON document: the gym, its walls, and each route with its holds nested (docs/spec/interchange.md). */
final class JsonExport {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonExport() {}

    static void write(String gym, List<ExportTable> tables, Path file) throws IOException {
        ExportTable walls = tables.get(0);
        ExportTable routes = tables.get(1);
        ExportTable holds = tables.get(2);
        Map<List<Object>, List<Map<String, Object>>> holdsByRoute = new LinkedHashMap<>();
        for (Map<String, Object> h : holds.rows()) {
            holdsByRoute
                    .computeIfAbsent(List.of(h.get("wall"), h.get("route"), h.get("set_on")), k -> new ArrayList<>())
                    .add(plain(holds, h, List.of("gym", "route", "set_on", "wall")));
        }
        try (JsonGenerator g = MAPPER.getFactory().createGenerator(file.toFile(), JsonEncoding.UTF8)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("gym", gym);
            g.writeArrayFieldStart("walls");
            for (Map<String, Object> w : walls.rows()) {
                MAPPER.writeValue(g, plain(walls, w, List.of("gym")));
            }
            g.writeEndArray();
            g.writeArrayFieldStart("routes");
            for (Map<String, Object> r : routes.rows()) {
                Map<String, Object> out = plain(routes, r, List.of("gym"));
                out.put(
                        "holds",
                        holdsByRoute.getOrDefault(List.of(r.get("wall"), r.get("route"), r.get("set_on")), List.of()));
                MAPPER.writeValue(g, out);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
    }

    /** A row as JSON values: numbers as numbers, lists as arrays, empty cells left out. */
    private static Map<String, Object> plain(ExportTable t, Map<String, Object> row, List<String> leaveOut) {
        Map<String, Object> out = new LinkedHashMap<>();
        for (String column : t.header()) {
            Object v = t.cell(row, column);
            if (v == null || leaveOut.contains(column) || v instanceof List<?> l && l.isEmpty()) {
                continue;
            }
            out.put(column, json(v));
        }
        return out;
    }

    private static Object json(Object v) {
        if (v instanceof ExportTable.Num n) {
            double d = n.value();
            return d == Math.rint(d) && Math.abs(d) < 1e15 ? (Object) (long) d : (Object) d;
        }
        if (v instanceof List<?> l) {
            return l.stream()
                    .map(x -> x instanceof Double || x instanceof ExportTable.Num
                            ? json(x instanceof Double d ? new ExportTable.Num(d) : x)
                            : Objects.toString(x))
                    .toList();
        }
        return v;
    }
}
