package org.shapetrail.exchange;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.cli.ShapetrailCli;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.StoreException;
import org.shapetrail.store.Visit;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * The one-pass import (read, check and write at once, on two threads) gives the same report as the dry run
 * and the same content as the dry run followed by its commit, and writes nothing when anything is rejected.
 */
class OnePassImportTest {
    @TempDir
    Path dir;

    static final ImportOptions CREATE = new ImportOptions(null, false, true);

    Path demoExport() throws Exception {
        Path demo = dir.resolve("demo.sqlite");
        DemoAcademy.generate(demo);
        Path csv = dir.resolve("demo.csv");
        try (Database d = Database.open(demo); Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            Exporter.trials(Academy.load(d), w);
        }
        return csv;
    }

    @Test
    void theDemoAcademyImportsInOnePassAsInTwoSteps() throws Exception {
        Path csv = demoExport();
        Path twoSteps = dir.resolve("two.sqlite");
        ImportPlan dry;
        try (Database d = Database.open(twoSteps)) {
            dry = Importer.dryRun(csv, Academy.load(d), CREATE);
            Importer.commit(d, dry);
        }
        Path onePass = dir.resolve("one.sqlite");
        try (Database d = Database.open(onePass)) {
            ImportPlan plan = Importer.importFile(d, csv, CREATE, null);
            assertEquals(dry.rows(), plan.rows());
            assertEquals(dry.visits().size(), plan.written());
            assertEquals(List.of(), d.inTransaction(tx -> tx.visits().incompleteVisits()));
            assertEquals("ok", d.integrityCheck());
        }
        try (Database a = Database.open(twoSteps); Database b = Database.open(onePass)) {
            assertEquals(ExchangeTest.content(Academy.load(a)), ExchangeTest.content(Academy.load(b)));
        }
    }

    @Test
    void rowsOfOneVisitScatteredThroughTheFileAreGatheredWithTheirCounts() throws Exception {
        // a long-layout file sorted by site, then shuffled (fixed seed): every visit's rows come apart
        List<String> rows = new ArrayList<>();
        String[][] sites = {{"stature", "150.0", "150.2"}, {"body_mass", "40.0", "40.1"}, {"triceps", "9.0", "9.2"},
            {"subscapular", "7.0", "7.1"}};
        for (String[] s : sites) {
            for (int person = 0; person < 30; person++) {
                for (int t = 1; t <= 2; t++) {
                    rows.add("Runner " + person + ",2011-02-03,F,2024-05-06,Ada Quarrington," + s[0] + "," + t + ","
                            + s[t]);
                }
            }
        }
        Collections.shuffle(rows, new Random(7));
        Path csv = dir.resolve("scattered.csv");
        Files.writeString(csv, "name,birth_date,sex,date,measurer,site,trial,value\n" + String.join("\n", rows) + "\n");
        try (Database d = Database.open(dir.resolve("s.sqlite"))) {
            ImportPlan plan = Importer.importFile(d, csv, CREATE, null);
            assertEquals(30, plan.written(), plan.summary()); // one visit per runner, 30 runners in the file
            Academy a = Academy.load(d);
            assertEquals(30, a.visits().size());
            for (Visit v : a.visits()) {
                assertEquals(8, v.trialCount()); // 4 sites × 2 trials, by construction of the file
                assertEquals(List.of(150.0, 150.2), v.trialsAt(Site.STATURE).orElseThrow().values());
            }
            assertEquals(List.of(), d.inTransaction(tx -> tx.visits().incompleteVisits()));
        }
    }

    @Test
    void oneBadRowAtTheEndOfALargeFileLeavesTheFileAsItWas() throws Exception {
        Path csv = dir.resolve("big.csv");
        try (Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("name,birth_date,sex,date,time,measurer,site,trial,value\n");
            for (int visit = 0; visit < 20_000; visit++) {
                String head = "Athlete " + (visit % 400) + ",2010-01-01,M," + LocalDate.of(2000, 1, 1).plusDays(visit / 400)
                        + ",09:00,Ada Quarrington,";
                w.write(head + "stature,1,150.0\n" + head + "stature,2,150.1\n" + head + "triceps,1,9.0\n");
            }
            w.write("Athlete 1,2010-01-01,M,2019-01-01,09:00,Ada Quarrington,stature,1,tall\n");
        }
        Path db = dir.resolve("big.sqlite");
        String before;
        try (Database d = Database.open(db)) {
            d.inTransaction(tx -> tx.people().insert(Person.draft("Already Here", Sex.FEMALE, LocalDate.of(2010, 1, 1))));
            before = ContentDigest.of(d);
        }
        try (Database d = Database.open(db)) {
            ImportPlan plan = Importer.importFile(d, csv, CREATE, null);
            assertEquals(0, plan.written());
            assertFalse(plan.canCommit());
            ImportPlan.RowReport last = plan.rows().get(plan.rows().size() - 1);
            assertTrue(last.reason().contains("Stature \"tall\" is not a number"), last.reason());
            assertEquals(60_001, plan.rows().size()); // 20,000 visits × 3 rows + the bad one, as written above
            assertEquals(before, ContentDigest.of(d));
        }
    }

    @Test
    void aGapInATrialNumberIsRejectedWithTheSiteAndTheFix() throws Exception {
        Path csv = dir.resolve("gap.csv");
        Files.writeString(csv, "name,birth_date,sex,date,measurer,site,trial,value\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,X,stature,1,150.0\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,X,triceps,1,9.0\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,X,triceps,3,9.1\n");
        try (Database d = Database.open(dir.resolve("g.sqlite"))) {
            ImportPlan plan = Importer.importFile(d, csv, CREATE, null);
            assertEquals("Triceps skinfold trial 3 is given without trial 2; number a site's trials 1, 2, 3 in order.",
                    plan.rows().get(0).reason());
            assertEquals(0, plan.written());
            assertEquals(Integer.valueOf(0), d.inTransaction(tx -> tx.visits().count()));
        }
    }

    @Test
    void theCommandLineCommitWritesInOnePassAndReportsTheCount() throws Exception {
        Path csv = dir.resolve("cli.csv");
        Files.writeString(csv, "name,birth_date,sex,date,measurer,stature 1,stature 2\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,Ada Quarrington,150.0,150.2\n"
                + "Bea Pelling,2011-05-06,F,2024-01-10,Ada Quarrington,140.0,140.1\n");
        Path db = dir.resolve("cli.sqlite");
        Database.open(db).close(); // --db names an existing file
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(new String[] {"import", "--db", db.toString(), "--commit", "--create-missing",
            csv.toString()}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        assertTrue(out.toString().contains("Imported 2 visits."), out.toString()); // plural wording of import.done
        try (Database d = Database.open(db)) {
            assertEquals(Integer.valueOf(2), d.inTransaction(tx -> tx.visits().count()));
        }
    }

    @Test
    void theBulkWriterRefusesTrialsBeforeTheirVisitAndCountsThatDoNotAddUp() throws Exception {
        try (Database d = Database.open(dir.resolve("bulk.sqlite"))) {
            long person = d.inTransaction(tx -> tx.people().insert(Person.draft("Ada Pelling", Sex.FEMALE,
                    LocalDate.of(2010, 3, 4))).id());
            long measurer = d.inTransaction(tx -> tx.measurers().insert("Ada Quarrington", "").id());
            assertThrows(StoreException.class, () -> d.inTransaction(tx -> {
                try (var bulk = tx.visits().bulkWriter()) {
                    bulk.trial(bulk.firstId(), Site.STATURE, 1, 150.0);
                }
                return null;
            }));
            LocalDateTime when = LocalDateTime.of(2024, 1, 10, 9, 0);
            Visit twoTrials = new Visit(0, person, when, measurer, "", "", List.of(SiteTrials.of(Site.STATURE, 150.0, 150.2)));
            assertThrows(StoreException.class, () -> d.inTransaction(tx -> {
                try (var bulk = tx.visits().bulkWriter()) {
                    bulk.visit(bulk.firstId(), person, when, measurer, "", "", 2);
                    bulk.trial(bulk.firstId(), Site.STATURE, 1, 150.0); // the second trial never comes
                    bulk.finish(List.of(twoTrials));
                }
                return null;
            }));
            assertEquals(Integer.valueOf(0), d.inTransaction(tx -> tx.visits().count()));
            // a visit the core refuses is refused at the end too, unless the same trials passed the check before
            Visit metres = new Visit(0, person, when, measurer, "", "", List.of(SiteTrials.of(Site.STATURE, 1.50)));
            assertThrows(org.shapetrail.store.InvalidVisitException.class, () -> d.inTransaction(tx -> {
                try (var bulk = tx.visits().bulkWriter()) {
                    assertFalse(bulk.check(0, metres.trials()).isEmpty(), "stature in metres");
                    bulk.visit(bulk.firstId(), person, when, measurer, "", "", 1);
                    bulk.trial(bulk.firstId(), Site.STATURE, 1, 1.50);
                    bulk.finish(List.of(metres));
                }
                return null;
            }));
            assertEquals(Integer.valueOf(0), d.inTransaction(tx -> tx.visits().count()));
            d.inTransaction(tx -> {
                try (var bulk = tx.visits().bulkWriter()) {
                    bulk.visit(bulk.firstId(), person, when, measurer, "", "", 1);
                    bulk.trial(bulk.firstId(), Site.STATURE, 1, 150.0);
                    bulk.trial(bulk.firstId(), Site.STATURE, 2, 150.2); // came later: the count is corrected
                    bulk.finish(List.of(twoTrials));
                }
                return null;
            });
            assertEquals(List.of(), d.inTransaction(tx -> tx.visits().incompleteVisits()));
            assertEquals(List.of(150.0, 150.2), d.inTransaction(tx -> tx.visits().all()).get(0)
                    .trialsAt(Site.STATURE).orElseThrow().values());
        }
    }
}
