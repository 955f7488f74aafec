package org.shapetrail.exchange;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The import's own CSV reader against Commons CSV (the reference library) with the same settings. */
class CsvRowsTest {
    @TempDir
    Path dir;

    /** Header and records as Commons CSV reads them, or the failure's class when it refuses the text. */
    static Object commons(Path file, char delimiter) {
        try (CSVParser p = CsvInput.parser(file, delimiter)) {
            List<List<String>> out = new ArrayList<>();
            out.add(p.getHeaderNames());
            for (CSVRecord r : p) {
                out.add(r.toList());
            }
            return out;
        } catch (IOException | java.io.UncheckedIOException | IllegalStateException | IllegalArgumentException e) {
            return "refused";
        }
    }

    static Object ours(Path file, char delimiter, int buffer) {
        try (CsvRows rows = new CsvRows(file, delimiter, buffer)) {
            List<List<String>> out = new ArrayList<>();
            out.add(rows.header());
            while (rows.next()) {
                List<String> cells = new ArrayList<>();
                for (int i = 0; i < rows.size(); i++) {
                    cells.add(rows.get(i));
                }
                out.add(cells);
            }
            return out;
        } catch (IOException e) {
            return "refused";
        }
    }

    @Test
    void readsRandomTextsExactlyAsCommonsCsvDoes() throws Exception {
        // property over 3,000 random texts (fixed seed) made of the characters that matter to the dialect
        String[] pieces = {"a", "b", "7.5", " ", "\t", ",", ";", "\"", "\"\"", "\r", "\n", "\r\n", "é", "Ω", "'=x"};
        Random rnd = new Random(20261201);
        int agreedRefusals = 0;
        for (int n = 0; n < 3000; n++) {
            StringBuilder sb = new StringBuilder();
            if (rnd.nextInt(10) == 0) {
                sb.append('\uFEFF');
            }
            int k = rnd.nextInt(40);
            for (int i = 0; i < k; i++) {
                sb.append(pieces[rnd.nextInt(pieces.length)]);
            }
            Path f = dir.resolve("r" + n + ".csv");
            Files.writeString(f, sb.toString(), StandardCharsets.UTF_8);
            char delimiter = rnd.nextBoolean() ? ',' : ';';
            Object expected = commons(f, delimiter);
            int buffer = 1 + rnd.nextInt(8);
            assertEquals(expected, ours(f, delimiter, buffer), "text " + escape(sb.toString()) + " buffer " + buffer);
            if (expected.equals("refused")) {
                agreedRefusals++;
            }
        }
        assertTrue(agreedRefusals > 50, "the random texts should include broken quotes: " + agreedRefusals);
    }

    static String escape(String s) {
        return s.replace("\r", "\\r").replace("\n", "\\n").replace("\t", "\\t");
    }

    @Test
    void plainDecimalsAreReadExactlyAsDoubleParseDoubleReadsThem() throws Exception {
        // property over 20,000 random decimals (fixed seed) against the JDK's correctly rounded parser
        Random rnd = new Random(42);
        StringBuilder csv = new StringBuilder("v\n");
        List<String> texts = new ArrayList<>();
        for (int i = 0; i < 20_000; i++) {
            String digits = Long.toString(Math.abs(rnd.nextLong()) % 1_000_000_000_000_000L);
            int cut = rnd.nextInt(digits.length() + 1);
            String t = (rnd.nextInt(5) == 0 ? "-" : "") + digits.substring(0, cut)
                    + (rnd.nextBoolean() ? "." + digits.substring(cut) : digits.substring(cut));
            if (t.equals("-") || t.isEmpty() || t.equals(".") || t.equals("-.")) {
                t = "0.5";
            }
            texts.add(t);
            csv.append(t).append('\n');
        }
        Path f = dir.resolve("numbers.csv");
        Files.writeString(f, csv.toString(), StandardCharsets.UTF_8);
        int fast = 0;
        try (CsvRows rows = new CsvRows(f, ',')) {
            for (String t : texts) {
                assertTrue(rows.next());
                double v = rows.plainDecimal(0, '.');
                if (!Double.isNaN(v)) {
                    fast++;
                    assertEquals(Double.doubleToLongBits(Double.parseDouble(t)), Double.doubleToLongBits(v), t);
                } else {
                    assertTrue(t.replace("-", "").replace(".", "").length() > 15, "only long numbers leave the fast path: " + t);
                }
            }
        }
        assertTrue(fast > 10_000, "most random decimals are plain: " + fast);
    }

    @Test
    void aRecordsLineIsTheLineItStartsOn() throws Exception {
        Path f = dir.resolve("lines.csv");
        Files.writeString(f, "name,note\r\nA,x\n\nB,\"two\nlines\"\rC,last", StandardCharsets.UTF_8);
        try (CsvRows rows = new CsvRows(f, ',', 4)) {
            List<Long> lines = new ArrayList<>();
            while (rows.next()) {
                lines.add(rows.line());
            }
            // counted by hand: header line 1, A on 2, an empty line 3, B on 4 (its cell runs onto 5), C on 6
            assertEquals(List.of(2L, 4L, 6L), lines);
        }
    }

    @Test
    void textThatIsNotUtf8IsRefused() throws Exception {
        Path f = dir.resolve("latin1.csv");
        Files.write(f, "name,x\nZo\u00eb,1\n".getBytes(StandardCharsets.ISO_8859_1));
        assertThrows(MalformedInputException.class, () -> {
            try (CsvRows rows = new CsvRows(f, ',')) {
                while (rows.next()) {
                    rows.size();
                }
            }
        });
    }

    @Test
    void equalCellsCompareEqualAsBytesWithoutMakingText() throws Exception {
        Path f = dir.resolve("same.csv");
        Files.writeString(f, "a,b\n Ada , x\n\"Ada\",y\n\"A\"\"da\",z\n", StandardCharsets.UTF_8);
        try (CsvRows rows = new CsvRows(f, ',')) {
            rows.next();
            byte[] ada = rows.bytes(0);
            rows.next();
            assertTrue(rows.sameBytes(0, ada), "a quoted cell has the same bytes as the plain one");
            rows.next();
            assertEquals(null, rows.bytes(0), "a cell with doubled quotes is only compared as text");
            assertEquals("A\"da", rows.get(0));
        }
    }
}
