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

    private Wording() {
    }

    /** The banned words present in {@code text} (whole words, any case). */
    public static List<String> bannedIn(String text) {
        String t = text.toLowerCase(Locale.ROOT);
        return BANNED.stream().filter(w -> Pattern.compile("\\b" + Pattern.quote(w) + "\\b").matcher(t).find()).toList();
    }
}
