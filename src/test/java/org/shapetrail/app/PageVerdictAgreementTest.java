package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.BlockReview;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.noise.Verdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * On the screens of the sample academy, every printed noise multiple reads as the verdict beside it:
 * the people list, the person page (latest change and visit table) and the block page, in a locale with
 * a decimal comma too.
 */
class PageVerdictAgreementTest {
    @TempDir
    Path dir;

    /** "1.43× beyond noise" or "0,81× borderline" in a cell; "…: the change is 1.43 times the noise limit" in prose. */
    static final Pattern CELL = Pattern.compile("(\\d+[.,]\\d\\d)× (beyond noise|borderline|within noise)");
    static final Pattern PROSE = Pattern.compile("(beyond noise|borderline|within noise): the change is (\\d+[.,]\\d\\d)"
            + " times the noise limit");

    /** The thresholds of Verdict's Javadoc: 1.00 and 0.77. */
    static String reading(String printed) {
        double m = Double.parseDouble(printed.replace(',', '.'));
        return m >= 1.0 ? "beyond noise" : m >= 0.77 ? "borderline" : "within noise";
    }

    static int checkAll(String text, String where) {
        int n = 0;
        Matcher c = CELL.matcher(text);
        while (c.find()) {
            assertEquals(reading(c.group(1)), c.group(2), where + ": " + text);
            n++;
        }
        Matcher p = PROSE.matcher(text);
        while (p.find()) {
            assertEquals(reading(p.group(2)), p.group(1), where + ": " + text);
            n++;
        }
        return n;
    }

    @Test
    void everyScreenOfTheSampleAcademyReadsItsFiguresAsItsVerdicts() throws Exception {
        Path f = dir.resolve("demo.sqlite");
        DemoAcademy.generate(f);
        HistoryBuilder b;
        try (Database db = Database.open(f)) {
            b = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        int checked = 0;
        for (Locale locale : new Locale[] {Locale.UK, Locale.forLanguageTag("es-ES")}) {
            for (Person p : b.academy().people()) {
                PersonHistory h = b.history(p);
                PersonPage page = PersonPage.of(h, "", locale);
                checked += checkAll(page.latestChange(), p.displayName() + " latest");
                for (VisitLine line : page.visits()) {
                    checked += checkAll(line.verdict(), p.displayName() + " " + line.date());
                }
                PersonRow row = WorkbenchViewModel.row(b.academy(), h);
                if (row.verdict() != null) {
                    assertEquals(Verdict.ofMultiple(row.multiple()), row.verdict(), p.displayName());
                    checked += checkAll(Numbers.fmt(locale, row.multiple(), 2) + "× " + row.verdict().words(),
                            p.displayName() + " row");
                }
            }
            for (var block : b.academy().blocks()) {
                BlockPage page = BlockPage.of(BlockReview.of(b, block, BlockReview.DEFAULT_WINDOW_DAYS), locale);
                for (String a : page.athletes()) {
                    checked += checkAll(a, block.name());
                }
            }
        }
        assertTrue(checked > 1000, "figures checked: " + checked);
    }
}
