package org.shapetrail.app;

import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.format.FormatStyle;
import java.util.List;
import java.util.Locale;
import javafx.scene.control.DatePicker;
import javafx.util.StringConverter;

/**
 * Date fields that show dates in the reader's locale (a JVM default of another country notwithstanding)
 * and read back what they show, the locale's short form ("04/12/2026") and ISO dates ("2026-12-04").
 * JavaFX's own LocalDateStringConverter cannot read its own Spanish medium dates ("4 dic 2026") on JDK 17.
 */
final class DatePickers {
    private DatePickers() {
    }

    static DatePicker of(LocalDate initial, Locale locale) {
        DatePicker d = new DatePicker(initial);
        d.setConverter(converter(locale));
        return d;
    }

    static StringConverter<LocalDate> converter(Locale locale) {
        DateTimeFormatter shown = DateTimeFormatter.ofLocalizedDate(FormatStyle.MEDIUM).withLocale(locale);
        List<DateTimeFormatter> read = List.of(shown,
                DateTimeFormatter.ofLocalizedDate(FormatStyle.SHORT).withLocale(locale), DateTimeFormatter.ISO_LOCAL_DATE);
        return new StringConverter<>() {
            @Override
            public String toString(LocalDate d) {
                return d == null ? "" : d.format(shown);
            }

            @Override
            public LocalDate fromString(String s) {
                if (s == null || s.isBlank()) {
                    return null;
                }
                for (DateTimeFormatter f : read) {
                    try {
                        return LocalDate.parse(s.strip(), f);
                    } catch (DateTimeParseException tryNext) {
                        // the next form
                    }
                }
                for (DateTimeFormatter f : read) {
                    try {
                        // month abbreviations typed with or without their dot ("dic." and "dic")
                        return LocalDate.parse(s.strip().replace(".", ""), f);
                    } catch (DateTimeParseException tryNext) {
                        // the next form
                    }
                }
                throw new DateTimeParseException("not a date", s, 0); // not words: the picker keeps the last good date
            }
        };
    }
}
