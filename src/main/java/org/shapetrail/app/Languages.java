package org.shapetrail.app;

import java.util.Locale;
import org.shapetrail.i18n.Messages;

/**
 * The window's language: the one chosen in the settings (kept with the window's settings), else the
 * system's. Numbers and dates follow it too (decimal comma in Spanish and Portuguese).
 */
final class Languages {
    /** The settings key of the chosen language: "", "en", "es" or "pt". */
    static final String KEY = "language";
    /** The choice "as the system": no language of its own. */
    static final String SYSTEM = "";

    private Languages() {
    }

    /** The system's own locale (its formats), as the JVM started with it (before a choice changed the default). */
    private static final Locale SYSTEM_LOCALE = Locale.getDefault(Locale.Category.FORMAT);

    static Locale system() {
        return SYSTEM_LOCALE;
    }

    /**
     * Speaks a locale: the bundles' texts, and JavaFX's own words and calendars (a date picker's month
     * names, a text field's menu) for what is built from now on.
     */
    static void speak(Locale locale) {
        Messages.use(locale);
        Locale.setDefault(locale);
    }

    /** The choice in the settings: "" (as the system) or a language code of ours. */
    static String chosen() {
        String c = ShapetrailApp.PREFS.get(KEY, SYSTEM);
        return Messages.LANGUAGES.contains(c) ? c : SYSTEM;
    }

    /** Keeps a choice and gives the locale it means. */
    static Locale choose(String code) {
        ShapetrailApp.PREFS.put(KEY, code);
        return localeOf(code);
    }

    /** The locale the window starts in. */
    static Locale atStart() {
        return localeOf(chosen());
    }

    /** The locale a language choice gives (the system's for {@link #SYSTEM}). */
    static Locale localeOf(String code) {
        if (code == null || code.equals(SYSTEM)) {
            return system();
        }
        // a language chosen away from its countries: Portugal's Portuguese (the one the texts are written in)
        Locale l = Messages.localeFor(code, system());
        return l.getCountry().isEmpty() && code.equals("pt") ? Locale.forLanguageTag("pt-PT") : l;
    }

    /** A language's name in itself: English, Español, Português. */
    static String nameOf(String code) {
        return Messages.get(Locale.forLanguageTag(code), "letter.language");
    }
}
