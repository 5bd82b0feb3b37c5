package org.variset.app;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** The JSON the use cases give for scripts and the web: keys in insertion order, numbers unrounded. */
public final class Json {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private Json() {}

    /** A new empty object. */
    public static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    /** The text of a JSON value, pretty-printed. */
    public static String write(Object value) {
        try {
            return MAPPER.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    /** A date as JSON text, or null. */
    public static String date(java.time.LocalDate d) {
        return d == null ? null : d.toString();
    }
}
