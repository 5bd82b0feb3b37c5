package org.variset.cli.convert;

import org.variset.archive.grade.Discipline;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code boulder} or {@code rope}. */
public final class DisciplineConverter implements ITypeConverter<Discipline> {
    @Override
    public Discipline convert(String value) {
        try {
            return Discipline.parse(value);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
