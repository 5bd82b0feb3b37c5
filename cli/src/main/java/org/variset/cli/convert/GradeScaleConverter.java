package org.variset.cli.convert;

import org.variset.archive.grade.GradeScale;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads a scale word: {@code v}, {@code font}, {@code yds}, {@code french}, {@code uiaa}, {@code ircra}. */
public final class GradeScaleConverter implements ITypeConverter<GradeScale> {
    @Override
    public GradeScale convert(String value) {
        try {
            return GradeScale.parse(value);
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }
}
