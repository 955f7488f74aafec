package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.measure.ProblemKind;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.somatotype.Rating;

/**
 * The repositories' behaviour, the same on both engines: run on a file ({@link FileRepositoryTest}) and on
 * the real PostgreSQL server .ci/run starts ({@link RepositoryServerTest}).
 */
abstract class RepositoryContract {
    /** An empty record, migrated to the latest schema. */
    abstract Database fresh(String label);

    @Test
    void everyEntityRoundTrips() {
        try (Database db = fresh("a")) {
            db.inTransaction(tx -> {
                Person p = tx.people().insert(Fixtures.person("Ottilie Fernhollow").withParents(181.5, 166.0)
                        .withConsent(new Consent(true, false, true)));
                assertEquals(p, tx.people().find(p.id()).orElseThrow());
                Squad s = tx.squads().insert("Rowing juniors");
                assertEquals(List.of(s), tx.squads().all());
                Membership m = new Membership(p.id(), s.id(), LocalDate.of(2024, 9, 1), LocalDate.of(2025, 8, 31));
                tx.squads().addMember(m);
                assertEquals(List.of(m), tx.squads().membershipsOf(p.id()));
                Measurer who = tx.measurers().insert("Ada Quarrington", "ISAK level 2");
                assertEquals(List.of(who), tx.measurers().all());
                Visit v = tx.visits().insert(Fixtures.visit(p.id(), who.id(), LocalDateTime.of(2024, 9, 3, 9, 30)));
                assertEquals(v, tx.visits().find(v.id()).orElseThrow());
                VisitRating r = new VisitRating(v.id(), Rating.of(2.5, 4.0, 3.0), "Ada Quarrington",
                        RatingMethod.PHOTOGRAPHS);
                tx.visits().setRating(r);
                assertEquals(Map.of(v.id(), r), tx.visits().ratings());
                TrainingBlock b = tx.blocks().insert(new TrainingBlock(0, "Autumn block", s.id(),
                        LocalDate.of(2024, 9, 9), LocalDate.of(2024, 11, 17)));
                assertEquals(List.of(b), tx.blocks().all());
                return null;
            });
        }
    }

    @Test
    void aVisitForAPersonWhoDoesNotExistIsRejectedAsAForeignKeyViolation() {
        try (Database db = fresh("fk")) {
            long measurer = db.inTransaction(tx -> tx.measurers().insert("Ada Quarrington", "").id());
            StoreException e = assertThrows(StoreException.class, () -> db.inTransaction(tx ->
                    tx.visits().insert(Fixtures.visit(999, measurer, LocalDateTime.of(2024, 1, 1, 9, 0)))));
            assertTrue(e.getMessage().contains("reference to a record that does not exist"), e.getMessage());
            assertEquals(0, (Integer) db.inTransaction(tx -> tx.visits().count()));
        }
    }

    @Test
    void aMeasurerWithVisitsCannotBeDeleted() {
        try (Database db = fresh("fk2")) {
            long[] ids = db.inTransaction(tx -> {
                Person p = tx.people().insert(Fixtures.person("Ottilie Fernhollow"));
                Measurer m = tx.measurers().insert("Ada Quarrington", "");
                tx.visits().insert(Fixtures.visit(p.id(), m.id(), LocalDateTime.of(2024, 1, 1, 9, 0)));
                return new long[] {p.id(), m.id()};
            });
            assertThrows(StoreException.class, () -> db.inTransaction(tx -> {
                tx.measurers().delete(ids[1]);
                return null;
            }));
            assertEquals(1, (Integer) db.inTransaction(tx -> tx.measurers().all().size()));
        }
    }

    @Test
    void aRejectedVisitLeavesTheFileUnchangedAndGivesEveryReason() {
        try (Database db = fresh("reject")) {
            long[] ids = db.inTransaction(tx -> new long[] {tx.people().insert(Fixtures.person("Ottilie Fernhollow")).id(),
                tx.measurers().insert("Ada Quarrington", "").id()});
            String before = ContentDigest.of(db);
            Visit bad = new Visit(0, ids[0], LocalDateTime.of(2024, 1, 1, 9, 0), ids[1], "", "", List.of(
                    SiteTrials.of(Site.STATURE, 1.78, 1.78),
                    SiteTrials.of(Site.TRICEPS, 10.0, 11.0)));
            InvalidVisitException e = assertThrows(InvalidVisitException.class,
                    () -> db.inTransaction(tx -> tx.visits().insert(bad)));
            assertEquals(List.of(ProblemKind.LIKELY_METRES, ProblemKind.LIKELY_METRES, ProblemKind.THIRD_TRIAL_NEEDED),
                    e.problems().stream().map(p -> p.kind()).toList());
            assertEquals(before, ContentDigest.of(db));
        }
    }

    @Test
    void aFailureHalfWayThroughATransactionWritesNothing() {
        try (Database db = fresh("half")) {
            assertThrows(IllegalStateException.class, () -> db.inTransaction(tx -> {
                tx.people().insert(Fixtures.person("Ottilie Fernhollow"));
                throw new IllegalStateException("stop here");
            }));
            assertEquals(0, (Integer) db.inTransaction(tx -> tx.people().all().size()));
        }
    }

    @Test
    void updateAndDeleteOfAVisit() {
        try (Database db = fresh("upd")) {
            Visit v = db.inTransaction(tx -> {
                Person p = tx.people().insert(Fixtures.person("Ottilie Fernhollow"));
                Measurer m = tx.measurers().insert("Ada Quarrington", "");
                return tx.visits().insert(Fixtures.visit(p.id(), m.id(), LocalDateTime.of(2024, 1, 1, 9, 0)));
            });
            Visit changed = new Visit(v.id(), v.personId(), v.measuredAt().plusDays(1), v.measurerId(), "mid-season",
                    "re-measured", List.of(SiteTrials.of(Site.STATURE, 150.0, 150.2)));
            db.inTransaction(tx -> {
                tx.visits().update(changed);
                return null;
            });
            assertEquals(changed, db.inTransaction(tx -> tx.visits().find(v.id()).orElseThrow()));
            assertTrue((Boolean) db.inTransaction(tx -> tx.visits().delete(v.id())));
            assertFalse((Boolean) db.inTransaction(tx -> tx.visits().find(v.id()).isPresent()));
        }
    }

}
