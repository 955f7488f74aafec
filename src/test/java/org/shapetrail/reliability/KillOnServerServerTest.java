package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.exchange.Exporter;
import org.shapetrail.history.Academy;
import org.shapetrail.reliability.KillTarget.Operation;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.TestServer;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * A writer killed with SIGKILL at a random moment of an import or a visit save on the real server:
 * what the server holds afterwards is exactly the state before or the state after, with only whole
 * visits (the server rolls back the dead connection's transaction).
 */
@Tag("server")
class KillOnServerServerTest {
    @TempDir
    Path dir;

    @Test
    void aWriterKilledMidImportOrMidSaveLeavesTheServerBeforeOrAfter() throws Exception {
        Path csv = dir.resolve("import.csv");
        Path source = dir.resolve("source.sqlite");
        DemoAcademy.generate(source);
        try (Database d = Database.open(source); Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            Exporter.trials(Academy.load(d), w);
        }
        Random rnd = new Random(11);
        for (Operation op : List.of(Operation.IMPORT, Operation.VISIT_SAVE)) {
            // calibration: the states before and after one whole run, and how long it takes
            String calibration = prepared(op);
            String before = digest(calibration);
            long ms = runToTheEnd(op, calibration, csv);
            String after = digest(calibration);
            assertTrue(!before.equals(after), op + " changes the record");
            for (int round = 0; round < 3; round++) {
                String uri = prepared(op);
                long delay = (long) (rnd.nextDouble() * ms * 1.2);
                Process p = start(op, uri, csv);
                BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
                assertEquals("ready", out.readLine());
                TimeUnit.MILLISECONDS.sleep(delay);
                p.destroyForcibly(); // SIGKILL: the connection drops without a word
                p.waitFor(20, TimeUnit.SECONDS);
                // the server notices the dead connection and rolls its transaction back
                String now = waitForSettled(uri);
                assertTrue(now.equals(before) || now.equals(after), op + " killed after " + delay + " ms of " + ms
                        + ": neither before nor after");
                try (Database d = Database.open(uri)) {
                    assertEquals(List.of(), d.inTransaction(tx -> tx.visits().incompleteVisits()));
                }
            }
        }
    }

    /** A fresh record for the operation: empty for an import, the sample academy for a visit save. */
    private static String prepared(Operation op) {
        String uri = TestServer.freshSchema("kill");
        try (Database d = Database.open(uri)) {
            if (op == Operation.VISIT_SAVE) {
                DemoAcademy.generateInto(d);
            }
        }
        return uri;
    }

    private static String digest(String uri) {
        try (Database d = Database.open(uri)) {
            return ContentDigest.of(d);
        }
    }

    /** The digest once no other connection writes into the schema any more. */
    private static String waitForSettled(String uri) throws Exception {
        String last = digest(uri);
        for (int i = 0; i < 50; i++) {
            TimeUnit.MILLISECONDS.sleep(100);
            String d = digest(uri);
            if (d.equals(last)) {
                return d;
            }
            last = d;
        }
        return last;
    }

    private static long runToTheEnd(Operation op, String uri, Path csv) throws Exception {
        Process p = start(op, uri, csv);
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        long ms = -1;
        for (String line; (line = out.readLine()) != null; ) {
            if (line.startsWith("done ")) {
                ms = Long.parseLong(line.substring(5));
            }
        }
        assertEquals(0, p.waitFor());
        assertTrue(ms >= 0);
        return Math.max(1, ms);
    }

    private static Process start(Operation op, String uri, Path csv) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), KillTarget.class.getName(), op.name(), uri));
        if (op == Operation.IMPORT) {
            cmd.add(csv.toString());
        }
        return new ProcessBuilder(cmd).redirectErrorStream(true).start();
    }
}
