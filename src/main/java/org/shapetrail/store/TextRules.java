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
        PERSON_NAME(200, false),
        MEASURER_NAME(200, false),
        SQUAD_NAME(100, false),
        CONTEXT(200, false),
        NOTES(10_000, true),
        BLOCK_NAME(200, false),
        BLOCK_AIM(2_000, true);

        private final int maxChars;
        private final boolean lineBreaks;

        Field(int maxChars, boolean lineBreaks) {
            this.maxChars = maxChars;
            this.lineBreaks = lineBreaks;
        }

        /** E.g. "the context", in the reader's language. */
        public String words() {
            return org.shapetrail.i18n.Messages.tr("text.field." + name());
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
            return Optional.of(org.shapetrail.i18n.Messages.tr("text.tooLong", field.words(), length, field.maxChars));
        }
        int at = 0;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            at++;
            boolean allowed = field.lineBreaks && (cp == '\n' || cp == '\r' || cp == '\t');
            if (Character.getType(cp) == Character.CONTROL && !allowed) {
                return Optional.of(org.shapetrail.i18n.Messages.tr("text.control", field.words(),
                        String.format(Locale.ROOT, "%04X", cp), at));
            }
            i += Character.charCount(cp);
        }
        return Optional.empty();
    }

    /** {@code text} when it can be kept; otherwise a {@link StoreException} with the reason. */
    public static String require(Field field, String text) {
        problem(field, text).ifPresent(why -> {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("text.refused", Character.toUpperCase(why.charAt(0))
                    + why.substring(1)));
        });
        return text;
    }
}
