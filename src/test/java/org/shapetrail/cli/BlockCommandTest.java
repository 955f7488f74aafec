package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDate;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.store.DataFolder;
import org.shapetrail.store.Database;
import org.shapetrail.store.TrainingBlock;

/** Training blocks from the command line: create with defaults and choices, edit, list, delete, refusals. */
class BlockCommandTest {
    @TempDir
    Path dir;
    Path db;

    @BeforeEach
    void copy() throws Exception {
        db = dir.resolve("academy.sqlite");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, db, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    String[] run(String... args) {
        String[] all = new String[args.length + 2];
        System.arraycopy(args, 0, all, 0, args.length);
        all[args.length] = "--db";
        all[args.length + 1] = db.toString();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(all, new PrintWriter(out), new PrintWriter(err));
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    TrainingBlock stored(String name) {
        try (Database d = Database.open(db)) {
            return d.inTransaction(tx -> tx.blocks().all()).stream().filter(b -> b.name().equals(name)).findFirst()
                    .orElseThrow();
        }
    }

    @Test
    void aBlockIsCreatedEditedListedAndDeleted() {
        // person 2 (Bryony Brinkwater, Football U14 in 2025) has visits on 2025-02-16 and 2025-06-04 (sample-db)
        String[] r = run("block", "new", "--squad", "football u14", "--name", "U14 spring block", "--start", "2025-02-20",
                "--end", "2025-06-01", "--aim", "Speed and agility", "--pick", "2=2025-02-16,2025-06-04");
        assertEquals("0", r[0], r[2]);
        TrainingBlock b = stored("U14 spring block");
        assertEquals(LocalDate.of(2025, 2, 20), b.startsOn());
        assertEquals("Speed and agility", b.aim());
        assertEquals(1, b.picks().size());
        r = run("block-report", "--block", "U14 SPRING BLOCK", "--format", "csv");
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].contains("Bryony Brinkwater,2025-02-16,2025-06-04"), r[1]);
        r = run("block", "edit", "U14 spring block", "--end", "2025-06-02", "--default-visits");
        assertEquals("0", r[0], r[2]);
        assertEquals(Map.of(), stored("U14 spring block").picks());
        assertEquals(LocalDate.of(2025, 6, 2), stored("U14 spring block").endsOn());
        r = run("block", "list", "--format", "csv");
        assertTrue(r[1].contains(",U14 spring block,Football U14,2025-02-20,2025-06-02,0,"), r[1]);
        r = run("block", "delete", "U14 spring block", "--yes");
        assertEquals("0", r[0], r[2]);
        assertTrue(run("block", "list").length > 0 && !run("block", "list")[1].contains("U14 spring block"));
    }

    @Test
    void badBlocksAreRefusedWithTheFixAndNothingIsWritten() throws Exception {
        byte[] before = Files.readAllBytes(db);
        String[][] cases = {
            {"There is already a training block called winter strength block; give this one another name.",
                "block", "new", "--squad", "Senior squad", "--name", "winter strength block", "--start", "2026-05-01",
                "--end", "2026-06-01"},
            {"The last day 2026-05-01 is before the first day 2026-06-01.", "block", "new", "--squad", "Senior squad",
                "--name", "Backwards", "--start", "2026-06-01", "--end", "2026-05-01"},
            {"There is no squad called \"Netball\"", "block", "new", "--squad", "Netball", "--name", "X", "--start",
                "2026-06-01", "--end", "2026-07-01"},
            {"person 2 has no visit on 2025-02-17; name a day with exactly one of their visits.", "block", "new",
                "--squad", "Football U14", "--name", "Y", "--start", "2025-02-20", "--end", "2025-06-01", "--pick",
                "2=2025-02-17,2025-06-04"},
            {"the chosen before visit (2025-06-04) is not earlier than the after visit (2025-02-16); swap them.",
                "block", "new", "--squad", "Football U14", "--name", "Z", "--start", "2025-02-20", "--end",
                "2025-06-01", "--pick", "2=2025-06-04,2025-02-16"},
            {"Person 1 was not in the block's squad between 2025-02-20 and 2025-06-01", "block", "new", "--squad",
                "Football U14", "--name", "W", "--start", "2025-02-20", "--end", "2025-06-01", "--pick",
                "1=2025-02-16,2025-06-04"},
            {"There is no training block called \"Summer\"", "block", "delete", "Summer", "--yes"},
        };
        for (String[] c : cases) {
            String[] args = new String[c.length - 1];
            System.arraycopy(c, 1, args, 0, args.length);
            String[] r = run(args);
            assertEquals("2", r[0], String.join(" ", args) + "\n" + r[1] + r[2]);
            assertTrue(r[2].contains(c[0]), r[2]);
            assertArrayEquals(before, Files.readAllBytes(db), "nothing written: " + c[0]);
        }
    }
}
