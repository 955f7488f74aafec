package org.shapetrail.i18n;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.text.MessageFormat;
import java.util.Locale;
import java.util.ResourceBundle;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The three languages' bundles agree: the same keys, none empty, each pattern with the same arguments. */
class MessagesBundleTest {
    static final Pattern ARGUMENT = Pattern.compile("\\{(\\d+)");

    static Set<Integer> arguments(String pattern) {
        new MessageFormat(pattern); // a pattern MessageFormat cannot read fails here
        Set<Integer> out = new TreeSet<>();
        Matcher m = ARGUMENT.matcher(pattern);
        while (m.find()) {
            out.add(Integer.parseInt(m.group(1)));
        }
        return out;
    }

    /** A picocli help text's String.format specifiers (%n, %%, %s …) and ${…} variables, in order. */
    static java.util.List<String> formatSpecifiers(String text) {
        java.util.List<String> out = new java.util.ArrayList<>();
        Matcher m = Pattern.compile("%[a-z%]|\\$\\{[^}]*\\}").matcher(text);
        while (m.find()) {
            out.add(m.group());
        }
        return out;
    }

    static Set<String> ownKeys(String lang) {
        java.util.Properties p = new java.util.Properties();
        try (var in = Messages.class.getResourceAsStream("messages_" + lang + ".properties");
             var r = new java.io.InputStreamReader(in, java.nio.charset.StandardCharsets.UTF_8)) {
            p.load(r);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return p.stringPropertyNames();
    }

    @Test
    void everyKeyIsInEveryLanguageWithTheSameArguments() {
        ResourceBundle en = Messages.bundle(Locale.ENGLISH);
        Set<String> base = new TreeSet<>(en.keySet());
        assertFalse(base.isEmpty());
        for (String lang : new String[] {"es", "pt"}) {
            ResourceBundle other = Messages.bundle(Locale.forLanguageTag(lang));
            assertEquals(lang, other.getLocale().getLanguage(), "the " + lang + " bundle itself, not English");
            // the file's own keys, not those the bundle would inherit from English
            Set<String> own = new TreeSet<>(ownKeys(lang));
            assertEquals(base, own, lang + ": keys missing or extra");
            for (String key : base) {
                String text = other.getString(key);
                assertFalse(text.isBlank(), lang + " " + key);
                if (Messages.readByPicocli(key)) {
                    assertEquals(formatSpecifiers(en.getString(key)), formatSpecifiers(text), lang + " " + key);
                } else {
                    assertEquals(arguments(en.getString(key)), arguments(text), lang + " " + key);
                }
            }
        }
        for (String key : base) {
            assertFalse(en.getString(key).isBlank(), "en " + key);
        }
    }

    @Test
    void theBundlesHoldWhatTheTextTablesSay() throws java.io.IOException {
        // src/main/i18n/texts.py writes the bundles from src/main/i18n/texts/*.tsv: a table edited and not
        // written out again is caught here (derivation: the generator's own rules, applied in reverse)
        int lines = 0;
        try (var files = java.nio.file.Files.list(java.nio.file.Path.of("src/main/i18n/texts"))) {
            for (java.nio.file.Path f : files.filter(p -> p.toString().endsWith(".tsv")).sorted().toList()) {
                for (String line : java.nio.file.Files.readAllLines(f, java.nio.charset.StandardCharsets.UTF_8)) {
                    if (line.isBlank() || line.startsWith("#")) {
                        continue;
                    }
                    String[] cells = line.split("\t", -1);
                    assertEquals(4, cells.length, f + ": " + line);
                    String key = cells[0].strip();
                    for (int i = 0; i < 3; i++) {
                        String text = cells[i + 1].replaceFirst(" \\(review\\)$", "").replace("\\n", "\n");
                        String expected = Messages.readByPicocli(key) ? text : text.replace("'", "''");
                        ResourceBundle b = Messages.bundle(Locale.forLanguageTag(Messages.LANGUAGES.get(i)));
                        assertEquals(expected, b.getString(key), f.getFileName() + " " + Messages.LANGUAGES.get(i)
                                + " " + key + ": run python3 src/main/i18n/texts.py");
                    }
                    lines++;
                }
            }
        }
        assertTrue(lines > 700, lines + " texts in the tables");
    }

    @Test
    void everyApostropheIsDoubledForMessageFormat() {
        // MessageFormat reads a lone ' as the start of quoted text and drops it ("don't" prints as "dont");
        // every pattern goes through MessageFormat, so a written apostrophe must be '' (Java's MessageFormat docs)
        Pattern lone = Pattern.compile("(?<!')'(?!')");
        for (String lang : Messages.LANGUAGES) {
            ResourceBundle b = Messages.bundle(Locale.forLanguageTag(lang));
            for (String key : b.keySet()) {
                if (Messages.readByPicocli(key)) {
                    // picocli prints its texts as written: a doubled apostrophe would show doubled
                    assertFalse(b.getString(key).contains("''"), lang + " " + key + ": " + b.getString(key));
                    continue;
                }
                assertFalse(lone.matcher(b.getString(key)).find(), lang + " " + key + ": " + b.getString(key));
            }
        }
    }

    @Test
    void numbersAndPluralsFollowTheLanguage() {
        // the letter's month count uses MessageFormat's choice: 1 month, 5 months (common practice for plurals)
        String one = Messages.get(Locale.forLanguageTag("es"), "letter.height.gain", "150,0", "a", "151,0", "b", "1,0",
                1, "");
        assertTrue(one.contains("en 1 mes."), one);
        String five = Messages.get(Locale.forLanguageTag("pt"), "letter.height.gain", "150,0", "a", "156,0", "b", "6,0",
                5, "");
        assertTrue(five.contains("em 5 meses."), five);
        // an unknown language falls back to English, never to a half-translated mix
        assertEquals(Messages.get(Locale.ENGLISH, "letter.title"), Messages.get(Locale.GERMAN, "letter.title"));
        assertEquals("pt", Messages.languageOf(Locale.forLanguageTag("pt-BR")));
    }
}
