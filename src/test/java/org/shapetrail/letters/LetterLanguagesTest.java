package org.shapetrail.letters;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.docs.Screenshots;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.i18n.Messages;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Letters in the family's language: the person's letter language is used (the demo academy has Spanish-
 * and Portuguese-reading families), with that language's cautions, decimal commas and dates, no word that
 * rates a body, and the PDF's text (accents included) is exactly what was composed.
 */
class LetterLanguagesTest {
    static HistoryBuilder builder;
    static final LetterSettings YEAR = new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear",
            "Academy physiotherapist", "physio@saltmarsh-bay.example", LocalDate.of(2025, 9, 1),
            LocalDate.of(2026, 8, 31), true);

    @BeforeAll
    static void load() throws Exception {
        Path file = Files.createTempDirectory("letters-lang").resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
    }

    static PersonHistory reading(String language) {
        Person p = builder.academy().people().stream().filter(x -> x.letterLanguage().equals(language)).findFirst()
                .orElseThrow();
        return builder.history(p);
    }

    @Test
    void aPortugueseFamilysLetterIsInPortugueseWithItsCautionsAndDecimalCommas() throws Exception {
        PersonHistory h = reading("pt");
        Letter l = new LetterComposer(builder, YEAR, Locale.UK).compose(h);
        assertEquals("pt", l.language().getLanguage());
        String text = LettersTest.text(LettersTest.pdf(l)).replace("\n", " ").replace("  ", " ");
        // the Portuguese cautions, as the bundle has them (messages_pt.properties)
        assertTrue(text.contains("Esta carta não é uma avaliação médica nem nutricional."), text);
        assertTrue(text.contains("Cada criança cresce ao seu ritmo"), text);
        assertTrue(text.contains("Crescimento e forma corporal: carta de acompanhamento"), text);
        // the scale with a decimal comma (pt: 0,1), and no point-decimal figure in the sentences
        assertTrue(text.contains("começam em 0,1"), text);
        assertEquals(List.of(), Wording.bannedIn(text, l.language()));
        // a stature as the Portuguese locale prints it (common practice: decimal comma in pt)
        String stature = String.format(Locale.forLanguageTag("pt"), "%.1f",
                h.visits().get(h.visits().size() - 1).value(org.shapetrail.measure.Site.STATURE).orElseThrow());
        assertTrue(text.contains(stature), stature);
    }

    @Test
    void aSpanishFamilysLetterKeepsEveryAccentInThePdf() throws Exception {
        PersonHistory h = reading("es");
        Letter l = new LetterComposer(builder, YEAR, Locale.UK).compose(h);
        byte[] pdf = LettersTest.pdf(l);
        String text = LettersTest.text(pdf).replace("\n", " ").replace("  ", " ");
        // every sentence of the letter, accents and ñ included, comes back out of the PDF as written
        for (Letter.Section s : l.sections()) {
            for (String p : s.paragraphs()) {
                for (String word : p.split(" ")) {
                    if (word.chars().anyMatch(c -> c > 127)) {
                        assertTrue(text.contains(word), "\"" + word + "\" of: " + p);
                    }
                }
            }
        }
        assertTrue(text.contains("Esta carta no es una valoración médica ni nutricional."), text);
        assertEquals(List.of(), Wording.bannedIn(text, l.language()));
        // the first page of each language's letter, to look at (docs/screenshots with -Dshapetrail.screenshots)
        page(pdf, "letter-es.png");
        page(LettersTest.pdf(new LetterComposer(builder, YEAR, Locale.UK).compose(reading("pt"))), "letter-pt.png");
    }

    static void page(byte[] pdf, String name) throws Exception {
        try (var d = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            var img = new org.apache.pdfbox.rendering.PDFRenderer(d).renderImageWithDPI(0, 80);
            javax.imageio.ImageIO.write(img, "png", Screenshots.folder().resolve(name).toFile());
        }
    }

    @Test
    void theDesksLanguageServesWhoeverHasNoneAndTheCommandMayChooseOneForAll() {
        Person none = builder.academy().people().stream().filter(x -> x.letterLanguage().isEmpty()).findFirst()
                .orElseThrow();
        Letter en = new LetterComposer(builder, YEAR, Locale.UK).compose(builder.history(none));
        assertEquals(Locale.UK, en.language());
        assertTrue(en.allText().contains(LetterComposer.CAUTIONS.get(0)));
        Letter es = new LetterComposer(builder, YEAR, Locale.UK).allIn(Locale.forLanguageTag("es"))
                .compose(reading("pt"));
        assertEquals(LetterComposer.cautions(Locale.forLanguageTag("es")), es.cautions());
        assertEquals(Messages.get(Locale.forLanguageTag("es"), "letter.title"), es.heading().get(1));
    }
}
