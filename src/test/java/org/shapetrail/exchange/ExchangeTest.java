package org.shapetrail.exchange;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;
import org.shapetrail.store.demo.DemoAcademy;

class ExchangeTest {
    @TempDir
    Path dir;

    static final ImportOptions CREATE = new ImportOptions(null, false, true);

    /** The content that a trials export carries, independent of ids, as sorted lines. */
    static TreeSet<String> content(Academy a) {
        TreeSet<String> out = new TreeSet<>();
        Map<Long, Person> people = new java.util.HashMap<>();
        a.people().forEach(p -> people.put(p.id(), p));
        Map<Long, Measurer> ms = new java.util.HashMap<>();
        a.measurers().forEach(m -> ms.put(m.id(), m));
        for (Visit v : a.visits()) {
            Person p = people.get(v.personId());
            out.add(p.displayName() + "|" + p.birthDate() + "|" + p.sex() + "|" + p.letterLanguage() + "|" + v.measuredAt() + "|"
                    + ms.get(v.measurerId()).name() + "|" + v.context() + "|" + v.trials());
        }
        return out;
    }

    Path exportTrials(Path db) throws Exception {
        Path csv = dir.resolve("trials-" + db.getFileName() + ".csv");
        try (Database d = Database.open(db); Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            Exporter.trials(Academy.load(d), w);
        }
        return csv;
    }

    Academy importInto(Path target, Path csv, ImportOptions o) {
        try (Database d = Database.open(target)) {
            ImportPlan plan = Importer.dryRun(csv, Academy.load(d), o);
            assertTrue(plan.canCommit(), plan.summary() + " " + plan.rows().stream()
                    .filter(r -> r.outcome() == ImportPlan.Outcome.REJECTED).limit(3).toList());
            Importer.commit(d, plan);
            return Academy.load(d);
        }
    }

    @Test
    void exportThenImportIntoAnEmptyFileReproducesTheDemoAcademy() throws Exception {
        Path demo = dir.resolve("demo.sqlite");
        DemoAcademy.generate(demo);
        Academy original;
        try (Database d = Database.open(demo)) {
            original = Academy.load(d);
        }
        Academy copy = importInto(dir.resolve("copy.sqlite"), exportTrials(demo), CREATE);
        assertEquals(content(original), content(copy));
    }

    @Test
    void exportThenImportReproducesRandomFilesWithAwkwardNames() throws Exception {
        // property: for random small files (fixed seeds), export then import gives the same content
        String[] names = {"=HYPERLINK(\"http://example.invalid\",\"click\")", "Zoë Quennell", "O'Brien, Aoife",
            "+Plus Sign", "-Minus Sign", "@At Sign", "Νεφέλη Ανδρέου", "\"Quoted\" Name", "Semi; Colon 名前"};
        for (int seed = 1; seed <= 5; seed++) {
            Random rnd = new Random(seed);
            Path f = dir.resolve("random-" + seed + ".sqlite");
            try (Database d = Database.open(f)) {
                d.inTransaction(tx -> {
                    Measurer m = tx.measurers().insert("=cmd|' /C calc'!A0", "");
                    for (int i = 0; i < 4; i++) {
                        Person p = tx.people().insert(Person.draft(names[rnd.nextInt(names.length)] + " " + i,
                                rnd.nextBoolean() ? Sex.MALE : Sex.FEMALE, LocalDate.of(2008 + rnd.nextInt(6), 1 + rnd.nextInt(12), 1 + rnd.nextInt(28))));
                        for (int k = 0; k < 1 + rnd.nextInt(3); k++) {
                            double st = 140 + rnd.nextInt(400) / 10.0;
                            double tri = 6 + rnd.nextInt(80) / 10.0;
                            tx.visits().insert(new Visit(0, p.id(), LocalDateTime.of(2024, 1 + k, 10, 9 + i, 15), m.id(),
                                    rnd.nextBoolean() ? "-pre" : "post, block", "", List.of(
                                    SiteTrials.of(Site.STATURE, st, st), SiteTrials.of(Site.TRICEPS, tri, tri, tri))));
                        }
                    }
                    return null;
                });
            }
            Academy original;
            try (Database d = Database.open(f)) {
                original = Academy.load(d);
            }
            Academy copy = importInto(dir.resolve("random-copy-" + seed + ".sqlite"), exportTrials(f), CREATE);
            TreeSet<String> missingInCopy = new TreeSet<>(content(original));
            missingInCopy.removeAll(content(copy));
            TreeSet<String> extraInCopy = new TreeSet<>(content(copy));
            extraInCopy.removeAll(content(original));
            assertEquals(List.of(), new ArrayList<>(missingInCopy), "seed " + seed + " extra: " + extraInCopy);
        }
    }

    @Test
    void aFormulaNameIsExportedNeutralised() throws Exception {
        Path f = dir.resolve("formula.sqlite");
        try (Database d = Database.open(f)) {
            d.inTransaction(tx -> {
                Person p = tx.people().insert(Person.draft("=HYPERLINK(\"http://example.invalid\",\"x\")", Sex.MALE,
                        LocalDate.of(2010, 1, 1)));
                Measurer m = tx.measurers().insert("Ada Quarrington", "");
                return tx.visits().insert(new Visit(0, p.id(), LocalDateTime.of(2024, 1, 1, 9, 0), m.id(), "", "",
                        List.of(SiteTrials.of(Site.STATURE, 150.0, 150.0))));
            });
        }
        String csv = Files.readString(exportTrials(f));
        assertTrue(csv.contains("\"'=HYPERLINK(\"\"http://example.invalid\"\",\"\"x\"\")\""), csv);
        assertFalse(csv.contains(",=HYPERLINK"));
        assertEquals("'@x", CsvSafety.text("@x"));
        assertEquals("'\tx", CsvSafety.text("\tx"));
        assertEquals("plain", CsvSafety.text("plain"));
    }

    // ---- malformed files: clear errors, nothing written ----------------------------------------------

    Path fileWith(String name, String content) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, content, StandardCharsets.UTF_8);
        return p;
    }

    ImportPlan dry(Path csv, Path db) {
        try (Database d = Database.open(db)) {
            return Importer.dryRun(csv, Academy.load(d), CREATE);
        }
    }

    @Test
    void anEmptyFileIsRefusedWithAMessage() throws Exception {
        ImportPlan p = dry(fileWith("empty.csv", ""), dir.resolve("e.sqlite"));
        assertFalse(p.canCommit());
        assertEquals(List.of("It is empty: there is no header row."), p.fileProblems());
    }

    @Test
    void aWrongDelimiterOrMissingColumnsAreNamed() throws Exception {
        ImportPlan pipe = dry(fileWith("pipe.csv", "name|birth_date|sex|date|measurer|stature\nA|2010-01-01|M|2024-01-01|X|150\n"),
                dir.resolve("p.sqlite"));
        assertTrue(pipe.fileProblems().get(0).startsWith("No column says who was measured"), pipe.fileProblems().toString());
        ImportPlan noDate = dry(fileWith("nodate.csv", "name,birth_date,sex,measurer,stature\nA,2010-01-01,M,X,150\n"),
                dir.resolve("n.sqlite"));
        assertEquals(List.of("No column holds the visit date."), noDate.fileProblems());
    }

    @Test
    void textInANumericCellAndDuplicateVisitsAreRejectedWithLineNumbersAndNothingIsWritten() throws Exception {
        Path db = dir.resolve("t.sqlite");
        Path csv = fileWith("bad.csv", "name,birth_date,sex,date,measurer,stature 1,stature 2,triceps 1,triceps 2\r\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,Ada Quarrington,150.0,150.2,9.0,9.2\n"
                + "Ada Pelling,2010-03-04,F,2024-01-10,Ada Quarrington,150.0,150.2,9.0,9.2\r\n"
                + "Bea Pelling,2011-05-06,F,2024-01-10,Ada Quarrington,abc,150.2,9.0,9.2\n");
        String before;
        try (Database d = Database.open(db)) {
            before = ContentDigest.of(d);
        }
        ImportPlan p = dry(csv, db);
        assertEquals(List.of(new ImportPlan.RowReport(2, ImportPlan.Outcome.IMPORTED, ""),
                new ImportPlan.RowReport(3, ImportPlan.Outcome.REJECTED,
                        "the same visit as line 2 (person, date, time and measurer)"),
                new ImportPlan.RowReport(4, ImportPlan.Outcome.REJECTED,
                        "Stature \"abc\" is not a number; enter the value in cm.")), p.rows());
        try (Database d = Database.open(db)) {
            assertThrows(IllegalStateException.class, () -> Importer.commit(d, p));
            assertEquals(before, ContentDigest.of(d));
        }
    }

    @Test
    void aSemicolonFileWithDecimalCommasAndDeclaredUnitsIsConverted() throws Exception {
        Path csv = fileWith("semi.csv", "\uFEFFName;DOB;Sex;Date;Measurer;Height (m);Weight [lb];Triceps (cm) 1;Triceps (cm) 2\n"
                + "Ada Pelling;04.03.2010;F;10/01/2024;Ada Quarrington;1,50;110,2;0,90;0,92\n");
        Academy a = importInto(dir.resolve("s.sqlite"), csv, CREATE);
        Visit v = a.visits().get(0);
        // declared units converted: 1,50 m = 150 cm; 110.2 lb / 2.2046 = 49.99 kg; 0,90 cm = 9.0 mm (definitions)
        assertEquals(150.0, v.trialsAt(Site.STATURE).orElseThrow().values().get(0), 1e-9);
        assertEquals(110.2 / 2.2046226218, v.trialsAt(Site.BODY_MASS).orElseThrow().values().get(0), 1e-9);
        assertEquals(List.of(9.0, 9.2), v.trialsAt(Site.TRICEPS).orElseThrow().values().stream()
                .map(x -> Math.round(x * 1e9) / 1e9).toList());
        assertEquals(LocalDateTime.of(2024, 1, 10, 9, 0), v.measuredAt());
        assertEquals(LocalDate.of(2010, 3, 4), a.people().get(0).birthDate());
    }

    @Test
    void aStatureInMetresWithoutADeclaredUnitIsRejectedWithTheHint() throws Exception {
        Path csv = fileWith("m.csv", "name,birth_date,sex,date,measurer,stature\nAda Pelling,2010-03-04,F,2024-01-10,X,1.50\n");
        ImportPlan p = dry(csv, dir.resolve("m.sqlite"));
        assertEquals("Stature 1.5 looks like metres; enter 150.0 cm.", p.rows().get(0).reason());
    }

    @Test
    void aLetterLanguageComesInWithANewPersonAndAWrongOrContradictingOneIsRefused() throws Exception {
        Path f = dir.resolve("lang.sqlite");
        Path csv = fileWith("lang.csv", "name,birth_date,sex,letter_language,date,measurer,stature\n"
                + "Ada Pelling,2010-03-04,F,pt,2024-01-10,X,150\n");
        Academy a = importInto(f, csv, CREATE);
        assertEquals("pt", a.people().get(0).letterLanguage());
        Path wrong = fileWith("lang2.csv", "name,birth_date,sex,letter_language,date,measurer,stature\n"
                + "Ada Pelling,2010-03-04,F,fr,2024-02-10,X,151\n"
                + "Ada Pelling,2010-03-04,F,es,2024-03-10,X,152\n");
        ImportPlan p = dry(wrong, f);
        assertEquals("letter language \"fr\" is not en, es or pt (leave it empty for the academy's own)",
                p.rows().get(0).reason());
        assertEquals("letter language es contradicts the file, where Ada Pelling's letters are in pt; correct the row,"
                + " or the person (Edit person…)", p.rows().get(1).reason());
    }

    @Test
    void newPeopleAreCreatedOnlyWhenAllowed() throws Exception {
        Path csv = fileWith("new.csv", "name,birth_date,sex,date,measurer,stature\nAda Pelling,2010-03-04,F,2024-01-10,X,150\n");
        try (Database d = Database.open(dir.resolve("no.sqlite"))) {
            ImportPlan p = Importer.dryRun(csv, Academy.load(d), ImportOptions.standard());
            assertEquals("Ada Pelling (born 2010-03-04) is not in the file; allow new people to add them; measurer X"
                    + " is not in the file; allow new measurers to add them", p.rows().get(0).reason());
        }
    }

    @Test
    void aFiftyMegabyteFileWithOneBadRowAtTheEndWritesNothing() throws Exception {
        Path csv = dir.resolve("big.csv");
        try (Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("name,birth_date,sex,date,time,measurer,site,trial,value\n");
            long bytes = 0;
            int visit = 0;
            String[] sites = {"stature", "triceps"};
            while (bytes < 50L * 1024 * 1024) {
                for (String s : sites) {
                    for (int t = 1; t <= 2; t++) {
                        String line = "Athlete " + (visit % 500) + ",2010-01-01,M," + LocalDate.of(2000, 1, 1)
                                .plusDays(visit / 500) + ",09:00,Ada Quarrington," + s + "," + t + ","
                                + (s.equals("stature") ? "150.0" : "9.0") + "\n";
                        w.write(line);
                        bytes += line.length();
                    }
                }
                visit++;
            }
            w.write("Athlete 1,2010-01-01,M,2019-01-01,09:00,Ada Quarrington,stature,1,tall\n");
        }
        Path db = dir.resolve("big.sqlite");
        ImportPlan p = dry(csv, db);
        assertFalse(p.canCommit());
        ImportPlan.RowReport last = p.rows().get(p.rows().size() - 1);
        assertEquals(ImportPlan.Outcome.REJECTED, last.outcome());
        assertTrue(last.reason().contains("Stature \"tall\" is not a number"), last.reason());
        try (Database d = Database.open(db)) {
            assertEquals(List.of(0, 0, 0, 0, 0, 0, 0, 0, 0), ContentDigest.rowCounts(d)); // one count per table
        }
    }

    @Test
    void columnSuggestionsFromSpreadsheetHeaders() {
        assertEquals(new Column("Height (cm)", Column.Role.SITE_VALUE, Site.STATURE, 0, InputUnit.CM),
                ColumnMapper.suggest("Height (cm)"));
        assertEquals(new Column("Triceps 2", Column.Role.SITE_VALUE, Site.TRICEPS, 2, null),
                ColumnMapper.suggest("Triceps 2"));
        assertEquals(new Column("stature_cm", Column.Role.SITE_VALUE, Site.STATURE, 0, InputUnit.CM),
                ColumnMapper.suggest("stature_cm"));
        assertEquals(Column.Role.BIRTH_DATE, ColumnMapper.suggest("DOB").role());
        assertEquals(Column.Role.IGNORED, ColumnMapper.suggest("Shoe size").role());
    }

    @Test
    void spanishAndPortugueseHeadersAreReadToo() {
        // the sites as the window names them in each language (site.* in the bundles), accents or not,
        // with a trial number or a unit; the people's and visits' columns by their usual words
        assertEquals(new Column("Tríceps 2", Column.Role.SITE_VALUE, Site.TRICEPS, 2, null),
                ColumnMapper.suggest("Tríceps 2"));
        assertEquals(new Column("Pliegue supraespinal (mm)", Column.Role.SITE_VALUE, Site.SUPRASPINALE, 0, InputUnit.MM),
                ColumnMapper.suggest("Pliegue supraespinal (mm)"));
        assertEquals(new Column("Perímetro da cintura", Column.Role.SITE_VALUE, Site.WAIST, 0, null),
                ColumnMapper.suggest("Perímetro da cintura"));
        assertEquals(new Column("Masa corporal toma 1", Column.Role.SITE_VALUE, Site.BODY_MASS, 1, null),
                ColumnMapper.suggest("Masa corporal toma 1"));
        assertEquals(new Column("Altura sentado_cm", Column.Role.SITE_VALUE, Site.SITTING_HEIGHT, 0, InputUnit.CM),
                ColumnMapper.suggest("Altura sentado_cm"));
        assertEquals(Column.Role.BIRTH_DATE, ColumnMapper.suggest("Fecha de nacimiento").role());
        assertEquals(Column.Role.MEASURER, ColumnMapper.suggest("Avaliador").role());
        assertEquals(Column.Role.NAME, ColumnMapper.suggest("Nombre").role());
    }
}
