package org.shapetrail.measure;

import static org.shapetrail.i18n.Messages.tr;

/**
 * Parses a value typed or read from a file into a number in the site's unit. A text that is not a plain
 * decimal number in the expected style (digits, one separator, optional sign) is refused with a message;
 * a separator of the other style is never silently reinterpreted, so "1,5" under a decimal point is
 * refused rather than read as 15 or 1.5.
 */
public final class ValueParser {
    private ValueParser() {
    }

    /** The outcome of parsing one text: a value, or the problem that stops it. */
    public record Parsed(double value, Problem problem) {
        public boolean ok() {
            return problem == null;
        }
    }

    /** Parses {@code text} for {@code site}; blank text is reported as missing. */
    public static Parsed parse(Site site, String text, DecimalStyle style) {
        String unit = site.unit().symbol();
        String t = text == null ? "" : text.strip();
        if (t.isEmpty()) {
            return new Parsed(Double.NaN, new Problem(site, ProblemKind.MISSING,
                    tr("check.empty", site.shown(), unit)));
        }
        char other = style == DecimalStyle.POINT ? ',' : '.';
        if (t.indexOf(other) >= 0 && t.indexOf(style.separator()) < 0 && isNumberWith(t, other)) {
            String fixed = t.replace(other, style.separator());
            return new Parsed(Double.NaN, new Problem(site, ProblemKind.NOT_A_NUMBER,
                    tr("check.separator", site.shown(), t, String.valueOf(other), fixed, unit)));
        }
        String shown = t.length() > 24 ? tr("check.cut", t.substring(0, 20), t.length()) : t;
        if (!isNumberWith(t, style.separator())) {
            boolean exponent = t.length() < 40 && t.matches("[+-]?[0-9]+([.,][0-9]*)?[eE][+-]?[0-9]+");
            return new Parsed(Double.NaN, new Problem(site, ProblemKind.NOT_A_NUMBER, tr(exponent
                    ? "check.exponent" : "check.notNumber.text", site.shown(), shown, unit)));
        }
        if (t.replaceAll("[^0-9]", "").length() > 15) {
            return new Parsed(Double.NaN, new Problem(site, ProblemKind.OUT_OF_RANGE, tr("check.digits",
                    site.shown(), shown, unit)));
        }
        double v = Double.parseDouble(t.replace(style.separator(), '.'));
        return new Parsed(v, null);
    }

    private static boolean isNumberWith(String t, char sep) {
        int i = 0;
        if (t.charAt(0) == '-' || t.charAt(0) == '+') {
            i = 1;
        }
        boolean digits = false;
        boolean seenSep = false;
        for (; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c >= '0' && c <= '9') {
                digits = true;
            } else if (c == sep && !seenSep) {
                seenSep = true;
            } else {
                return false;
            }
        }
        return digits;
    }
}
