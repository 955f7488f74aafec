package org.shapetrail.app;

import java.time.LocalDate;
import java.time.chrono.IsoChronology;
import java.time.format.FormatStyle;
import java.util.Locale;
import javafx.scene.control.DatePicker;
import javafx.util.converter.LocalDateStringConverter;

/** Date fields that show and read dates in the reader's locale (a JVM default of another country notwithstanding). */
final class DatePickers {
    private DatePickers() {
    }

    static DatePicker of(LocalDate initial, Locale locale) {
        DatePicker d = new DatePicker(initial);
        d.setConverter(new LocalDateStringConverter(FormatStyle.MEDIUM, locale, IsoChronology.INSTANCE));
        return d;
    }
}
