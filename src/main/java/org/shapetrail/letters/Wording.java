package org.shapetrail.letters;

import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * The words letters use and avoid (PRODUCT.md): describe, do not judge; compare a child with their own
 * past. The banned list is checked on every composed letter.
 */
public final class Wording {
    /** Words and phrases a letter never contains. */
    public static final List<String> BANNED = List.of("fat", "skinny", "overweight", "obese", "ideal", "should weigh",
            "good body", "bad body", "underweight", "chubby", "thin");

    /**
     * The same in Spanish and Portuguese: words that rate a body (fat, thin, obese, overweight, ideal, a
     * good or bad body), in their usual forms. Listed in docs/languages.md for review.
     */
    public static final java.util.Map<String, List<String>> BANNED_BY_LANGUAGE = java.util.Map.of(
            "en", BANNED,
            "es", List.of("gordo", "gorda", "gordito", "gordita", "flaco", "flaca", "delgaducho", "obeso", "obesa",
                    "obesidad", "sobrepeso", "ideal", "debería pesar", "buen cuerpo", "mal cuerpo", "bajo peso",
                    "rellenito", "rellenita"),
            "pt", List.of("gordo", "gorda", "gordinho", "gordinha", "magricela", "obeso", "obesa", "obesidade",
                    "sobrepeso", "excesso de peso", "ideal", "deveria pesar", "corpo bom", "corpo mau", "baixo peso",
                    "cheinho", "cheinha"));

    private Wording() {
    }

    /** The banned English words present in {@code text} (whole words, any case). */
    public static List<String> bannedIn(String text) {
        return bannedIn(text, Locale.ENGLISH);
    }

    /** The banned words of a letter's language (and the English ones) present in {@code text}. */
    public static List<String> bannedIn(String text, Locale language) {
        String t = text.toLowerCase(Locale.ROOT);
        java.util.Set<String> words = new java.util.LinkedHashSet<>(BANNED);
        words.addAll(BANNED_BY_LANGUAGE.getOrDefault(language.getLanguage(), List.of()));
        return words.stream().filter(w -> Pattern.compile("(?U)\\b" + Pattern.quote(w) + "\\b").matcher(t).find())
                .toList();
    }
}
