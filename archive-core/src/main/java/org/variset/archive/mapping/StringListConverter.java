package org.variset.archive.mapping;

import com.fasterxml.jackson.core.type.TypeReference;
import jakarta.persistence.Converter;

/** Stores an ordered list of String values as a JSON array. */
@Converter
public final class StringListConverter extends JsonListConverter<String> {
    /** The converter Hibernate instantiates. */
    public StringListConverter() {
        super(new TypeReference<>() {});
    }
}
