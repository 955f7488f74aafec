package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import org.shapetrail.store.RatingMethod;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRating;
import org.shapetrail.store.demo.DemoAcademy;

/** Undo of an edit or a deletion puts the visit back whole, the rater's rating included. */
class VisitSnapshotTest {
    @TempDir
    Path dir;

    Path demoWithRating() throws Exception {
        Path file = dir.resolve("demo.sqlite");
        DemoAcademy.generate(file);
        try (Database db = Database.open(file)) {
            db.inTransaction(tx -> {
                Visit v = tx.visits().all().get(0);
                tx.visits().setRating(new VisitRating(v.id(), new Rating(3.5, 4.0, 2.5), "Ida Marram",
                        RatingMethod.values()[0]));
                return null;
            });
        }
        return file;
    }

    static long firstVisit(Path file) {
        try (Database db = Database.open(file)) {
            return db.inTransaction(tx -> tx.visits().all().get(0).id());
        }
    }

    static String digest(Path file) {
        try (Database db = Database.open(file)) {
            return ContentDigest.of(db);
        }
    }

    @Test
    void undoingAnEditRestoresTrialsAndTheRating() throws Exception {
        Path file = demoWithRating();
        long id = firstVisit(file);
        String before = digest(file);
        VisitSnapshot snap = VisitSnapshot.read(RecordSource.of(file), id).orElseThrow();
        try (Database db = Database.open(file)) {
            db.inTransaction(tx -> {
                Visit v = tx.visits().find(id).orElseThrow();
                tx.visits().update(new Visit(id, v.personId(), v.measuredAt(), v.measurerId(), "edited", "",
                        List.of(SiteTrials.of(Site.STATURE, 160.0, 160.1))));
                tx.visits().deleteRating(id);
                return null;
            });
        }
        assertNotEquals(before, digest(file));
        snap.restoreEdited(RecordSource.of(file));
        assertEquals(before, digest(file));
    }

    @Test
    void undoingAnEditThatSomeoneElseChangedSinceIsRefusedAndOverwritesNothing() throws Exception {
        Path file = demoWithRating();
        long id = firstVisit(file);
        VisitSnapshot snap = VisitSnapshot.read(RecordSource.of(file), id).orElseThrow();
        try (Database db = Database.open(file)) {
            for (String context : List.of("my edit", "a colleague's edit after mine")) {
                db.inTransaction(tx -> {
                    Visit v = tx.visits().find(id).orElseThrow();
                    tx.visits().update(new Visit(id, v.personId(), v.measuredAt(), v.measurerId(), context, "", v.trials()));
                    return null;
                });
            }
        }
        String now = digest(file);
        org.junit.jupiter.api.Assertions.assertThrows(org.shapetrail.store.EditConflictException.class,
                () -> snap.restoreEdited(RecordSource.of(file)));
        assertEquals(now, digest(file), "the colleague's edit stands");
    }

    @Test
    void undoingADeletionBringsBackTheVisitWithItsRating() throws Exception {
        Path file = demoWithRating();
        long id = firstVisit(file);
        VisitSnapshot snap = VisitSnapshot.read(RecordSource.of(file), id).orElseThrow();
        try (Database db = Database.open(file)) {
            db.inTransaction(tx -> tx.visits().delete(id));
        }
        Visit back = snap.restoreDeleted(RecordSource.of(file));
        try (Database db = Database.open(file)) {
            Visit stored = db.inTransaction(tx -> tx.visits().find(back.id())).orElseThrow();
            assertEquals(snap.visit().trials(), stored.trials());
            assertEquals(snap.visit().measuredAt(), stored.measuredAt());
            VisitRating r = db.inTransaction(tx -> tx.visits().rating(back.id())).orElseThrow();
            assertEquals(new Rating(3.5, 4.0, 2.5), r.rating());
            assertEquals("Ida Marram", r.rater());
        }
    }
}
