package org.shapetrail.i18n;

import java.text.MessageFormat;
import java.util.List;
import java.util.Locale;
import java.util.MissingResourceException;
import java.util.ResourceBundle;

/**
 * The words a person reads, in English (the default), Spanish and Portuguese: Java's ResourceBundle over
 * {@code org/shapetrail/i18n/messages*.properties} (UTF-8), each pattern formatted with MessageFormat in
 * the reader's locale (plural-aware {@code choice} where counts appear). A key missing from a language
 * falls back to English, and a test checks none is missing.
 */
public final class Messages {
    /** The bundles' base name. */
    public static final String BUNDLE = "org.shapetrail.i18n.messages";

    /** The languages Shapetrail is written in, English first. */
    public static final List<String> LANGUAGES = List.of("en", "es", "pt");

    /**
     * The language the window and the commands speak: the system's display language until the settings
     * or {@code --lang} choose another. A letter's language is chosen per person and never read from here.
     */
    private static volatile Locale current = Locale.getDefault(Locale.Category.DISPLAY);

    private Messages() {
    }

    /**
     * True for the command line's help texts, which picocli reads from the same bundle as String.format
     * patterns (with %n and %%), not as MessageFormat patterns: the commands' own keys start with
     * "shapetrail.", picocli's headings with "usage.", and the shared options' keys have no dot.
     */
    public static boolean readByPicocli(String key) {
        return key.startsWith("shapetrail.") || key.startsWith("usage.") || key.indexOf('.') < 0;
    }

    /** The locale the window and the commands speak now. */
    public static Locale current() {
        return current;
    }

    /** Makes the window and the commands speak a locale's language (formatting numbers in it too). */
    public static void use(Locale locale) {
        current = locale == null ? Locale.ROOT : locale;
    }

    /** True when the bundles have a text for {@code key}. */
    public static boolean has(String key) {
        return bundle(Locale.ROOT).containsKey(key);
    }

    /** The text of {@code key} in the current language (see {@link #use}), its arguments put in. */
    public static String tr(String key, Object... args) {
        return get(current, key, args);
    }

    /** The bundle of a locale's language (English for any other). */
    public static ResourceBundle bundle(Locale locale) {
        return ResourceBundle.getBundle(BUNDLE, supported(locale), ResourceBundle.Control.getNoFallbackControl(
                ResourceBundle.Control.FORMAT_PROPERTIES));
    }

    /** The locale itself when its language is one of ours, else English (keeping nothing of the other). */
    public static Locale supported(Locale locale) {
        return locale != null && LANGUAGES.contains(locale.getLanguage()) && !locale.getLanguage().equals("en")
                ? locale : Locale.ROOT;
    }

    /** The text of {@code key} in the locale's language, its arguments put in with MessageFormat. */
    public static String get(Locale locale, String key, Object... args) {
        String pattern;
        try {
            pattern = bundle(locale).getString(key);
        } catch (MissingResourceException e) {
            throw new IllegalStateException("no text for " + key + " in " + locale, e);
        }
        return new MessageFormat(pattern, locale == null ? Locale.ROOT : locale).format(args);
    }

    /** A language code of ours for a locale: en, es or pt. */
    public static String languageOf(Locale locale) {
        return supported(locale) == Locale.ROOT ? "en" : locale.getLanguage();
    }

    /**
     * The locale for a language code ("es", "pt", "en"), keeping the country of {@code near} where it
     * speaks that language (a British desk writes English letters as en-GB).
     */
    public static Locale localeFor(String language, Locale near) {
        if (language == null || language.isBlank()) {
            return near;
        }
        if (near != null && near.getLanguage().equals(language)) {
            return near;
        }
        return Locale.forLanguageTag(language);
    }
}
