package org.shapetrail.store;

import java.util.Locale;
import java.util.Optional;

/**
 * The limits of every text a Shapetrail file keeps (docs/guide.md, "Bringing data in and out"): a length in
 * characters, and no control characters (a NUL would cut the text short when it is read back), except line
 * breaks and tabs in notes and aims. The entry forms, the import and the store all ask here, so a text is
 * refused the same way whatever path it takes, and never stored cut or bent.
 */
public final class TextRules {
    /** A kind of text with its limit. */
    public enum Field {
        PERSON_NAME("the name", 200, false),
        MEASURER_NAME("the measurer's name", 200, false),
        SQUAD_NAME("the squad's name", 100, false),
        CONTEXT("the context", 200, false),
        NOTES("the notes", 10_000, true),
        BLOCK_NAME("the block's name", 200, false),
        BLOCK_AIM("the block's aim", 2_000, true);

        private final String words;
        private final int maxChars;
        private final boolean lineBreaks;

        Field(String words, int maxChars, boolean lineBreaks) {
            this.words = words;
            this.maxChars = maxChars;
            this.lineBreaks = lineBreaks;
        }

        /** E.g. "the context". */
        public String words() {
            return words;
        }

        /** The longest text allowed, in characters (Unicode code points). */
        public int maxChars() {
            return maxChars;
        }
    }

    private TextRules() {
    }

    /** Why {@code text} cannot be kept as {@code field}, in words that say the fix; empty when it can. */
    public static Optional<String> problem(Field field, String text) {
        if (text == null) {
            return Optional.empty();
        }
        int length = text.codePointCount(0, text.length());
        if (length > field.maxChars) {
            return Optional.of(field.words + " is " + String.format(Locale.ROOT, "%,d", length) + " characters long;"
                    + " the limit is " + String.format(Locale.ROOT, "%,d", field.maxChars) + ": shorten it");
        }
        int at = 0;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            at++;
            boolean allowed = field.lineBreaks && (cp == '\n' || cp == '\r' || cp == '\t');
            if (Character.getType(cp) == Character.CONTROL && !allowed) {
                return Optional.of(field.words + " holds a control character (U+" + String.format(Locale.ROOT, "%04X", cp)
                        + ") at character " + at + ": remove it");
            }
            i += Character.charCount(cp);
        }
        return Optional.empty();
    }

    /** {@code text} when it can be kept; otherwise a {@link StoreException} with the reason. */
    public static String require(Field field, String text) {
        problem(field, text).ifPresent(why -> {
            throw new StoreException(Character.toUpperCase(why.charAt(0)) + why.substring(1) + "; nothing was saved.");
        });
        return text;
    }
}
