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

class DatabaseTest {
    @TempDir
    Path dir;

    @Test
    void emptyFileIsMigratedToTheLatestSchemaWithoutABackup() {
        try (Database db = Database.open(dir.resolve("new.sqlite"))) {
            assertEquals(Migrations.latest(), db.schemaVersion());
            assertNull(db.migrationBackup());
        }
    }

    @Test
    void everyEntityRoundTrips() {
        try (Database db = Database.open(dir.resolve("a.sqlite"))) {
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
        try (Database db = Database.open(dir.resolve("fk.sqlite"))) {
            long measurer = db.inTransaction(tx -> tx.measurers().insert("Ada Quarrington", "").id());
            StoreException e = assertThrows(StoreException.class, () -> db.inTransaction(tx ->
                    tx.visits().insert(Fixtures.visit(999, measurer, LocalDateTime.of(2024, 1, 1, 9, 0)))));
            assertTrue(e.getMessage().contains("reference to a record that does not exist"), e.getMessage());
            assertEquals(0, (Integer) db.inTransaction(tx -> tx.visits().count()));
        }
    }

    @Test
    void aMeasurerWithVisitsCannotBeDeleted() {
        try (Database db = Database.open(dir.resolve("fk2.sqlite"))) {
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
        Path f = dir.resolve("reject.sqlite");
        try (Database db = Database.open(f)) {
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
        try (Database db = Database.open(dir.resolve("half.sqlite"))) {
            assertThrows(IllegalStateException.class, () -> db.inTransaction(tx -> {
                tx.people().insert(Fixtures.person("Ottilie Fernhollow"));
                throw new IllegalStateException("stop here");
            }));
            assertEquals(0, (Integer) db.inTransaction(tx -> tx.people().all().size()));
        }
    }

    @Test
    void updateAndDeleteOfAVisit() {
        try (Database db = Database.open(dir.resolve("upd.sqlite"))) {
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

    @org.junit.jupiter.params.ParameterizedTest(name = "from schema {0}")
    @org.junit.jupiter.params.provider.ValueSource(ints = {1, 2, 3, 4, 5})
    void aFileFromEveryEarlierSchemaIsBackedUpThenMigratedKeepingItsData(int version) throws Exception {
        // fixture per earlier version: that version's scripts plus rows written as version 1 wrote them
        // (versions 2 to 6 only added tables and columns), with no Flyway history: as the hand-written
        // migration runner before Flyway left every file
        assertTrue(version < Migrations.latest());
        Path f = dir.resolve("v" + version + ".sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + f); Statement s = c.createStatement()) {
            for (int v = 1; v <= version; v++) {
                for (String stmt : Migrations.statements(Migrations.script(v))) {
                    s.executeUpdate(stmt);
                }
            }
            s.executeUpdate("PRAGMA user_version = " + version);
            for (String stmt : Migrations.statements(new String(
                    getClass().getResourceAsStream("fixture-v1.sql").readAllBytes(), "UTF-8"))) {
                s.executeUpdate(stmt);
            }
        }
        try (Database db = Database.open(f)) {
            assertEquals(Migrations.latest(), db.schemaVersion());
            assertNotNull(db.migrationBackup());
            assertTrue(Files.size(db.migrationBackup()) > 0);
            List<Person> people = db.inTransaction(tx -> tx.people().all());
            assertEquals(List.of("Hesper Wellinghurst"), people.stream().map(Person::displayName).toList());
            assertEquals(Sex.MALE, people.get(0).sex());
            assertEquals(null, people.get(0).predictedAdultStatureCm());
            List<Visit> visits = db.inTransaction(tx -> tx.visits().all());
            assertEquals(1, visits.size());
            assertEquals(List.of(150.1, 150.3), visits.get(0).trialsAt(Site.STATURE).orElseThrow().values());
            assertEquals(List.of(), db.inTransaction(tx -> tx.blocks().all()));
        }
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + f); Statement s =
                c.createStatement(); var rs = s.executeQuery("PRAGMA user_version")) {
            rs.next();
            assertEquals(Migrations.latest(), rs.getInt(1));
            // Flyway took the file up at its own version, then ran the rest
            var h = s.executeQuery("SELECT version, type FROM flyway_schema_history ORDER BY installed_rank");
            List<String> history = new java.util.ArrayList<>();
            while (h.next()) {
                history.add(h.getString(1) + " " + h.getString(2));
            }
            List<String> expected = new java.util.ArrayList<>(List.of(version + " BASELINE"));
            for (int v = version + 1; v <= Migrations.latest(); v++) {
                expected.add(v + " SQL");
            }
            assertEquals(expected, history);
        }
    }

    @Test
    void eachEnginesScriptsCoverEverySchemaOnceAndTheIndexesListTheFolders() throws Exception {
        Path root = Path.of("src/main/resources/org/shapetrail/store/migrations");
        for (String folder : List.of("common", "sqlite", "postgresql")) {
            try (var files = Files.list(root.resolve(folder))) {
                List<String> sql = files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".sql"))
                        .sorted(java.util.Comparator.comparingInt(n -> Integer.parseInt(n.substring(1, n.indexOf("__")))))
                        .toList();
                assertEquals(sql, Migrations.scriptNames(folder), folder);
            }
        }
        for (Engine engine : Engine.values()) {
            List<Integer> versions = new java.util.ArrayList<>();
            for (String folder : List.of("common", engine.folder)) {
                for (String n : Migrations.scriptNames(folder)) {
                    versions.add(Integer.parseInt(n.substring(1, n.indexOf("__"))));
                }
            }
            java.util.Collections.sort(versions);
            // derivation: versions 1..LATEST, each exactly once, so LATEST is the highest script
            assertEquals(java.util.stream.IntStream.rangeClosed(1, Migrations.latest()).boxed().toList(), versions,
                    engine.toString());
        }
    }

    @Test
    void aFileFromANewerShapetrailIsRefusedWithAMessage() throws Exception {
        Path f = dir.resolve("future.sqlite");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + f); Statement s = c.createStatement()) {
            s.executeUpdate("PRAGMA user_version = 99");
        }
        StoreException e = assertThrows(StoreException.class, () -> Database.open(f));
        assertTrue(e.getMessage().contains("newer Shapetrail"), e.getMessage());
    }

    @Test
    void foreignKeysAreOnAndTheJournalIsWal() {
        try (Database db = Database.open(dir.resolve("pragma.sqlite"))) {
            List<String> pragmas = db.inTransaction(tx -> {
                try (Statement s = tx.connection().createStatement()) {
                    var a = s.executeQuery("PRAGMA foreign_keys");
                    a.next();
                    String fk = a.getString(1);
                    var b = s.executeQuery("PRAGMA journal_mode");
                    b.next();
                    return List.of(fk, b.getString(1));
                }
            });
            assertEquals(List.of("1", "wal"), pragmas);
        }
    }
}
