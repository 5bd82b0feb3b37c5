package org.variset.archive.mapping;

import com.fasterxml.jackson.core.type.TypeReference;
import jakarta.persistence.Converter;

/** Stores an ordered list of Double values as a JSON array. */
@Converter
public final class DoubleListConverter extends JsonListConverter<Double> {
    /** The converter Hibernate instantiates. */
    public DoubleListConverter() {
        super(new TypeReference<>() {});
    }
}
