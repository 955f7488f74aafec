package org.shapetrail.cli;

import java.util.Locale;
import picocli.CommandLine;

/** Reads {@code --format text|csv}, naming the choices when the value is wrong. */
final class FormatConverter implements CommandLine.ITypeConverter<OutputFormat> {
    @Override
    public OutputFormat convert(String value) {
        try {
            return OutputFormat.valueOf(value.strip().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new CommandLine.TypeConversionException(org.shapetrail.i18n.Messages.tr("cli.format.bad", value));
        }
    }
}
