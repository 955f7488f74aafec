package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.cli.ShapetrailCli;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.letters.LetterBatch;
import org.shapetrail.letters.LetterComposer;
import org.shapetrail.letters.LetterSettings;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.Consent;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/**
 * Names and texts that try to break an export or a letter: formula leaders, quotes, right-to-left, CJK
 * and emoji text, and names that look like paths. Exported cells are neutralised and round-trip; letters
 * either carry the name as written or are refused with a message (never an empty or garbled name); no
 * file lands outside the chosen folder; an existing file is never replaced without asking.
 */
class ExportSafetyTest {
    /** Names a spreadsheet, a file system or a font may trip over. */
    static final List<String> NAMES = List.of("=HYPERLINK(\"http://example.invalid\",\"x\")", "+44 Plus", "-Minus Lead",
            "@Handle Name", "'=Quoted Leader", "'Ofa Tonga", "\"Double\" Quote", "Zoë Ørnsdóttir",
            "Νεφέλη Ανδρέου", "Ярослава Ковальчук", "מאיה כהן", "ليلى حداد", "王小明", "Emoji 🏉 Runner",
            "../../etc/passwd", "C:\\Windows\\win.ini", "a/b\\c:d*e?f\"g<h>i|j");

    @TempDir
    Path dir;

    static String[] cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    Path fileWithTheNames() {
        Path f = dir.resolve("names.sqlite");
        try (Database d = Database.open(f)) {
            d.inTransaction(tx -> {
                long m = tx.measurers().insert("=cmd|' /C calc'!A0", "").id();
                int k = 0;
                for (String name : NAMES) {
                    Person p = tx.people().insert(new Person(0, name, k % 2 == 0 ? Sex.FEMALE : Sex.MALE,
                            LocalDate.of(2005, 1, 1 + k), null, null, "\tnote\r\nwith =SUM(A1) " + name, Consent.NONE,
                            null));
                    tx.visits().insert(new Visit(0, p.id(), LocalDateTime.of(2025, 3, 1 + k, 9, 0), m, "@" + name,
                            "+note", List.of(SiteTrials.of(Site.STATURE, 170.0, 170.1),
                            SiteTrials.of(Site.BODY_MASS, 60.0, 60.1))));
                    k++;
                }
                return null;
            });
        }
        return f;
    }

    @Test
    void exportedCellsAreNeutralisedAndComeBackExactly() throws Exception {
        Path f = fileWithTheNames();
        Path csv = dir.resolve("trials.csv");
        String[] r = cli("export", "trials", "--db", f.toString(), "--out", csv.toString());
        assertEquals("0", r[0], r[2]);
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(Files.newBufferedReader(csv, StandardCharsets.UTF_8)).getRecords();
        for (CSVRecord row : rows) {
            for (String col : List.of("name", "measurer", "context")) {
                char c = row.get(col).charAt(0);
                assertFalse(c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r',
                        col + " would run as a formula: " + row.get(col));
            }
        }
        Path copy = dir.resolve("copy.sqlite");
        Database.open(copy).close();
        r = cli("import", "--db", copy.toString(), "--create-missing", "--commit", csv.toString());
        assertEquals("0", r[0], r[1] + r[2]);
        try (Database a = Database.open(f); Database b = Database.open(copy)) {
            Academy x = Academy.load(a);
            Academy y = Academy.load(b);
            assertEquals(x.people().stream().map(Person::displayName).sorted().toList(),
                    y.people().stream().map(Person::displayName).sorted().toList());
            assertEquals(x.measurers().get(0).name(), y.measurers().get(0).name());
            assertEquals(x.visits().stream().map(Visit::context).sorted().toList(),
                    y.visits().stream().map(Visit::context).sorted().toList());
        }
    }

    @Test
    void lettersCarryTheNameAsWrittenOrAreRefusedInWordsAndStayInTheirFolder() throws Exception {
        Path f = fileWithTheNames();
        HistoryBuilder b;
        try (Database d = Database.open(f)) {
            b = HistoryBuilder.of(Academy.load(d), AnalysisSettings.standard());
        }
        LetterComposer c = new LetterComposer(b, new LetterSettings("Saltmarsh Bay Sports Academy", "Morwenna Tregear",
                "", "the office", LocalDate.of(2025, 1, 1), LocalDate.of(2025, 12, 31), false), Locale.UK);
        Path folder = Files.createDirectories(dir.resolve("letters"));
        var everyone = b.academy().people().stream().map(b::history).toList();
        LetterBatch.Result result = LetterBatch.write(c, everyone, folder, false, "", (x, y) -> { }, () -> false);
        try (Stream<Path> outside = Files.list(dir)) {
            assertEquals(List.of("letters", "names.sqlite"), outside.map(p -> p.getFileName().toString())
                    .filter(n -> !n.startsWith("names.sqlite-")).sorted().toList(), "nothing written outside the folder");
        }
        for (Path letter : result.letters()) {
            assertEquals(folder.toAbsolutePath().normalize(), letter.getParent());
            assertTrue(letter.getFileName().toString().matches("letter-\\d{4}(-[a-z0-9-]+)?\\.pdf"), letter.toString());
        }
        int covered = 0;
        for (var h : everyone) {
            String name = h.person().displayName();
            Path letter = folder.resolve(LetterBatch.fileName(h.person().id(), name));
            // Latin, Greek and Cyrillic are in the font; Hebrew, Arabic, CJK and emoji are not
            boolean inFont = name.codePoints().allMatch(cp -> cp < 0x0590 || Character.isWhitespace(cp));
            if (inFont) {
                try (PDDocument d = Loader.loadPDF(letter.toFile())) {
                    assertTrue(new PDFTextStripper().getText(d).contains(name), name);
                }
                covered++;
            } else {
                assertFalse(Files.exists(letter), "no letter with a missing or garbled name: " + name);
                assertTrue(result.refused().stream().anyMatch(w -> w.startsWith("The letter for " + name
                        + " was not written: ")), name + " " + result.refused());
            }
        }
        assertEquals(NAMES.size() - 4, covered);
        assertEquals(4, result.refused().size());
        // a second run into the same folder asks first: nothing is replaced
        byte[] before = Files.readAllBytes(result.letters().get(0));
        try {
            LetterBatch.write(c, everyone, folder, false, "add --overwrite", (x, y) -> { }, () -> false);
            throw new AssertionError("an existing letter was replaced without asking");
        } catch (org.shapetrail.ShapetrailException e) {
            assertTrue(e.getMessage().endsWith("; choose another name or folder, or add --overwrite to replace them."
                    + " Nothing was written."), e.getMessage());
        }
        assertArrayEquals(before, Files.readAllBytes(result.letters().get(0)));
    }

    @Test
    void exportAndBackupNeverReplaceAFileWithoutBeingAsked() throws Exception {
        Path f = fileWithTheNames();
        Path out = dir.resolve("existing.csv");
        Files.writeString(out, "keep me");
        for (String[] args : List.of(new String[] {"export", "visits", "--db", f.toString(), "--out", out.toString()},
                new String[] {"backup", "--db", f.toString(), out.toString()},
                new String[] {"export-person", "1", "--db", f.toString(), "--out", out.toString()})) {
            String[] r = cli(args);
            assertEquals("2", r[0], String.join("\n", r));
            assertEquals(out + " already exists; choose another name or folder, or add --overwrite to replace it."
                    + " Nothing was written.\n", r[2]);
            assertEquals("keep me", Files.readString(out));
        }
        String[] r = cli("export", "visits", "--db", f.toString(), "--out", out.toString(), "--overwrite");
        assertEquals("0", r[0], r[2]);
        assertTrue(Files.readString(out).contains("person_id"));
    }
}
