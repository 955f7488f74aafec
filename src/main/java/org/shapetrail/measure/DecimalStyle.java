package org.shapetrail.measure;

import java.text.DecimalFormatSymbols;
import java.util.Locale;

/** Which decimal separator a person types: decided by their locale, never guessed from the value. */
public enum DecimalStyle {
    POINT('.'),
    COMMA(',');

    private final char separator;

    DecimalStyle(char separator) {
        this.separator = separator;
    }

    public char separator() {
        return separator;
    }

    /** The style of a locale, e.g. COMMA for German, POINT for English. */
    public static DecimalStyle of(Locale locale) {
        return DecimalFormatSymbols.getInstance(locale).getDecimalSeparator() == ',' ? COMMA : POINT;
    }
}
