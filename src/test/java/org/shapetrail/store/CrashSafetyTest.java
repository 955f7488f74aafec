package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A writer killed with SIGKILL mid-write leaves a sound file holding only whole visits. */
class CrashSafetyTest {
    @TempDir
    Path dir;

    @Test
    void killedWriterLeavesOnlyWholeVisits() throws Exception {
        Path f = dir.resolve("crash.sqlite");
        Random rnd = new Random(7);
        int totalVisits = 0;
        for (int round = 0; round < 4; round++) {
            Process child = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-cp", System.getProperty("java.class.path"), CrashWriter.class.getName(), f.toString())
                    .redirectErrorStream(true).start();
            BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream()));
            assertEquals("ready", out.readLine());
            Thread.sleep(150 + rnd.nextInt(600));
            child.destroyForcibly(); // SIGKILL on Linux: no shutdown hooks, no close
            assertTrue(child.waitFor(10, TimeUnit.SECONDS));
            try (Database db = Database.open(f)) {
                assertEquals("ok", db.integrityCheck());
                assertEquals(List.of(), db.inTransaction(tx -> tx.visits().incompleteVisits()));
                int n = db.inTransaction(tx -> tx.visits().count());
                assertTrue(n >= totalVisits, "visits already committed are still there");
                totalVisits = n;
            }
        }
        assertTrue(totalVisits > 0, "the writers saved something before they were killed");
    }
}
