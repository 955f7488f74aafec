package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.ProblemKind;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitDate;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.somatotype.Rating;

/**
 * Visits with their raw trials. A visit is checked by the core ({@link VisitCheck}) before anything is
 * written and saved whole (visit row and every trial) or not at all.
 */
public final class VisitRepository {
    static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss");
    private final Connection c;

    /** The engine behind the connection, asked once (see {@link #engine()}). */
    private Engine engine;

    VisitRepository(Connection c) {
        this.c = c;
    }

    /**
     * Checks and saves a new visit.
     *
     * @throws InvalidVisitException with every reason, before anything is written
     */
    public Visit insert(Visit v) throws SQLException {
        return insertAll(List.of(v)).get(0);
    }

    /**
     * Checks every visit first, then saves them all with multi-row statements; used for bulk work such as
     * imports and the demo database. Nothing is written if any visit is refused.
     */
    public List<Visit> insertAll(List<Visit> visits) throws SQLException {
        try (BulkWriter w = bulkWriter()) {
            for (int i = 0; i < visits.size(); i++) {
                List<org.shapetrail.measure.Problem> problems = w.check(i, visits.get(i).trials());
                if (!problems.isEmpty()) {
                    throw new InvalidVisitException(problems);
                }
            }
            List<Visit> saved = new ArrayList<>(visits.size());
            for (Visit v : visits) {
                Visit s = v.withId(w.firstId() + saved.size());
                w.visit(s.id(), s.personId(), s.measuredAt(), s.measurerId(), s.context(), s.notes(), s.trialCount());
                for (SiteTrials t : s.trials()) {
                    for (int k = 0; k < t.values().size(); k++) {
                        w.trial(s.id(), t.site(), k + 1, t.values().get(k));
                    }
                }
                saved.add(s);
            }
            w.finish(saved);
            return saved;
        }
    }

    /**
     * The next free visit id. Ids are given by the writer rather than asked back per row: a transaction
     * holds the write lock (BEGIN IMMEDIATE), so nobody else can take the next id meanwhile.
     */
    private long nextVisitId() throws SQLException {
        if (engine() == Engine.POSTGRESQL) {
            // the same guarantee on a server: writers of visits take turns (readers are not held up), and
            // the id sequence is moved past the ids given here when the write finishes
            try (Statement s = c.createStatement()) {
                s.execute("LOCK TABLE visit IN EXCLUSIVE MODE");
            }
        }
        try (PreparedStatement max = c.prepareStatement("SELECT coalesce(max(id), 0) FROM visit");
             ResultSet rs = max.executeQuery()) {
            rs.next();
            return rs.getLong(1) + 1;
        }
    }

    /** A 64-bit fingerprint of a visit's sites and values, in order (a splitmix-style mix of each). */
    static long fingerprint(List<SiteTrials> trials) {
        long h = 0x9E3779B97F4A7C15L;
        for (SiteTrials t : trials) {
            h = mix(h + t.site().ordinal());
            h = mix(h + t.values().size());
            for (double v : t.values()) {
                h = mix(h + Double.doubleToLongBits(v));
            }
        }
        return h;
    }

    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    private static void bindVisit(PreparedStatement ps, int offset, Visit v, int trialCount) throws SQLException {
        ps.setLong(offset + 1, v.id());
        ps.setLong(offset + 2, v.personId());
        ps.setString(offset + 3, v.measuredAt().format(TIME));
        ps.setLong(offset + 4, v.measurerId());
        ps.setString(offset + 5, v.context());
        ps.setString(offset + 6, v.notes());
        ps.setInt(offset + 7, trialCount);
    }

    /**
     * Starts a bulk write of many visits in this transaction, for an import that writes while it reads. The
     * caller gives each visit's row ({@link BulkWriter#visit}) before its trials ({@link BulkWriter#trial}),
     * and new people and measurers before the visits that name them, so every foreign key holds as rows go
     * in. {@link BulkWriter#finish} checks every visit with the core, that exactly the visits' trials were
     * written and corrects the count of a visit whose trials came in more than one run; it throws otherwise,
     * so that the transaction rolls back. The writing calls may come from another thread than check and
     * finish, one after the other.
     */
    public BulkWriter bulkWriter() throws SQLException {
        return new BulkWriter(nextVisitId());
    }

    /** See {@link #bulkWriter()}. */
    public final class BulkWriter implements AutoCloseable {
        private static final int VISITS_PER_STATEMENT = 50;
        private final long firstId;
        private final TrialWriter trials;
        private final PreparedStatement[] visitStatements = new PreparedStatement[VISITS_PER_STATEMENT + 1];
        private final List<Visit> unwritten = new ArrayList<>(VISITS_PER_STATEMENT);
        private int[] trialsOf = new int[1024];
        private int[] countWritten = new int[1024];
        private int visits;
        private long[] checked = new long[1024];
        private boolean[] isChecked = new boolean[1024];

        private BulkWriter(long firstId) throws SQLException {
            this.firstId = firstId;
            this.trials = new TrialWriter(c, engine(), this::writeVisitRows);
        }

        /** The id of the first visit of this write; the i-th visit (from 0) gets firstId + i. */
        public long firstId() {
            return firstId;
        }

        /** Writes a new person; returns the id. */
        public long person(Person draft) throws SQLException {
            return new PersonRepository(c).insert(draft).id();
        }

        /** Writes a new measurer; returns the id. */
        public long measurer(String name) throws SQLException {
            return new MeasurerRepository(c).insert(name, "").id();
        }

        /**
         * Writes the row of the next visit, id {@code firstId() + visits so far}, before any of its trials.
         *
         * @param trialCount the trials it has now; {@link #finish} corrects it if more come later
         */
        public void visit(long id, long personId, LocalDateTime measuredAt, long measurerId, String context,
                          String notes, int trialCount) throws SQLException {
            if (id != firstId + visits) {
                throw new StoreException("Visit " + id + " is out of order in the bulk write; nothing was written.");
            }
            if (visits == countWritten.length) {
                countWritten = java.util.Arrays.copyOf(countWritten, visits * 2);
                trialsOf = java.util.Arrays.copyOf(trialsOf, visits * 2);
            }
            countWritten[visits++] = trialCount;
            unwritten.add(new Visit(id, personId, measuredAt, measurerId, context, notes, List.of()));
            if (unwritten.size() == VISITS_PER_STATEMENT) {
                writeVisitRows();
            }
        }

        /** Writes one trial of a visit whose row was given. */
        public void trial(long visitId, Site site, int trialNo, double value) throws SQLException {
            long i = visitId - firstId;
            if (i < 0 || i >= visits) {
                throw new StoreException("A trial of visit " + visitId + " came before its visit; nothing was written.");
            }
            trialsOf[(int) i]++;
            trials.add(visitId, site, trialNo, value);
        }

        /** The visit rows given so far, written before any trial statement runs (their foreign key). */
        private void writeVisitRows() throws SQLException {
            int n = unwritten.size();
            if (n == 0) {
                return;
            }
            PreparedStatement ps = visitStatements[n];
            if (ps == null) {
                String row = " (?, ?, ?, ?, ?, ?, ?)";
                ps = c.prepareStatement("INSERT INTO visit (id, person_id, measured_at, measurer_id, context, notes,"
                        + " trial_count) VALUES" + row + ("," + row).repeat(n - 1));
                visitStatements[n] = ps;
            }
            for (int k = 0; k < n; k++) {
                Visit v = unwritten.get(k);
                bindVisit(ps, k * 7, v, countWritten[(int) (v.id() - firstId)]);
            }
            ps.executeUpdate();
            unwritten.clear();
        }

        /**
         * Checks the trials of the visit numbered {@code index} with the core, without writing; may run on
         * another thread than the writing calls, while they go on. {@link #finish} then checks again only the
         * visits whose trials differ from those checked here without problems (compared by a 64-bit
         * fingerprint of every site and value, so nothing needs to be kept).
         *
         * @return every problem; none when the visit can be written
         */
        public List<org.shapetrail.measure.Problem> check(int index, List<SiteTrials> visitTrials) {
            VisitEvaluation ev = VisitCheck.evaluate(visitTrials);
            if (ev.isValid()) {
                if (index >= checked.length) {
                    checked = java.util.Arrays.copyOf(checked, Math.max(index + 1, checked.length * 2));
                    isChecked = java.util.Arrays.copyOf(isChecked, checked.length);
                }
                checked[index] = fingerprint(visitTrials);
                isChecked[index] = true;
            }
            return ev.problems();
        }

        /**
         * Ends the write of {@code all}, the visits in the order of their ids: each checked with the core
         * (unless {@link #check} passed its very trials), and exactly its trials written.
         *
         * @throws InvalidVisitException when a visit is refused; StoreException when what was written differs
         */
        public void finish(List<Visit> all) throws SQLException {
            Map<Long, LocalDate> births = birthDates();
            LocalDate today = LocalDate.now();
            for (int i = 0; i < all.size(); i++) {
                Visit v = all.get(i);
                List<Problem> problems = new ArrayList<>(fieldProblems(v, births.get(v.personId()), today));
                if (i >= checked.length || !isChecked[i] || checked[i] != fingerprint(v.trials())) {
                    problems.addAll(VisitCheck.evaluate(v.trials()).problems());
                }
                if (!problems.isEmpty()) {
                    throw new InvalidVisitException(problems);
                }
            }
            writeVisitRows();
            trials.flush();
            if (all.size() != visits) {
                throw new StoreException("The bulk write has " + visits + " visit rows for " + all.size()
                        + " visits; nothing was written.");
            }
            if (visits > 0 && engine() == Engine.POSTGRESQL) {
                try (Statement s = c.createStatement()) {
                    s.execute("SELECT setval(pg_get_serial_sequence('visit', 'id'), (SELECT max(id) FROM visit))");
                }
            }
            try (PreparedStatement fix = c.prepareStatement("UPDATE visit SET trial_count = ? WHERE id = ?")) {
                for (int i = 0; i < visits; i++) {
                    int expected = all.get(i).trialCount();
                    if (trialsOf[i] != expected) {
                        throw new StoreException("Visit " + (firstId + i) + " has " + trialsOf[i] + " trials written but "
                                + expected + " given; nothing was written.");
                    }
                    if (countWritten[i] != expected) {
                        fix.setInt(1, expected);
                        fix.setLong(2, firstId + i);
                        fix.executeUpdate();
                    }
                }
            }
        }

        @Override
        public void close() throws SQLException {
            try {
                trials.close();
            } finally {
                for (PreparedStatement ps : visitStatements) {
                    if (ps != null) {
                        ps.close();
                    }
                }
            }
        }
    }

    /**
     * Writes trial rows with one statement per {@value #ROWS} rows (far fewer calls into SQLite than one
     * statement per row); the rest go one by one at {@link #flush}. A row binds the site's position in
     * {@link Site} and SQL turns it into the site's code and unit, so that no text is bound per row.
     */
    private static final class TrialWriter implements AutoCloseable {
        private static final int ROWS = 100;
        private static final Site[] SITES = Site.values();
        private final PreparedStatement many;
        private final PreparedStatement one;
        private final long[] visit = new long[ROWS];
        private final int[] site = new int[ROWS];
        private final int[] trialNo = new int[ROWS];
        private final double[] value = new double[ROWS];
        private int n;

        /** Work that must run before any trial statement (the bulk writer's pending visit rows). */
        interface BeforeWrite {
            void run() throws SQLException;
        }

        private final BeforeWrite before;

        TrialWriter(Connection c, Engine engine) throws SQLException {
            this(c, engine, () -> { });
        }

        /** On a server where row rules do not apply to this login: trials go by COPY, the driver's bulk path. */
        private final org.postgresql.copy.CopyManager copy;
        private final boolean server;
        private final Connection connection;
        private final StringBuilder copied = new StringBuilder();
        private int copiedRows;
        private static final int COPY_ROWS = 20_000;

        TrialWriter(Connection c, Engine engine, BeforeWrite before) throws SQLException {
            this.before = before;
            server = engine == Engine.POSTGRESQL;
            connection = c;
            copy = server && !rowRulesApply(c) ? c.unwrap(org.postgresql.PGConnection.class).getCopyAPI() : null;
            many = c.prepareStatement(insert(ROWS, server));
            one = c.prepareStatement(insert(1, server));
        }

        /** SQLite names a VALUES list's columns column1…; PostgreSQL is told the same names. */
        private static String insert(int rows, boolean server) {
            StringBuilder code = new StringBuilder("CASE column2");
            StringBuilder unit = new StringBuilder("CASE column2");
            for (Site s : SITES) {
                code.append(" WHEN ").append(s.ordinal()).append(" THEN '").append(s.code()).append('\'');
                unit.append(" WHEN ").append(s.ordinal()).append(" THEN '").append(s.unit().symbol()).append('\'');
            }
            StringBuilder sql = new StringBuilder("INSERT INTO trial (visit_id, site, trial_no, value, unit) SELECT"
                    + " column1, ").append(code).append(" END, column3, column4, ").append(unit)
                    .append(" END FROM (VALUES (?, ?, ?, ?)");
            for (int i = 1; i < rows; i++) {
                sql.append(", (?, ?, ?, ?)");
            }
            return sql.append(server ? ") AS v (column1, column2, column3, column4)" : ")").toString();
        }

        void addAll(long visitId, List<SiteTrials> trials) throws SQLException {
            for (SiteTrials t : trials) {
                for (int i = 0; i < t.values().size(); i++) {
                    add(visitId, t.site(), i + 1, t.values().get(i));
                }
            }
        }

        /** Whether the server's row rules bind this login on the trial table (COPY FROM is refused then). */
        private static boolean rowRulesApply(Connection c) throws SQLException {
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT row_security_active('trial')")) {
                return rs.next() && rs.getBoolean(1);
            }
        }

        void add(long visitId, Site s, int no, double v) throws SQLException {
            if (copy != null) {
                copied.append(visitId).append('\t').append(s.code()).append('\t').append(no).append('\t')
                        .append(v).append('\t').append(s.unit().symbol()).append('\n');
                if (++copiedRows == COPY_ROWS) {
                    sendCopied();
                }
                return;
            }
            visit[n] = visitId;
            site[n] = s.ordinal();
            trialNo[n] = no;
            value[n] = v;
            if (++n == ROWS) {
                before.run();
                for (int i = 0; i < ROWS; i++) {
                    bind(many, i * 4, i);
                }
                many.executeUpdate();
                n = 0;
            }
        }

        private void bind(PreparedStatement ps, int offset, int i) throws SQLException {
            ps.setLong(offset + 1, visit[i]);
            ps.setInt(offset + 2, site[i]);
            ps.setInt(offset + 3, trialNo[i]);
            ps.setDouble(offset + 4, value[i]);
        }

        private void sendCopied() throws SQLException {
            if (copiedRows == 0) {
                return;
            }
            before.run();
            try {
                copy.copyIn("COPY trial (visit_id, site, trial_no, value, unit) FROM STDIN",
                        new java.io.StringReader(copied.toString()));
            } catch (java.io.IOException e) {
                throw new SQLException("the trials could not be sent to the server: " + e.getMessage(), "08006", e);
            }
            copied.setLength(0);
            copiedRows = 0;
        }

        void flush() throws SQLException {
            if (copy != null) {
                sendCopied();
                return;
            }
            if (server && n > 1) {
                // the rest in one statement: the server's trail then keeps a visit's trials on one line
                before.run();
                try (PreparedStatement rest = connection.prepareStatement(insert(n, true))) {
                    for (int i = 0; i < n; i++) {
                        bind(rest, i * 4, i);
                    }
                    rest.executeUpdate();
                }
                n = 0;
                return;
            }
            before.run();
            for (int i = 0; i < n; i++) {
                bind(one, 0, i);
                one.addBatch();
            }
            if (n > 0) {
                one.executeBatch();
            }
            n = 0;
        }

        @Override
        public void close() throws SQLException {
            try {
                flush();
            } finally {
                many.close();
                one.close();
            }
        }
    }

    /**
     * Problems of a visit's own fields, the rules every path shares: its date against the person's birth
     * and today ({@link VisitDate}), and its context and notes ({@link TextRules}).
     *
     * @param birth the person's date of birth, or null when the person is not in the file
     */
    static List<Problem> fieldProblems(Visit v, LocalDate birth, LocalDate today) {
        List<Problem> out = new ArrayList<>(0);
        VisitDate.check(birth, v.measuredAt().toLocalDate(), today).ifPresent(out::add);
        TextRules.problem(TextRules.Field.CONTEXT, v.context()).ifPresent(w -> out.add(textProblem(w)));
        TextRules.problem(TextRules.Field.NOTES, v.notes()).ifPresent(w -> out.add(textProblem(w)));
        return out;
    }

    private static Problem textProblem(String why) {
        return new Problem(null, ProblemKind.UNUSABLE_TEXT, Character.toUpperCase(why.charAt(0)) + why.substring(1) + ".");
    }

    /** Every person's date of birth, by id. */
    private Map<Long, LocalDate> birthDates() throws SQLException {
        Map<Long, LocalDate> out = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, birth_date FROM person");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.put(rs.getLong(1), LocalDate.parse(rs.getString(2)));
            }
        }
        return out;
    }

    /** The visit's row stamp as stored now: what an edit form keeps to save against. */
    public Optional<RowStamp> stamp(long visitId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT row_version, changed_by, changed_at FROM visit WHERE id = ?")) {
            ps.setLong(1, visitId);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(new RowStamp(visitId, rs.getInt(1), rs.getString(2), rs.getString(3)))
                        : Optional.empty();
            }
        }
    }

    /**
     * Replaces an existing visit's fields and trials when it is still as {@code seen} (nobody saved it
     * since); otherwise nothing is written and {@link EditConflictException} names who changed it when.
     */
    public void update(Visit v, RowStamp seen) throws SQLException {
        if (seen.visitId() != v.id()) {
            throw new IllegalArgumentException("stamp of visit " + seen.visitId() + " for visit " + v.id());
        }
        // take the row first (a writer's lock on it until commit), then compare: no one can slip in between
        try (PreparedStatement lock = c.prepareStatement(engine() == Engine.POSTGRESQL
                ? "SELECT id FROM visit WHERE id = ? FOR UPDATE" : "SELECT id FROM visit WHERE id = ?")) {
            lock.setLong(1, v.id());
            lock.executeQuery().close();
        }
        Optional<RowStamp> now = stamp(v.id());
        if (now.isEmpty() || now.get().version() != seen.version()) {
            throw new EditConflictException(seen, now.orElse(null));
        }
        update(v);
    }

    private Engine engine() throws SQLException {
        if (engine == null) {
            engine = Engine.of(c);
        }
        return engine;
    }


    /** Replaces an existing visit's fields and trials (checked first; whole or not at all). */
    public void update(Visit v) throws SQLException {
        List<Problem> problems = new ArrayList<>(fieldProblems(v, birthDates().get(v.personId()), LocalDate.now()));
        problems.addAll(VisitCheck.evaluate(v.trials()).problems());
        if (!problems.isEmpty()) {
            throw new InvalidVisitException(problems);
        }
        try (PreparedStatement ps = c.prepareStatement("UPDATE visit SET person_id = ?, measured_at = ?,"
                + " measurer_id = ?, context = ?, notes = ?, trial_count = ?, row_version = row_version + 1,"
                + " changed_by = ?, changed_at = ? WHERE id = ?")) {
            ps.setLong(1, v.personId());
            ps.setString(2, v.measuredAt().format(TIME));
            ps.setLong(3, v.measurerId());
            ps.setString(4, v.context());
            ps.setString(5, v.notes());
            ps.setInt(6, v.trialCount());
            ps.setString(7, Engine.actor(c));
            ps.setString(8, java.time.Instant.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS).toString());
            ps.setLong(9, v.id());
            if (ps.executeUpdate() != 1) {
                throw notChanged(v.id());
            }
        }
        try (PreparedStatement del = c.prepareStatement("DELETE FROM trial WHERE visit_id = ?")) {
            del.setLong(1, v.id());
            del.executeUpdate();
        }
        try (TrialWriter trials = new TrialWriter(c, engine())) {
            trials.addAll(v.id(), v.trials());
        }
    }

    /** Deletes a visit with its trials and rating; true when it existed. */
    public boolean delete(long visitId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM visit WHERE id = ?")) {
            ps.setLong(1, visitId);
            if (ps.executeUpdate() == 1) {
                return true;
            }
        }
        if (stamp(visitId).isPresent()) {
            throw notChanged(visitId); // there, but the server's rules hid it from this account's change
        }
        return false;
    }

    /**
     * Why a change to a visit touched no row: none with that id, or (on a server) a measurer's rule that
     * they change only the visits they entered.
     */
    private StoreException notChanged(long visitId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT entered_by FROM visit WHERE id = ?")) {
            ps.setLong(1, visitId);
            try (ResultSet rs = ps.executeQuery()) {
                if (rs.next()) {
                    return new StoreException(org.shapetrail.i18n.Messages.tr("visit.notYours", String.valueOf(visitId), rs.getString(1)));
                }
            }
        }
        return new StoreException(org.shapetrail.i18n.Messages.tr("visit.none", String.valueOf(visitId)));
    }

    public Optional<Visit> find(long visitId) throws SQLException {
        List<Visit> vs = query("WHERE v.id = ?", visitId);
        return vs.isEmpty() ? Optional.empty() : Optional.of(vs.get(0));
    }

    /** A person's visits in time order. */
    public List<Visit> ofPerson(long personId) throws SQLException {
        return query("WHERE v.person_id = ?", personId);
    }

    /** Every visit, by person then time. */
    public List<Visit> all() throws SQLException {
        return query("", null);
    }

    /** Number of visits stored. */
    public int count() throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT count(*) FROM visit"); ResultSet rs = ps.executeQuery()) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    private List<Visit> query(String where, Long param) throws SQLException {
        Map<Long, List<SiteTrials>> trials = new LinkedHashMap<>();
        Map<Long, Object[]> rows = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT v.id, v.person_id, v.measured_at, v.measurer_id,"
                + " v.context, v.notes FROM visit v " + where + " ORDER BY v.person_id, v.measured_at, v.id")) {
            if (param != null) {
                ps.setLong(1, param);
            }
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    rows.put(rs.getLong(1), new Object[] {rs.getLong(2), rs.getString(3), rs.getLong(4),
                        rs.getString(5), rs.getString(6)});
                }
            }
        }
        try (PreparedStatement ps = c.prepareStatement("SELECT t.visit_id, t.site, t.trial_no, t.value FROM trial t"
                + " JOIN visit v ON v.id = t.visit_id " + where + " ORDER BY t.visit_id, t.site, t.trial_no")) {
            if (param != null) {
                ps.setLong(1, param);
            }
            try (ResultSet rs = ps.executeQuery()) {
                long currentVisit = -1;
                String currentSite = null;
                List<Double> values = new ArrayList<>();
                while (rs.next()) {
                    long vid = rs.getLong(1);
                    String site = rs.getString(2);
                    if (vid != currentVisit || !site.equals(currentSite)) {
                        flush(trials, currentVisit, currentSite, values);
                        currentVisit = vid;
                        currentSite = site;
                        values = new ArrayList<>();
                    }
                    values.add(rs.getDouble(4));
                }
                flush(trials, currentVisit, currentSite, values);
            }
        }
        List<Visit> out = new ArrayList<>(rows.size());
        for (Map.Entry<Long, Object[]> e : rows.entrySet()) {
            Object[] r = e.getValue();
            List<SiteTrials> ts = new ArrayList<>(trials.getOrDefault(e.getKey(), List.of()));
            ts.sort((a, b) -> Integer.compare(a.site().ordinal(), b.site().ordinal()));
            out.add(new Visit(e.getKey(), (Long) r[0], LocalDateTime.parse((String) r[1], TIME), (Long) r[2],
                    (String) r[3], (String) r[4], ts));
        }
        return out;
    }

    private static void flush(Map<Long, List<SiteTrials>> trials, long visit, String site, List<Double> values) {
        if (site == null || values.isEmpty()) {
            return;
        }
        Site s = Site.byCode(site).orElseThrow(() -> new StoreException(org.shapetrail.i18n.Messages.tr(
                "visit.unknownSite", site)));
        trials.computeIfAbsent(visit, k -> new ArrayList<>()).add(new SiteTrials(s, values));
    }

    /** Sets (or replaces) the rater's rating of a visit. */
    public void setRating(VisitRating r) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO visit_rating (visit_id, endomorphy,"
                + " mesomorphy, ectomorphy, rater, method) VALUES (?, ?, ?, ?, ?, ?) ON CONFLICT (visit_id) DO UPDATE"
                + " SET endomorphy = excluded.endomorphy, mesomorphy = excluded.mesomorphy,"
                + " ectomorphy = excluded.ectomorphy, rater = excluded.rater, method = excluded.method")) {
            ps.setLong(1, r.visitId());
            ps.setDouble(2, r.rating().endomorphy());
            ps.setDouble(3, r.rating().mesomorphy());
            ps.setDouble(4, r.rating().ectomorphy());
            ps.setString(5, r.rater());
            ps.setString(6, r.method().code());
            ps.executeUpdate();
        }
    }

    /** Removes the rater's rating of a visit, if there is one. */
    public void deleteRating(long visitId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM visit_rating WHERE visit_id = ?")) {
            ps.setLong(1, visitId);
            ps.executeUpdate();
        }
    }

    /** The rater's rating of one visit, if any. */
    public Optional<VisitRating> rating(long visitId) throws SQLException {
        return Optional.ofNullable(ratings().get(visitId));
    }

    /** Every rater's rating, keyed by visit id. */
    public Map<Long, VisitRating> ratings() throws SQLException {
        Map<Long, VisitRating> out = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT visit_id, endomorphy, mesomorphy, ectomorphy, rater,"
                + " method FROM visit_rating ORDER BY visit_id");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.put(rs.getLong(1), new VisitRating(rs.getLong(1),
                        new Rating(rs.getDouble(2), rs.getDouble(3), rs.getDouble(4)), rs.getString(5),
                        RatingMethod.ofCode(rs.getString(6))));
            }
        }
        return out;
    }

    /** Visits whose stored trial rows do not number {@code trial_count}: should always be empty. */
    public List<Long> incompleteVisits() throws SQLException {
        List<Long> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT v.id FROM visit v LEFT JOIN trial t ON t.visit_id = v.id"
                + " GROUP BY v.id HAVING count(t.visit_id) <> v.trial_count");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(rs.getLong(1));
            }
        }
        return out;
    }
}
