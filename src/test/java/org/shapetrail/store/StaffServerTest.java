package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Staff on one server, against the real PostgreSQL .ci/run starts: each role can do what it should and
 * the server itself refuses the rest, even through plain SQL; every change lands in the audit trail with
 * its login; two people saving the same visit never lose a change; others' saves are heard; four writers
 * at once lose nothing.
 */
@Tag("server")
class StaffServerTest {
    static final String PASSWORD = "correct horse 42";
    static String uri;
    static String schema;
    static String measurerA;
    static String measurerB;
    static String coach;

    @BeforeAll
    static void academyWithThreeAccounts() throws Exception {
        uri = TestServer.sampleAcademy("staff");
        schema = TestServer.schemaOf(uri);
        measurerA = TestServer.uniqueLogin("ana");
        measurerB = TestServer.uniqueLogin("ben");
        coach = TestServer.uniqueLogin("cleo");
        TestServer.addAccounts(uri, PASSWORD, java.util.Map.of(measurerA, StaffRole.MEASURER, measurerB,
                StaffRole.MEASURER, coach, StaffRole.COACH));
    }

    @AfterAll
    static void removeAccounts() {
        TestServer.removeAccounts(uri, List.of(measurerA, measurerB, coach));
    }

    static Database as(String user) {
        ServerAddress base = ServerAddress.parse(uri);
        return Database.connect(base.withUser(user),
                PASSWORD.toCharArray());
    }

    static Connection plainSql(String user) throws SQLException {
        return TestServer.as(user, PASSWORD, schema);
    }

    static Visit newVisit(Database db, long personId, String context) {
        return db.inTransaction(tx -> tx.visits().insert(new Visit(0, personId, LocalDateTime.of(2026, 10, 6, 9, 0),
                tx.measurers().all().get(0).id(), context, "", Fixtures.fullTrials())));
    }

    @Test
    void eachAccountHasItsRoleAndTheServerRefusesWhatTheRoleMayNotDo() throws Exception {
        try (Database a = as(measurerA); Database b = as(measurerB); Database c = as(coach); Database o = Database.open(uri)) {
            assertEquals(java.util.Optional.of(StaffRole.MEASURER), a.role());
            assertEquals(java.util.Optional.of(StaffRole.COACH), c.role());
            assertEquals(java.util.Optional.of(StaffRole.ADMINISTRATOR), o.role()); // the schema's owner
            List<String> names = o.accounts(Accounts::all).stream().map(Accounts.Account::name).toList();
            assertTrue(names.containsAll(List.of(measurerA, measurerB, coach)), names.toString());

            Visit mine = newVisit(a, 3, "pre-season");
            assertEquals(measurerA, readEnteredBy(mine.id())); // the server's stamp, not the program's word
            assertEquals("", a.inTransaction(tx -> tx.visits().stamp(mine.id())).orElseThrow().changedBy());
            // another measurer may read it but not change or delete it, through the app…
            assertEquals(mine.trials(), b.inTransaction(tx -> tx.visits().find(mine.id())).orElseThrow().trials());
            StoreException refused = assertThrows(StoreException.class,
                    () -> b.inTransaction(tx -> { tx.visits().update(mine.withContext("changed by b")); return null; }));
            assertTrue(refused.getMessage().startsWith("The server refused the change: visit " + mine.id()
                    + " was entered by " + measurerA), refused.getMessage());
            assertThrows(StoreException.class, () -> b.inTransaction(tx -> tx.visits().delete(mine.id())));
            // …and not through plain SQL either: the rows are out of their reach, the tables out of their grant
            try (Connection sql = plainSql(measurerB); Statement s = sql.createStatement()) {
                assertEquals(0, s.executeUpdate("UPDATE visit SET context = 'x' WHERE id = " + mine.id()));
                assertEquals(0, s.executeUpdate("DELETE FROM trial WHERE visit_id = " + mine.id()));
                assertEquals(0, s.executeUpdate("DELETE FROM visit WHERE id = " + mine.id()));
                assertEquals("42501", sqlState(() -> s.executeUpdate("DELETE FROM person WHERE id = 1")));
                assertEquals("42501", sqlState(() -> s.executeQuery("SELECT erase_person(1)")));
                assertEquals("42501", sqlState(() -> s.executeUpdate("DELETE FROM audit_entry")));
                assertEquals("42501", sqlState(() -> s.executeUpdate("UPDATE audit_entry SET who = 'nobody'")));
                assertEquals("42501", sqlState(() -> s.executeUpdate(
                        "INSERT INTO audit_entry (action, entity) VALUES ('erasure', 'person')")));
            }
            assertEquals("pre-season", o.inTransaction(tx -> tx.visits().find(mine.id())).orElseThrow().context());
            // a coach reads everything and makes blocks, but enters no visits
            assertEquals(60, c.inTransaction(tx -> tx.people().all()).size()); // the demo academy's 60 people
            StoreException coachVisit = assertThrows(StoreException.class, () -> newVisit(c, 3, "by the coach"));
            assertTrue(coachVisit.getMessage().contains("beyond what your account may do"), coachVisit.getMessage());
            try (Connection sql = plainSql(coach); Statement s = sql.createStatement()) {
                assertEquals(1, s.executeUpdate("INSERT INTO training_block (name, squad_id, starts_on, ends_on)"
                        + " SELECT 'Coach block', id, '2026-10-01', '2026-11-01' FROM squad ORDER BY id LIMIT 1"));
                assertEquals("42501", sqlState(() -> s.executeUpdate("UPDATE person SET notes = 'x' WHERE id = 1")));
            }
            // the measurer edits their own; the administrator may edit anyone's
            a.inTransaction(tx -> { tx.visits().update(mine.withContext("mid-season")); return null; });
            o.inTransaction(tx -> { tx.visits().update(mine.withContext("end of season")); return null; });

            // the trail: who did what, with the old and new values
            List<AuditEntry> trail = o.inTransaction(tx -> tx.trail().ofVisit(mine.id()));
            List<AuditEntry> visitLines = trail.stream().filter(e -> e.entity().equals("visit")).toList();
            assertEquals(List.of("insert " + measurerA, "update " + measurerA, "update " + o.actor()),
                    visitLines.stream().map(e -> e.action() + " " + e.who()).toList());
            assertEquals(List.of("context: pre-season → mid-season"), visitLines.get(1).changes());
            assertEquals(List.of("context: mid-season → end of season"), visitLines.get(2).changes());
            // the visit's trials: one line per visit and write, holding every reading (an edit rewrites them)
            List<AuditEntry> trialInserts = trail.stream().filter(e -> e.entity().equals("trial")
                    && e.action().equals("insert") && e.who().equals(measurerA)).toList();
            assertEquals(2, trialInserts.size(), "at the insert and at the measurer's edit");
            long readings = Fixtures.fullTrials().stream().mapToLong(t -> t.values().size()).sum();
            assertEquals(readings, trialInserts.get(0).changes().size());
            assertTrue(trialInserts.get(0).changes().contains("triceps #2 9.2 mm"), trialInserts.get(0).changes().toString());
            assertTrue(o.inTransaction(tx -> tx.trail().ofPerson(3)).containsAll(trail));
            assertFalse(o.inTransaction(tx -> tx.trail().between(LocalDate.now().minusDays(1), LocalDate.now().plusDays(1)))
                    .isEmpty());
        }
    }

    private static String readEnteredBy(long visitId) throws SQLException {
        try (Connection c = TestServer.admin(); PreparedStatement ps = c.prepareStatement(
                "SELECT entered_by FROM " + schema + ".visit WHERE id = ?")) {
            ps.setLong(1, visitId);
            ResultSet rs = ps.executeQuery();
            rs.next();
            return rs.getString(1);
        }
    }

    interface SqlCall {
        Object run() throws SQLException;
    }

    static String sqlState(SqlCall call) {
        SQLException e = assertThrows(SQLException.class, call::run);
        return e.getSQLState();
    }

    @Test
    void onlyTheOwnerBringsAnOlderSchemaUpToDate() throws Exception {
        // a record an earlier Shapetrail left at schema 8 (the roles and grants exist from 8 on)
        String older = TestServer.freshSchema("older");
        String schema8 = TestServer.schemaOf(older);
        try (Connection c = TestServer.as(TestServer.address().user(), System.getenv("PGPASSWORD"), schema8)) {
            Migrations.migrate(c, 0, 8);
        }
        ServerAddress base = ServerAddress.parse(older);
        ServerAddress asMeasurer = base.withUser(measurerA);
        StoreException e = assertThrows(StoreException.class, () -> Database.connect(asMeasurer, PASSWORD.toCharArray()));
        assertTrue(e.getMessage().contains("is at schema 8 and this " + AppVersion.named() + " needs schema "
                + Migrations.latest() + ". Only the record's owner may bring it up to date"), e.getMessage());
        try (Connection c = TestServer.admin(); Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT max(CAST(version AS INTEGER)) FROM " + schema8 + ".flyway_schema_history")) {
            rs.next();
            assertEquals(8, rs.getInt(1), "nothing was written");
        }
        try (Database owner = Database.open(older)) {
            assertEquals(Migrations.latest(), owner.schemaVersion());
        }
        try (Database d = Database.connect(asMeasurer, PASSWORD.toCharArray())) {
            assertEquals(java.util.Optional.of(StaffRole.MEASURER), d.role()); // and the measurer gets in once it is
        }
    }

    @Test
    void twoPeopleSavingTheSameVisitNeverLoseAChange() throws Exception {
        try (Database a = as(measurerA); Database o = Database.open(uri)) {
            Visit v = newVisit(a, 4, "first version");
            RowStamp seenByA = a.inTransaction(tx -> tx.visits().stamp(v.id())).orElseThrow();
            RowStamp seenByO = o.inTransaction(tx -> tx.visits().stamp(v.id())).orElseThrow();
            assertEquals(seenByA, seenByO);
            // both began editing from the same stamp; the administrator saves first
            o.inTransaction(tx -> { tx.visits().update(v.withContext("the administrator's"), seenByO); return null; });
            EditConflictException e = assertThrows(EditConflictException.class,
                    () -> a.inTransaction(tx -> { tx.visits().update(v.withContext("the measurer's"), seenByA); return null; }));
            assertTrue(e.getMessage().startsWith("This visit was changed by " + o.actor() + " at "), e.getMessage());
            assertTrue(e.getMessage().contains("nothing was overwritten. Reload"), e.getMessage());
            assertEquals(seenByA.version() + 1, e.now().version());
            // nothing lost: the first save stands whole; after a reload the second goes in on top of it
            assertEquals("the administrator's", a.inTransaction(tx -> tx.visits().find(v.id())).orElseThrow().context());
            RowStamp reloaded = a.inTransaction(tx -> tx.visits().stamp(v.id())).orElseThrow();
            a.inTransaction(tx -> { tx.visits().update(v.withContext("the measurer's"), reloaded); return null; });
            assertEquals(List.of("context: first version → the administrator's", "context: the administrator's → the measurer's"),
                    o.inTransaction(tx -> tx.trail().ofVisit(v.id())).stream()
                            .filter(x -> x.entity().equals("visit") && x.action().equals("update"))
                            .flatMap(x -> x.changes().stream()).toList());
        }
    }

    @Test
    void anOpenWindowHearsOfAVisitSavedAtAnotherDesk() throws Exception {
        BlockingQueue<String> heard = new LinkedBlockingQueue<>();
        try (Database coachDesk = as(coach); Database measurerDesk = as(measurerA);
             AutoCloseable listening = coachDesk.listenForChanges(heard::add)) {
            newVisit(measurerDesk, 5, "heard?");
            assertEquals("visit", heard.poll(10, TimeUnit.SECONDS));
            // its own saves are not announced back to it
            heard.clear();
            try (AutoCloseable own = measurerDesk.listenForChanges(heard::add)) {
                newVisit(measurerDesk, 5, "own save");
                assertEquals("visit", heard.poll(10, TimeUnit.SECONDS), "the coach's desk hears it");
                assertEquals(null, heard.poll(1, TimeUnit.SECONDS), "the measurer's own desk does not");
            }
        }
    }

    @Test
    void fourWritersAtOnceLoseNothing() throws Exception {
        // four desks, each entering and editing visits for people of its own, for a bounded time
        long[] people = {6, 7, 8, 9};
        Map<Long, Integer> before = new java.util.HashMap<>();
        try (Database o = Database.open(uri)) {
            for (long p : people) {
                before.put(p, o.inTransaction(tx -> tx.visits().ofPerson(p)).size());
            }
        }
        List<Thread> threads = new ArrayList<>();
        int[] saved = new int[people.length];
        int[] edited = new int[people.length];
        List<Throwable> failures = java.util.Collections.synchronizedList(new ArrayList<>());
        long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(3);
        for (int w = 0; w < people.length; w++) {
            int k = w;
            threads.add(new Thread(() -> {
                try (Database db = w(k)) {
                    while (System.nanoTime() < until) {
                        Visit v = newVisit(db, people[k], "writer " + k + " #" + saved[k]);
                        saved[k]++;
                        RowStamp s = db.inTransaction(tx -> tx.visits().stamp(v.id())).orElseThrow();
                        db.inTransaction(tx -> { tx.visits().update(v.withContext(v.context() + " edited"), s); return null; });
                        edited[k]++;
                    }
                } catch (Throwable t) {
                    failures.add(t);
                }
            }));
        }
        threads.forEach(Thread::start);
        for (Thread t : threads) {
            t.join(60_000);
        }
        assertEquals(List.of(), failures);
        try (Database o = Database.open(uri)) {
            for (int k = 0; k < people.length; k++) {
                long p = people[k];
                List<Visit> vs = o.inTransaction(tx -> tx.visits().ofPerson(p));
                assertEquals(before.get(p) + saved[k], vs.size(), "person " + p);
                assertTrue(saved[k] > 0 && edited[k] == saved[k]);
                int k2 = k;
                List<Visit> written = vs.stream().filter(v -> v.context().startsWith("writer " + k2 + " ")).toList();
                assertEquals(saved[k], written.size());
                for (Visit v : written) {
                    assertTrue(v.context().endsWith(" edited"), v.context());
                    assertEquals(Fixtures.fullTrials(), v.trials()); // whole: every trial of every visit
                }
            }
        }
    }

    /** Writer k's desk: two measurers and the owner, so that writers of different logins overlap. */
    private static Database w(int k) {
        return switch (k % 3) {
            case 0 -> as(measurerA);
            case 1 -> as(measurerB);
            default -> Database.open(uri);
        };
    }
}
