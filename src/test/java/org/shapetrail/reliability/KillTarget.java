package org.shapetrail.reliability;

import java.nio.file.Path;
import java.time.LocalDateTime;
import org.shapetrail.exchange.ImportOptions;
import org.shapetrail.exchange.Importer;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.Database;
import org.shapetrail.store.Visit;

/**
 * Child process of the kill runs: performs one writing operation on a file and says when it starts and
 * ends, so that the parent can kill it with SIGKILL at a random moment in between.
 *
 * <p>Arguments: OPERATION FILE [INPUT]; prints "ready" just before the operation and "done MS" after it.
 */
public final class KillTarget {
    /** The writing operations the kill runs cover. */
    public enum Operation {
        IMPORT, VISIT_SAVE, ERASE, RESTORE, MIGRATION
    }

    private KillTarget() {
    }

    public static void main(String[] args) throws Exception {
        Operation op = Operation.valueOf(args[0]);
        boolean server = org.shapetrail.store.ServerAddress.isServer(args[1]);
        if (op == Operation.MIGRATION && !server) {
            Path file = Path.of(args[1]);
            say("ready");
            long t0 = System.nanoTime();
            Database.open(file).close(); // opening an older file migrates it (after a copy beside it)
            say("done " + (System.nanoTime() - t0) / 1_000_000);
            return;
        }
        // a file named by its path, or a record on a server (where import and visit save are the ones run)
        try (Database db = server ? Database.open(args[1]) : Database.open(Path.of(args[1]))) {
            say("ready");
            long t0 = System.nanoTime();
            switch (op) {
                case IMPORT -> Importer.importFile(db, Path.of(args[2]), new ImportOptions(null, false, true), null);
                case VISIT_SAVE -> db.inTransaction(tx -> tx.visits().insert(visitOf(tx.measurers().all().get(0).id())));
                case ERASE -> db.erasePerson(1);
                case RESTORE -> db.restoreFrom(Path.of(args[2]));
                default -> throw new IllegalStateException(op.toString());
            }
            say("done " + (System.nanoTime() - t0) / 1_000_000);
        }
    }

    /** The visit the VISIT_SAVE operation writes for person 1 of the sample academy. */
    static Visit visitOf(long measurerId) {
        return new Visit(0, 1, LocalDateTime.of(2026, 11, 2, 10, 0), measurerId, "kill run", "", java.util.List.of(
                SiteTrials.of(Site.BODY_MASS, 50.1, 50.2), SiteTrials.of(Site.STATURE, 165.0, 165.1),
                SiteTrials.of(Site.TRICEPS, 9.0, 9.2), SiteTrials.of(Site.SUBSCAPULAR, 7.4, 7.5),
                SiteTrials.of(Site.SUPRASPINALE, 6.2, 6.3), SiteTrials.of(Site.MEDIAL_CALF, 8.0, 8.1),
                SiteTrials.of(Site.ARM_FLEXED, 26.5, 26.6), SiteTrials.of(Site.CALF, 33.0, 33.1),
                SiteTrials.of(Site.HUMERUS, 6.4, 6.4), SiteTrials.of(Site.FEMUR, 9.1, 9.1)));
    }

    private static void say(String s) {
        System.out.println(s);
        System.out.flush();
    }
}
