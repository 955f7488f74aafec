package org.shapetrail.measure;

import java.math.BigDecimal;
import java.util.Locale;

/**
 * Number formatting for messages: values as the person typed them, suggestions with one decimal, both with
 * the decimal separator of the language the messages are in ({@link org.shapetrail.i18n.Messages#current}).
 */
public final class Numbers {
    private Numbers() {
    }

    /** The value without trailing zeros, e.g. 1.78 or 68, as it was most likely typed. */
    public static String asEntered(double value) {
        if (!Double.isFinite(value)) {
            return String.valueOf(value);
        }
        String plain = BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
        return (plain.equals("-0") ? "0" : plain).replace('.', separator());
    }

    /** One decimal, e.g. "178.0" (or "178,0" in Spanish and Portuguese). */
    public static String oneDecimal(double value) {
        return String.format(Locale.ROOT, "%.1f", value).replace('.', separator());
    }

    /** The decimal separator of the language the messages are in. */
    public static char separator() {
        return DecimalStyle.of(org.shapetrail.i18n.Messages.supported(org.shapetrail.i18n.Messages.current()))
                .separator();
    }
}
