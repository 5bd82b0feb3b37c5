package org.variset.archive.mapping;

import com.fasterxml.jackson.core.type.TypeReference;
import jakarta.persistence.AttributeConverter;
import java.util.ArrayList;
import java.util.List;

/**
 * Stores an ordered list as a JSON array; an empty list is stored as null and read back as an empty,
 * modifiable list.
 *
 * @param <E> the element type
 */
abstract class JsonListConverter<E> implements AttributeConverter<List<E>, String> {
    private final TypeReference<List<E>> type;

    JsonListConverter(TypeReference<List<E>> type) {
        this.type = type;
    }

    @Override
    public String convertToDatabaseColumn(List<E> value) {
        return value == null || value.isEmpty() ? null : JsonColumns.write(value);
    }

    @Override
    public List<E> convertToEntityAttribute(String column) {
        return column == null ? new ArrayList<>() : new ArrayList<>(JsonColumns.read(column, type));
    }
}
