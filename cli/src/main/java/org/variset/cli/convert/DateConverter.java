package org.variset.cli.convert;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads a calendar day, {@code YYYY-MM-DD}. */
public final class DateConverter implements ITypeConverter<LocalDate> {
    @Override
    public LocalDate convert(String value) {
        try {
            return LocalDate.parse(value.strip());
        } catch (DateTimeParseException e) {
            throw new TypeConversionException("'" + value + "' is not a date (expected YYYY-MM-DD)");
        }
    }
}
