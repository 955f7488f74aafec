package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDateTime;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Two writers on one file (two connections, as two processes would have): nothing is lost. */
class ConcurrentWriteTest {
    @TempDir
    Path dir;

    @Test
    void twoWritersBothSucceedOrGetAClearBusyMessage() throws Exception {
        Path f = dir.resolve("two.sqlite");
        long[] ids;
        try (Database db = Database.open(f)) {
            ids = db.inTransaction(tx -> new long[] {tx.people().insert(Fixtures.person("Ottilie Fernhollow")).id(),
                tx.measurers().insert("Ada Quarrington", "").id()});
        }
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try (Database a = Database.open(f, 2000); Database b = Database.open(f, 2000)) {
            Future<int[]> fa = pool.submit(writer(a, ids, 0));
            Future<int[]> fb = pool.submit(writer(b, ids, 100_000));
            int[] ra = fa.get();
            int[] rb = fb.get();
            int saved = ra[0] + rb[0];
            assertTrue(saved > 0);
            assertEquals(saved, (Integer) a.inTransaction(tx -> tx.visits().count()), "every save that succeeded is stored");
            assertEquals(200, saved + ra[1] + rb[1]);
        } finally {
            pool.shutdownNow();
        }
    }

    private static Callable<int[]> writer(Database db, long[] ids, int offsetMinutes) {
        return () -> {
            int ok = 0;
            int busy = 0;
            for (int i = 0; i < 100; i++) {
                LocalDateTime when = LocalDateTime.of(2024, 1, 1, 0, 0).plusMinutes(offsetMinutes + i);
                try {
                    db.inTransaction(tx -> tx.visits().insert(Fixtures.visit(ids[0], ids[1], when)));
                    ok++;
                } catch (FileBusyException e) {
                    assertTrue(e.getMessage().contains("is busy"));
                    busy++;
                }
            }
            return new int[] {ok, busy};
        };
    }
}
