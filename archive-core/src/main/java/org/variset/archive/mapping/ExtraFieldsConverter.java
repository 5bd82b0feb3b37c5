package org.variset.archive.mapping;

import com.fasterxml.jackson.core.type.TypeReference;
import jakarta.persistence.AttributeConverter;
import jakarta.persistence.Converter;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Stores the extra columns a user brought (name to text, in file order) as a JSON object; none is null.
 */
@Converter
public final class ExtraFieldsConverter implements AttributeConverter<Map<String, String>, String> {
    private static final TypeReference<LinkedHashMap<String, String>> TYPE = new TypeReference<>() {};

    @Override
    public String convertToDatabaseColumn(Map<String, String> value) {
        return value == null || value.isEmpty() ? null : JsonColumns.write(value);
    }

    @Override
    public Map<String, String> convertToEntityAttribute(String column) {
        return column == null ? new LinkedHashMap<>() : JsonColumns.read(column, TYPE);
    }
}
