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
