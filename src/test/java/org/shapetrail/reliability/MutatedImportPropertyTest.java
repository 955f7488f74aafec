package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.ShapetrailException;
import org.shapetrail.exchange.ImportOptions;
import org.shapetrail.exchange.ImportPlan;
import org.shapetrail.exchange.Importer;
import org.shapetrail.store.Database;

/**
 * Property: for random mutations of a valid import file (bytes flipped, inserted, deleted; lines
 * repeated, dropped, cut; cells swapped), the import of the sample academy never lets an exception other
 * than a worded refusal escape, and either writes every visit the report promises or leaves the file
 * byte-for-byte as it was — never a part.
 */
class MutatedImportPropertyTest {
    static final String VALID = "person_id,name,birth_date,sex,date,time,measurer,context,site,trial,value,unit\n"
            + rows("2026-10-01") + rows("2026-11-05");

    static String rows(String date) {
        StringBuilder sb = new StringBuilder();
        String[][] sites = {{"stature", "162.0", "162.1", "cm"}, {"body_mass", "48.0", "48.1", "kg"},
            {"triceps", "9.0", "9.2", "mm"}};
        for (String[] s : sites) {
            for (int t = 1; t <= 2; t++) {
                sb.append("1,Arlo Ashcombe,2012-11-13,M,").append(date).append(",10:00,Imogen Tarrant,autumn,")
                        .append(s[0]).append(',').append(t).append(',').append(s[t]).append(',').append(s[3]).append('\n');
            }
        }
        return sb.toString();
    }

    @TempDir
    Path dir;

    static byte[] mutate(byte[] in, Random rnd) {
        String text = new String(in, StandardCharsets.UTF_8);
        String[] lines = text.split("\n", -1);
        int kind = rnd.nextInt(9);
        switch (kind) {
            case 0 -> { // flip a byte
                if (in.length == 0) {
                    return in;
                }
                byte[] b = in.clone();
                b[rnd.nextInt(b.length)] = (byte) rnd.nextInt(256);
                return b;
            }
            case 1 -> { // insert a random byte
                int at = rnd.nextInt(in.length + 1);
                byte[] b = new byte[in.length + 1];
                System.arraycopy(in, 0, b, 0, at);
                String pool = "\",;\n\r\t0a-.\u0000";
                b[at] = (byte) pool.charAt(rnd.nextInt(pool.length()));
                System.arraycopy(in, at, b, at + 1, in.length - at);
                return b;
            }
            case 2 -> { // delete a run of bytes
                if (in.length == 0) {
                    return in;
                }
                int at = rnd.nextInt(in.length);
                int n = Math.min(in.length - at, 1 + rnd.nextInt(20));
                byte[] b = new byte[in.length - n];
                System.arraycopy(in, 0, b, 0, at);
                System.arraycopy(in, at + n, b, at, in.length - at - n);
                return b;
            }
            case 3 -> { // repeat a line
                int i = rnd.nextInt(lines.length);
                return (text + lines[i] + "\n").getBytes(StandardCharsets.UTF_8);
            }
            case 4 -> { // cut the file short
                if (in.length == 0) {
                    return in;
                }
                return java.util.Arrays.copyOf(in, rnd.nextInt(in.length));
            }
            case 5 -> { // swap two cells of one line
                if (lines.length < 3) {
                    return in;
                }
                int i = 1 + rnd.nextInt(lines.length - 2);
                String[] cells = lines[i].split(",", -1);
                int a = rnd.nextInt(cells.length);
                int c = rnd.nextInt(cells.length);
                String t = cells[a];
                cells[a] = cells[c];
                cells[c] = t;
                lines[i] = String.join(",", cells);
                return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
            }
            case 7 -> { // a benign change: the context of one line reworded (its visit splits from the others)
                return text.replaceFirst("autumn", "autumn " + rnd.nextInt(3)).getBytes(StandardCharsets.UTF_8);
            }
            case 8 -> { // a benign change: one visit moved to another day
                return text.replace("2026-11-05", "2026-0" + (1 + rnd.nextInt(9)) + "-1" + rnd.nextInt(10))
                        .getBytes(StandardCharsets.UTF_8);
            }
            default -> { // a value replaced with an odd text
                if (lines.length < 3 || lines[1].chars().filter(ch -> ch == ',').count() < 2) {
                    return in;
                }
                String[] odd = {"NaN", "-1", "1e9", "", "\"", "99999", "1,5", "０", "Infinity", "0x10"};
                int i = 1 + rnd.nextInt(lines.length - 2);
                int comma = lines[i].lastIndexOf(',', lines[i].lastIndexOf(',') - 1);
                lines[i] = lines[i].substring(0, comma + 1) + odd[rnd.nextInt(odd.length)]
                        + lines[i].substring(lines[i].lastIndexOf(','));
                return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
            }
        }
    }

    @Test
    void aMutatedFileIsWrittenWholeOrNotAtAll() throws Exception {
        Path template = KillRuns.sample(dir.resolve("template.sqlite"));
        int before;
        try (Database d = Database.open(template)) {
            before = d.inTransaction(tx -> tx.visits().count());
        }
        byte[] templateBytes = Files.readAllBytes(template);
        Random rnd = new Random(2026_12_03);
        int refused = 0;
        int written = 0;
        byte[] valid = VALID.getBytes(StandardCharsets.UTF_8);
        for (int i = 0; i < 300; i++) {
            byte[] input = valid;
            for (int m = 0, n = 1 + rnd.nextInt(3); m < n; m++) {
                input = mutate(input, rnd);
            }
            Path csv = dir.resolve("mutated.csv");
            Files.write(csv, input);
            Path db = dir.resolve("run.sqlite");
            Files.write(db, templateBytes);
            ImportPlan plan = null;
            try (Database d = Database.open(db)) {
                try {
                    plan = Importer.importFile(d, csv, new ImportOptions(null, false, false), null);
                } catch (ShapetrailException e) {
                    assertFalse(e.getMessage() == null || e.getMessage().isBlank(), "a refusal is worded");
                }
            }
            if (plan != null && plan.written() > 0) {
                written++;
                try (Database d = Database.open(db)) {
                    assertEquals("ok", d.integrityCheck());
                    assertEquals(before + plan.written(), (int) d.inTransaction(tx -> tx.visits().count()),
                            "every promised visit written, mutation " + i);
                    assertEquals(java.util.List.of(), d.inTransaction(tx -> tx.visits().incompleteVisits()));
                }
            } else {
                refused++;
                assertTrue(plan == null || !plan.canCommit() || plan.visits().isEmpty(), "mutation " + i);
                assertArrayEquals(templateBytes, Files.readAllBytes(db), "mutation " + i + ": the file is unchanged");
            }
        }
        // both kinds of outcome happened, so both branches of the property were exercised
        assertTrue(refused > 50 && written > 10, "refused " + refused + ", written " + written);
    }
}
