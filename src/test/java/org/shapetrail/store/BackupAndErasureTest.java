package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.somatotype.Rating;

class BackupAndErasureTest {
    @TempDir
    Path dir;

    private long[] populate(Database db) {
        return db.inTransaction(tx -> {
            Person a = tx.people().insert(Fixtures.person("Ottilie Fernhollow"));
            Person b = tx.people().insert(Fixtures.person("Hesper Wellinghurst"));
            Squad s = tx.squads().insert("Rowing juniors");
            tx.squads().addMember(new Membership(a.id(), s.id(), LocalDate.of(2024, 9, 1), null));
            tx.squads().addMember(new Membership(b.id(), s.id(), LocalDate.of(2024, 9, 1), null));
            Measurer m = tx.measurers().insert("Ada Quarrington", "");
            Visit va = tx.visits().insert(Fixtures.visit(a.id(), m.id(), LocalDateTime.of(2024, 9, 3, 9, 0)));
            tx.visits().insert(Fixtures.visit(a.id(), m.id(), LocalDateTime.of(2024, 12, 3, 9, 0)));
            tx.visits().insert(Fixtures.visit(b.id(), m.id(), LocalDateTime.of(2024, 9, 3, 9, 30)));
            tx.visits().setRating(new VisitRating(va.id(), Rating.of(2, 4, 3), "Ada Quarrington", RatingMethod.IN_PERSON));
            return new long[] {a.id(), b.id()};
        });
    }

    @Test
    void backupWhileOpenAndRestoreRoundTrip() {
        try (Database db = Database.open(dir.resolve("main.sqlite"))) {
            populate(db);
            String original = ContentDigest.of(db);
            Path backup = dir.resolve("copy.sqlite");
            db.backupTo(backup);
            try (Database copy = Database.open(backup)) {
                assertEquals(original, ContentDigest.of(copy));
            }
            db.inTransaction(tx -> tx.people().erase(1));
            assertNotEquals(original, ContentDigest.of(db));
            db.restoreFrom(backup);
            assertEquals(original, ContentDigest.of(db));
        }
    }

    @Test
    void erasureLeavesNoRowThatRefersToThePerson() {
        try (Database db = Database.open(dir.resolve("erase.sqlite"))) {
            long[] ids = populate(db);
            db.inTransaction(tx -> tx.people().erase(ids[0]));
            List<Integer> refs = db.inTransaction(tx -> {
                try (Statement s = tx.connection().createStatement()) {
                    return List.of(
                            count(s, "SELECT count(*) FROM person WHERE id = " + ids[0]),
                            count(s, "SELECT count(*) FROM visit WHERE person_id = " + ids[0]),
                            count(s, "SELECT count(*) FROM trial WHERE visit_id NOT IN (SELECT id FROM visit)"),
                            count(s, "SELECT count(*) FROM visit_rating WHERE visit_id NOT IN (SELECT id FROM visit)"),
                            count(s, "SELECT count(*) FROM membership WHERE person_id = " + ids[0]));
                }
            });
            assertEquals(List.of(0, 0, 0, 0, 0), refs);
            // the other person is untouched
            assertEquals(1, (Integer) db.inTransaction(tx -> tx.visits().ofPerson(ids[1]).size()));
            assertEquals(1, (Integer) db.inTransaction(tx -> tx.squads().membershipsOf(ids[1]).size()));
        }
    }

    private static int count(Statement s, String sql) throws java.sql.SQLException {
        try (ResultSet rs = s.executeQuery(sql)) {
            rs.next();
            return rs.getInt(1);
        }
    }
}
