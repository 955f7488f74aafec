package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.noise.Verdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * The headline figure a person reads and the verdict beside it agree everywhere: over every pair of
 * rated visits of the sample academy, and in what the command line prints.
 */
class VerdictAgreementTest {
    @TempDir
    static Path dir;
    static Path file;
    static HistoryBuilder builder;

    @BeforeAll
    static void setUp() throws Exception {
        file = dir.resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
    }

    /** The reading of a printed noise multiple: the thresholds of Verdict's Javadoc (1.00 and 0.77). */
    static Verdict reading(String printed) {
        BigDecimal m = new BigDecimal(printed);
        return m.compareTo(BigDecimal.ONE) >= 0 ? Verdict.BEYOND_NOISE
                : m.compareTo(new BigDecimal("0.77")) >= 0 ? Verdict.BORDERLINE : Verdict.WITHIN_NOISE;
    }

    @Test
    void overEveryPairOfRatedVisitsThePrintedMultipleReadsAsTheVerdict() {
        int pairs = 0;
        int beyond = 0;
        int borderline = 0;
        for (Person p : builder.academy().people()) {
            List<VisitResult> rated = builder.history(p).rated();
            for (int i = 0; i < rated.size(); i++) {
                for (int j = i + 1; j < rated.size(); j++) {
                    ChangeVerdict v = builder.verdict(rated.get(i), rated.get(j));
                    String shown = v.multipleText(Locale.ROOT);
                    assertEquals(reading(shown), v.verdict(), p.displayName() + " " + i + "→" + j + ": " + shown);
                    // the multiple is √(D²/χ²₀.₉₅(3)) (derived), and the shown figure never exceeds it
                    assertEquals(Math.sqrt(v.d2() / 7.814727903251178), v.noiseMultiple(), 1e-12);
                    assertTrue(new BigDecimal(shown).doubleValue() <= v.noiseMultiple() + 1e-12);
                    pairs++;
                    beyond += v.verdict() == Verdict.BEYOND_NOISE ? 1 : 0;
                    borderline += v.verdict() == Verdict.BORDERLINE ? 1 : 0;
                }
            }
        }
        // the demo has every kind of verdict, so each branch of the reading was exercised
        assertTrue(pairs > 1000 && beyond > 0 && borderline > 0, pairs + " " + beyond + " " + borderline);
    }

    @Test
    void theChangesCommandNeverPrintsAFigureAgainstItsVerdict() throws Exception {
        int rows = 0;
        for (Person p : builder.academy().people()) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            assertEquals(0, ShapetrailCli.execute(new String[] {"changes", String.valueOf(p.id()), "--db",
                    file.toString(), "--format", "csv"}, new PrintWriter(out), new PrintWriter(err)), err.toString());
            List<CSVRecord> records = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                    .parse(new StringReader(out.toString())).getRecords();
            PersonHistory h = builder.history(p);
            for (CSVRecord r : records) {
                assertEquals(reading(r.get("noise_multiple")).words(), r.get("verdict"), p.displayName() + " " + r);
                for (String c : List.of("endo", "meso", "ecto")) {
                    double change = Math.abs(Double.parseDouble(r.get(c + "_change")));
                    double mdc = Double.parseDouble(r.get(c + "_mdc95"));
                    // printed with the same rounding, so "yes" can only sit beside a change at least the MDC95
                    if (r.get(c + "_beyond_mdc95").equals("yes")) {
                        assertTrue(change >= mdc, p.displayName() + " " + c + " " + r);
                    } else {
                        assertTrue(change <= mdc, p.displayName() + " " + c + " " + r);
                    }
                }
                rows++;
            }
            assertTrue(records.size() >= h.changes().size());
        }
        assertTrue(rows > 200, "rows " + rows);
    }

    @Test
    void theBlockReportsVerdictsReadAsTheirFigures() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, ShapetrailCli.execute(new String[] {"block-report", "--db", file.toString(), "--format", "csv"},
                new PrintWriter(out), new PrintWriter(err)), err.toString());
        List<CSVRecord> records = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(out.toString().split("\n\n")[0])).getRecords();
        assertTrue(records.size() > 5);
        for (CSVRecord r : records) {
            assertEquals(reading(r.get("noise_multiple")).words(), r.get("verdict"), r.toString());
        }
    }
}
