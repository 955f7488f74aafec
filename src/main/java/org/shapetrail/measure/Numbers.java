package org.shapetrail.measure;

import java.math.BigDecimal;
import java.util.Locale;

/** Number formatting for messages: values as the person typed them, suggestions with one decimal. */
public final class Numbers {
    private Numbers() {
    }

    /** The value without trailing zeros, e.g. 1.78 or 68, as it was most likely typed. */
    public static String asEntered(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        String plain = BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
        return plain.equals("-0") ? "0" : plain;
    }

    /** One decimal, decimal point, e.g. "178.0". */
    public static String oneDecimal(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }
}
