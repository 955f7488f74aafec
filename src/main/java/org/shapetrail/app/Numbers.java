package org.shapetrail.app;

import java.text.NumberFormat;
import java.util.Locale;

/** Numbers for display in the user's locale (decimal comma or point). */
final class Numbers {
    private Numbers() {
    }

    static String fmt(Locale locale, double v, int decimals) {
        if (!Double.isFinite(v)) {
            return "";
        }
        NumberFormat f = NumberFormat.getNumberInstance(locale);
        f.setMinimumFractionDigits(decimals);
        f.setMaximumFractionDigits(decimals);
        f.setGroupingUsed(false);
        return f.format(v);
    }

    /** A trial value as it would have been typed: one or two decimals, no more. */
    static String trial(Locale locale, double v) {
        NumberFormat f = NumberFormat.getNumberInstance(locale);
        f.setMinimumFractionDigits(1);
        f.setMaximumFractionDigits(2);
        f.setGroupingUsed(false);
        return f.format(v);
    }
}
