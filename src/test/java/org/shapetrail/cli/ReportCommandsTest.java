package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
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
import org.shapetrail.history.NoiseModel;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/** The report commands print the same numbers the analyses compute (demo database, regenerated). */
class ReportCommandsTest {
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

    static List<CSVRecord> csv(String... args) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(out.toString().split("\n\n")[0])).getRecords();
    }

    @Test
    void temReportMatchesTheNoiseModel() throws Exception {
        List<CSVRecord> rows = csv("tem", "--db", file.toString(), "--format", "csv");
        List<NoiseModel.TemRow> expected = builder.noise().temReport();
        assertEquals(expected.size(), rows.size());
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(expected.get(i).site().code(), rows.get(i).get("site"));
            assertEquals(String.format(Locale.ROOT, "%.3f", expected.get(i).estimate().duplicateTem()),
                    rows.get(i).get("tem"));
            assertEquals(String.valueOf(expected.get(i).estimate().people()), rows.get(i).get("people"));
        }
    }

    @Test
    void changesReportMatchesThePersonHistory() throws Exception {
        long id = builder.academy().people().stream().filter(p -> p.displayName().equals("Freya Breakwater"))
                .findFirst().orElseThrow().id();
        PersonHistory h = builder.history(builder.academy().person(id).orElseThrow());
        List<CSVRecord> rows = csv("changes", String.valueOf(id), "--db", file.toString(), "--format", "csv");
        assertEquals(h.changes().size() + 1, rows.size(), "consecutive changes and first to last");
        var block = h.changes().get(h.changes().size() - 1).verdict();
        CSVRecord r = rows.get(h.changes().size() - 1);
        assertEquals(String.format(Locale.ROOT, "%.2f", block.sad()), r.get("sad"));
        assertEquals(block.verdict().words(), r.get("verdict"));
        assertEquals("Imogen Tarrant's own TEM", r.get("repeatability"));
    }

    @Test
    void growthReportForASquadListsItsCurrentMembersWithTheCautions() throws Exception {
        StringWriter out = new StringWriter();
        int code = ShapetrailCli.execute(new String[] {"growth", "--squad", "rowing juniors", "--db", file.toString()},
                new PrintWriter(out), new PrintWriter(new StringWriter()));
        assertEquals(0, code);
        assertTrue(out.toString().contains("Estimates carry about ±0.6 years of error"));
        assertTrue(out.toString().contains("defer to the physio's clinical judgement"));
    }

    @Test
    void anUnknownSquadNamesTheSquadsThereAre() {
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(new String[] {"growth", "--squad", "Hockey", "--db", file.toString()},
                new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertEquals(2, code);
        assertTrue(err.toString().contains("There is no squad called \"Hockey\"; the squads are: Football U14"),
                err.toString());
    }
}
