package org.variset.archive.mapping;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;

/** The one JSON mapper the column converters share. */
final class JsonColumns {
    static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonColumns() {}

    static String write(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write column value as JSON", e);
        }
    }

    static <T> T read(String json, TypeReference<T> type) {
        try {
            return MAPPER.readValue(json, type);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the archive holds a column that is not valid JSON: " + json, e);
        }
    }
}
