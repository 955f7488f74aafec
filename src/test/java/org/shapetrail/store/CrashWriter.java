package org.shapetrail.store;

import java.nio.file.Path;
import java.time.LocalDateTime;

/** Child process for {@link CrashSafetyTest}: saves visits in a loop until it is killed. */
public final class CrashWriter {
    private CrashWriter() {
    }

    public static void main(String[] args) {
        try (Database db = Database.open(Path.of(args[0]))) {
            long[] ids = db.inTransaction(tx -> new long[] {tx.people().insert(Fixtures.person("Crash Testperson")).id(),
                tx.measurers().insert("Writer " + ProcessHandle.current().pid(), "").id()});
            System.out.println("ready");
            System.out.flush();
            LocalDateTime t = LocalDateTime.of(2024, 1, 1, 9, 0);
            for (int i = 0; ; i++) {
                LocalDateTime when = t.plusMinutes(i);
                db.inTransaction(tx -> tx.visits().insert(Fixtures.visit(ids[0], ids[1], when)));
            }
        }
    }
}
