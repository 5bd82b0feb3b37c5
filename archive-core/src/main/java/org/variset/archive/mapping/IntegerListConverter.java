package org.variset.archive.mapping;

import com.fasterxml.jackson.core.type.TypeReference;
import jakarta.persistence.Converter;

/** Stores an ordered list of Integer values as a JSON array. */
@Converter
public final class IntegerListConverter extends JsonListConverter<Integer> {
    /** The converter Hibernate instantiates. */
    public IntegerListConverter() {
        super(new TypeReference<>() {});
    }
}
