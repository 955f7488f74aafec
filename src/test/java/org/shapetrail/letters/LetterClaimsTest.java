package org.shapetrail.letters;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.BlockReview;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Every letter of the sample academy, over its whole record and over one season, checked sentence by
 * sentence: each claim about a rating's change agrees with the numbers printed beside it and with the
 * core's per-rating verdict, no printed rating lies outside the scale the letter states, and a letter
 * that leaves out the skinfold rating never speaks of it.
 */
class LetterClaimsTest {
    /** "Muscle and bone build went from 2.9 to 3.6, a change of 0.7: larger than … (up to about 0.3)." */
    static final Pattern CLAIM = Pattern.compile("^(Muscle and bone build|Slenderness|Skinfold rating) (?:went from"
            + " (\\d+\\.\\d) to (\\d+\\.\\d), a change of (-?\\d+\\.\\d)|stayed at (\\d+\\.\\d)): (larger than|within|about"
            + " the size of) the measurer's repeat error[^(]*\\(up to about (\\d+\\.\\d)\\)");
    static HistoryBuilder builder;

    @BeforeAll
    static void load() throws Exception {
        Path file = Files.createTempDirectory("claims").resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
    }

    record Claim(int component, BigDecimal from, BigDecimal to, BigDecimal change, String reading, BigDecimal error) {
    }

    static List<Claim> claims(List<String> paragraphs) {
        List<Claim> out = new ArrayList<>();
        for (String p : paragraphs) {
            Matcher m = CLAIM.matcher(p);
            if (!m.find()) {
                continue;
            }
            int c = LetterComposer.COMPONENT_NAMES.indexOf(m.group(1).toLowerCase(Locale.ROOT));
            BigDecimal from = new BigDecimal(m.group(2) != null ? m.group(2) : m.group(5));
            BigDecimal to = new BigDecimal(m.group(3) != null ? m.group(3) : m.group(5));
            BigDecimal change = m.group(4) != null ? new BigDecimal(m.group(4)) : BigDecimal.ZERO.setScale(1);
            out.add(new Claim(c, from, to, change, m.group(6), new BigDecimal(m.group(7))));
        }
        return out;
    }

    /** The claims after the paragraph that starts with {@code lead}, up to the next non-claim paragraph. */
    static List<String> after(Letter.Section s, String lead) {
        List<String> out = new ArrayList<>();
        boolean on = false;
        for (String p : s.paragraphs()) {
            if (p.startsWith(lead)) {
                on = true;
                continue;
            }
            if (on) {
                if (!CLAIM.matcher(p).find()) {
                    break;
                }
                out.add(p);
            }
        }
        return out;
    }

    static void check(String who, List<Claim> claims, ChangeVerdict core, boolean skinfolds) {
        assertEquals(skinfolds ? 3 : 2, claims.size(), who + ": one sentence per rating shown");
        for (Claim c : claims) {
            // the letter's scale (LetterComposer.SCALE): ratings start at 0.1
            assertTrue(c.from().compareTo(new BigDecimal("0.1")) >= 0 && c.to().compareTo(new BigDecimal("0.1")) >= 0,
                    who + ": " + c);
            // the printed change is the difference of the printed values (derived)
            assertEquals(0, c.to().subtract(c.from()).compareTo(c.change()), who + ": " + c);
            int cmp = c.change().abs().compareTo(c.error());
            boolean beyond = core.componentBeyond(c.component());
            switch (c.reading()) {
                case "larger than" -> assertTrue(cmp > 0 && beyond, who + ": 'larger' needs both: " + c);
                case "within" -> assertTrue(cmp <= 0 && !beyond, who + ": 'within' needs both: " + c);
                default -> assertTrue((cmp > 0) != beyond, who + ": 'about the size' only when they differ: " + c);
            }
            // the printed error is the core's MDC95 to one decimal (never shown below 0.1)
            assertEquals(LetterComposer.printedError(core.mdc95()[c.component()]), c.error(), who + ": " + c);
            if (!skinfolds) {
                assertTrue(c.component() != 0, who + ": the skinfold rating is left out at this age");
            }
        }
    }

    @Test
    void everyClaimInEveryDemoLetterAgreesWithThePrintedNumbersAndTheCore() {
        List<LetterSettings> periods = List.of(
                new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear", "", "the office",
                        LocalDate.of(2000, 1, 1), LocalDate.of(2030, 12, 31), false),
                new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear", "", "the office",
                        LocalDate.of(2025, 9, 1), LocalDate.of(2026, 8, 31), false));
        int checked = 0;
        int blocks = 0;
        for (LetterSettings period : periods) {
            // every letter in English, whatever the person's letter language: the claims are read from the English words
            LetterComposer composer = new LetterComposer(builder, period, Locale.UK).allIn(Locale.UK);
            for (Person p : builder.academy().people()) {
                PersonHistory h = builder.history(p);
                Letter l = composer.compose(h);
                String text = l.allText();
                assertFalse(text.contains("This change is"), p.displayName() + ": no verdict on the three together");
                List<VisitResult> rated = h.rated().stream().filter(r -> !r.visit().measuredAt().toLocalDate()
                        .isBefore(period.from()) && !r.visit().measuredAt().toLocalDate().isAfter(period.to())).toList();
                double age = l.table().isEmpty() ? 99 : h.visits().stream().filter(r -> !r.visit().measuredAt()
                        .toLocalDate().isAfter(period.to())).reduce((a, b) -> b).map(VisitResult::ageYears).orElse(99.0);
                boolean skinfolds = age >= LetterComposer.SKINFOLD_AGE;
                if (!skinfolds) {
                    assertFalse(text.toLowerCase(Locale.ROOT).contains("skinfold"), p.displayName() + ": " + text);
                }
                for (Letter.Section s : l.sections()) {
                    if (s.title().equals("Body shape") && rated.size() >= 2) {
                        assertTrue(s.paragraphs().get(0).startsWith(LetterComposer.SCALE), p.displayName());
                        check(p.displayName(), claims(after(s, "From ")),
                                builder.verdict(rated.get(0), rated.get(rated.size() - 1)), skinfolds);
                        checked++;
                    }
                    if (s.title().equals("Training block")) {
                        for (var block : builder.academy().blocks()) {
                            BlockReview r = BlockReview.of(builder, block, BlockReview.DEFAULT_WINDOW_DAYS);
                            r.athletes().stream().filter(a -> a.person().id() == p.id()).findFirst().ifPresent(a ->
                                    check(p.displayName() + " in " + block.name(),
                                            claims(after(s, h.person().displayName().split(" ")[0] + " took part in the "
                                                    + block.name())), a.change(), skinfolds));
                        }
                        blocks++;
                    }
                }
            }
        }
        // the demo academy has juniors and seniors with two or more rated visits in both periods, and a block
        assertTrue(checked > 40, "letters with a change checked: " + checked);
        assertTrue(blocks > 0, "letters with a block section: " + blocks);
    }

    @Test
    void aReadingIsLargerOnlyWhenTheExactAndThePrintedFiguresAgree() {
        BigDecimal err = new BigDecimal("0.3");
        // derived from the rule in LetterComposer.ComponentReading
        assertEquals(LetterComposer.ComponentReading.LARGER,
                LetterComposer.ComponentReading.of(true, new BigDecimal("0.4"), err));
        assertEquals(LetterComposer.ComponentReading.CLOSE,
                LetterComposer.ComponentReading.of(true, new BigDecimal("0.3"), err));
        assertEquals(LetterComposer.ComponentReading.CLOSE,
                LetterComposer.ComponentReading.of(false, new BigDecimal("-0.4"), err));
        assertEquals(LetterComposer.ComponentReading.WITHIN,
                LetterComposer.ComponentReading.of(false, new BigDecimal("-0.3"), err));
    }
}
