package org.variset.imports.table;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.variset.imports.Problem;

/**
 * A JSON document ({@code {"gym": ..., "walls": [...], "routes": [{..., "holds": [...]}]}}, docs/spec/interchange.md; the
 * {@code walls} list is ours, so that JSON round-trips walls too). Each route object keeps the line it starts on;
 * a problem in a nested hold names its path ({@code routes[3].holds[2].grip}). Jackson's default limits on
 * nesting depth and string length stay on.
 */
public final class JsonDocument {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonDocument() {}

    /**
     * Reads the tables of a JSON document.
     *
     * @throws InputFileException when the file is not JSON of that shape
     */
    public static List<RowSource> read(Path path, String file) {
        List<TableRow> routes = new ArrayList<>();
        List<TableRow> holds = new ArrayList<>();
        List<TableRow> walls = new ArrayList<>();
        String gym = null;
        try (JsonParser p = MAPPER.createParser(path.toFile())) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw shape(file, p.currentLocation().getLineNr(), "the document is not a JSON object");
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String field = p.currentName();
                JsonToken value = p.nextToken();
                if ("gym".equals(field) && value.isScalarValue()) {
                    gym = p.getValueAsString();
                } else if ("routes".equals(field) && value == JsonToken.START_ARRAY) {
                    array(p, file, field, (line, index, node) -> route(file, line, index, node, routes, holds));
                } else if ("walls".equals(field) && value == JsonToken.START_ARRAY) {
                    array(
                            p,
                            file,
                            field,
                            (line, index, node) -> walls.add(new TableRow(file, line, cells(node, false), false)));
                } else {
                    p.skipChildren();
                }
            }
            if (p.currentToken() != JsonToken.END_OBJECT) {
                throw shape(file, p.currentLocation().getLineNr(), "the document does not end where its object ends");
            }
        } catch (com.fasterxml.jackson.core.exc.StreamConstraintsException e) {
            throw new InputFileException(
                    new Problem(
                            file,
                            0,
                            "",
                            "is not a document Variset reads: it nests "
                                    + "deeper, or holds longer values, than any interchange document needs: "
                                    + e.getOriginalMessage().replaceAll(", from `[^`]*`", "")),
                    e);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
            throw new InputFileException(
                    new Problem(file, line, "", "is not valid JSON: " + e.getOriginalMessage()), e);
        } catch (IOException e) {
            throw new InputFileException(new Problem(file, 0, "", "cannot be read: " + e.getMessage()), e);
        }
        String documentGym = gym;
        if (documentGym != null) {
            routes.replaceAll(r -> withGym(r, documentGym));
            holds.replaceAll(r -> withGym(r, documentGym));
            walls.replaceAll(r -> withGym(r, documentGym));
        }
        return List.of(
                new ListSource(file, InputFormat.JSON, TableKind.WALLS, TableKind.WALLS.columns(), 1, walls),
                new ListSource(file, InputFormat.JSON, TableKind.ROUTES, TableKind.ROUTES.columns(), 1, routes),
                new ListSource(file, InputFormat.JSON, TableKind.HOLDS, TableKind.HOLDS.columns(), 1, holds));
    }

    /** What is done with each object of an array. */
    @FunctionalInterface
    private interface Element {
        void accept(int line, int index, JsonNode node);
    }

    /** Reads the objects of the array the parser stands at, refusing anything else. */
    private static void array(JsonParser p, String file, String field, Element element) throws IOException {
        int index = 0;
        for (JsonToken t = p.nextToken(); t != JsonToken.END_ARRAY; t = p.nextToken()) {
            int line = p.currentLocation().getLineNr();
            if (t != JsonToken.START_OBJECT) {
                throw shape(file, line, field + "[" + index + "] is not an object");
            }
            element.accept(line, index, MAPPER.readTree(p));
            index++;
        }
    }

    private static void route(
            String file, int line, int index, JsonNode node, List<TableRow> routes, List<TableRow> holds) {
        Map<String, Object> cells = cells(node, true);
        routes.add(new TableRow(file, line, cells, false));
        JsonNode hs = node.get("holds");
        if (hs == null || !hs.isArray()) {
            return;
        }
        for (int h = 0; h < hs.size(); h++) {
            Map<String, Object> hold = new LinkedHashMap<>();
            for (String key : List.of("gym", "wall", "route", "set_on")) {
                if (cells.containsKey(key)) {
                    hold.put(key, cells.get(key));
                }
            }
            hold.putAll(cells(hs.get(h), false));
            hold.put("@path", "routes[" + index + "].holds[" + h + "]");
            holds.add(new TableRow(file, line, hold, false));
        }
    }

    private static TableRow withGym(TableRow r, String gym) {
        if (r.cells().get("gym") != null) {
            return r;
        }
        Map<String, Object> cells = new LinkedHashMap<>();
        cells.put("gym", gym);
        cells.putAll(r.cells());
        return new TableRow(r.file(), r.line(), cells, false);
    }

    private static Map<String, Object> cells(JsonNode node, boolean skipHolds) {
        Map<String, Object> out = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            if (skipHolds && "holds".equals(e.getKey()) || e.getValue().isNull()) {
                continue;
            }
            out.put(e.getKey(), scalarOrList(e.getValue()));
        }
        return out;
    }

    private static Object scalarOrList(JsonNode v) {
        if (v.isArray()) {
            List<Object> list = new ArrayList<>();
            v.forEach(x -> list.add(x.isValueNode() ? x.asText() : x.toString()));
            return list;
        }
        return v.isValueNode() ? v.asText() : v.toString();
    }

    private static InputFileException shape(String file, int line, String what) {
        return new InputFileException(
                new Problem(file, line, "", what + " (expected {\"gym\": ..., \"routes\": " + "[...]})"), null);
    }
}
