package org.shapetrail.app;

import org.shapetrail.store.RecordSource;
import java.util.Optional;
import org.shapetrail.store.Database;
import org.shapetrail.store.RowStamp;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRating;

/**
 * A visit as it was before an edit or a deletion, with its trials, the rater's rating and its row stamp,
 * so that the edit form shows exactly the version it will save against, and the change can be undone
 * whole.
 *
 * @param rating the rater's rating at the time, or null when there was none
 * @param stamp the visit's row stamp read with it
 */
record VisitSnapshot(Visit visit, VisitRating rating, RowStamp stamp) {
    /** The stored visit {@code visitId} with its rating and stamp, read in one transaction. */
    static Optional<VisitSnapshot> read(RecordSource file, long visitId) {
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                Optional<Visit> v = tx.visits().find(visitId);
                return v.isEmpty() ? Optional.<VisitSnapshot>empty()
                        : Optional.of(new VisitSnapshot(v.get(), tx.visits().rating(visitId).orElse(null),
                                tx.visits().stamp(visitId).orElseThrow()));
            });
        }
    }

    /**
     * Undoes an edit: the visit gets back its fields, trials and rating (or none), under the same id, if
     * the edit (one version on from this snapshot) is still the latest; a change saved by someone else
     * since is not overwritten ({@link org.shapetrail.store.EditConflictException}).
     */
    void restoreEdited(RecordSource file) {
        try (Database db = file.open()) {
            db.inTransaction(tx -> {
                tx.visits().update(visit, new RowStamp(visit.id(), stamp.version() + 1, "", ""));
                if (rating == null) {
                    tx.visits().deleteRating(visit.id());
                } else {
                    tx.visits().setRating(rating);
                }
                return null;
            });
        }
    }

    /** Undoes a deletion: the visit is saved again (under a new id) with its rating. */
    Visit restoreDeleted(RecordSource file) {
        try (Database db = file.open()) {
            return db.inTransaction(tx -> {
                Visit back = tx.visits().insert(visit.withId(0));
                if (rating != null) {
                    tx.visits().setRating(new VisitRating(back.id(), rating.rating(), rating.rater(), rating.method()));
                }
                return back;
            });
        }
    }
}
