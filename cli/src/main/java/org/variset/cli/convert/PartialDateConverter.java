package org.variset.cli.convert;

import org.variset.archive.gym.PartialDate;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code YYYY-MM-DD}, {@code YYYY-MM} or {@code YYYY}. */
public final class PartialDateConverter implements ITypeConverter<PartialDate> {
    @Override
    public PartialDate convert(String value) {
        try {
            return PartialDate.parse(value);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
