package org.shapetrail.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/**
 * Harness for docs/performance.md: saving 100,000 trials in bulk (5,000 visits of 20 trials: ten sites
 * × two trials), checks included, into a fresh file in one transaction. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=org.shapetrail.bench.BulkSaveBenchmark}.
 */
public final class BulkSaveBenchmark {
    private BulkSaveBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Files.createTempDirectory("bulk-bench");
        int[] round = {0};
        Harness.time("save 100,000 trials", 2, 7, () -> {
            Path f = dir.resolve("bulk-" + round[0]++ + ".sqlite");
            try (Database db = Database.open(f)) {
                long[] ids = db.inTransaction(tx -> new long[] {
                    tx.people().insert(Person.draft("Bench Person", Sex.MALE, LocalDate.of(2010, 1, 1))).id(),
                    tx.measurers().insert("Bench Measurer", "").id()});
                List<Visit> visits = new ArrayList<>();
                LocalDateTime t = LocalDateTime.of(2020, 1, 1, 9, 0);
                for (int i = 0; i < 5000; i++) {
                    visits.add(new Visit(0, ids[0], t.plusMinutes(i), ids[1], "", "", List.of(
                            SiteTrials.of(Site.BODY_MASS, 60.0, 60.1), SiteTrials.of(Site.STATURE, 170.0, 170.2),
                            SiteTrials.of(Site.TRICEPS, 10.0, 10.2), SiteTrials.of(Site.SUBSCAPULAR, 9.0, 9.2),
                            SiteTrials.of(Site.SUPRASPINALE, 7.0, 7.2), SiteTrials.of(Site.MEDIAL_CALF, 8.0, 8.2),
                            SiteTrials.of(Site.ARM_FLEXED, 30.0, 30.1), SiteTrials.of(Site.CALF, 35.0, 35.1),
                            SiteTrials.of(Site.HUMERUS, 6.8, 6.8), SiteTrials.of(Site.FEMUR, 9.5, 9.5))));
                }
                db.inTransaction(tx -> tx.visits().insertAll(visits));
                if (db.inTransaction(tx -> tx.visits().count()) != 5000) {
                    throw new IllegalStateException("not all visits saved");
                }
            }
        });
    }
}
