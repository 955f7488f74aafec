package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.somatotype.Rating;

/**
 * Visits with their raw trials. A visit is checked by the core ({@link VisitCheck}) before anything is
 * written and saved whole (visit row and every trial) or not at all.
 */
public final class VisitRepository {
    static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd'T'HH:mm:ss");
    private static final int BATCH = 5000;
    private final Connection c;

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
     * Checks every visit first, then saves them all with batched statements; used for bulk work such as
     * imports and the demo database. Nothing is written if any visit is refused.
     */
    public List<Visit> insertAll(List<Visit> visits) throws SQLException {
        for (Visit v : visits) {
            check(v);
        }
        List<Visit> saved = new ArrayList<>(visits.size());
        // ids are given here rather than asked back per row: the transaction holds the write lock
        // (BEGIN IMMEDIATE), so nobody else can take the next id meanwhile
        long nextId;
        try (PreparedStatement max = c.prepareStatement("SELECT coalesce(max(id), 0) FROM visit");
             ResultSet rs = max.executeQuery()) {
            rs.next();
            nextId = rs.getLong(1) + 1;
        }
        try (PreparedStatement pv = c.prepareStatement("INSERT INTO visit (id, person_id, measured_at, measurer_id,"
                + " context, notes, trial_count) VALUES (?, ?, ?, ?, ?, ?, ?)");
             PreparedStatement pt = c.prepareStatement(
                     "INSERT INTO trial (visit_id, site, trial_no, value, unit) VALUES (?, ?, ?, ?, ?)")) {
            int pending = 0;
            for (Visit v : visits) {
                long id = nextId++;
                pv.setLong(1, id);
                pv.setLong(2, v.personId());
                pv.setString(3, v.measuredAt().format(TIME));
                pv.setLong(4, v.measurerId());
                pv.setString(5, v.context());
                pv.setString(6, v.notes());
                pv.setInt(7, v.trialCount());
                pv.addBatch();
                pending += addTrials(pt, id, v.trials());
                if (pending >= BATCH) {
                    pv.executeBatch(); // visits before their trials, for the foreign key
                    pt.executeBatch();
                    pending = 0;
                }
                saved.add(v.withId(id));
            }
            pv.executeBatch();
            if (pending > 0) {
                pt.executeBatch();
            }
        }
        return saved;
    }

    private static int addTrials(PreparedStatement pt, long visitId, List<SiteTrials> trials) throws SQLException {
        int n = 0;
        for (SiteTrials t : trials) {
            for (int i = 0; i < t.values().size(); i++) {
                pt.setLong(1, visitId);
                pt.setString(2, t.site().code());
                pt.setInt(3, i + 1);
                pt.setDouble(4, t.values().get(i));
                pt.setString(5, t.site().unit().symbol());
                pt.addBatch();
                n++;
            }
        }
        return n;
    }

    private static void check(Visit v) {
        VisitEvaluation ev = VisitCheck.evaluate(v.trials());
        if (!ev.isValid()) {
            throw new InvalidVisitException(ev.problems());
        }
    }

    /** Replaces an existing visit's fields and trials (checked first; whole or not at all). */
    public void update(Visit v) throws SQLException {
        check(v);
        try (PreparedStatement ps = c.prepareStatement("UPDATE visit SET person_id = ?, measured_at = ?,"
                + " measurer_id = ?, context = ?, notes = ?, trial_count = ? WHERE id = ?")) {
            ps.setLong(1, v.personId());
            ps.setString(2, v.measuredAt().format(TIME));
            ps.setLong(3, v.measurerId());
            ps.setString(4, v.context());
            ps.setString(5, v.notes());
            ps.setInt(6, v.trialCount());
            ps.setLong(7, v.id());
            if (ps.executeUpdate() != 1) {
                throw new StoreException("There is no visit with id " + v.id() + ".");
            }
        }
        try (PreparedStatement del = c.prepareStatement("DELETE FROM trial WHERE visit_id = ?")) {
            del.setLong(1, v.id());
            del.executeUpdate();
        }
        try (PreparedStatement pt = c.prepareStatement(
                "INSERT INTO trial (visit_id, site, trial_no, value, unit) VALUES (?, ?, ?, ?, ?)")) {
            addTrials(pt, v.id(), v.trials());
            pt.executeBatch();
        }
    }

    /** Deletes a visit with its trials and rating; true when it existed. */
    public boolean delete(long visitId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM visit WHERE id = ?")) {
            ps.setLong(1, visitId);
            return ps.executeUpdate() == 1;
        }
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
        Site s = Site.byCode(site).orElseThrow(() -> new StoreException("Unknown site '" + site
                + "' in the file; it was written by a newer Shapetrail."));
        trials.computeIfAbsent(visit, k -> new ArrayList<>()).add(new SiteTrials(s, values));
    }

    /** Sets (or replaces) the rater's rating of a visit. */
    public void setRating(VisitRating r) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT OR REPLACE INTO visit_rating (visit_id, endomorphy,"
                + " mesomorphy, ectomorphy, rater, method) VALUES (?, ?, ?, ?, ?, ?)")) {
            ps.setLong(1, r.visitId());
            ps.setDouble(2, r.rating().endomorphy());
            ps.setDouble(3, r.rating().mesomorphy());
            ps.setDouble(4, r.rating().ectomorphy());
            ps.setString(5, r.rater());
            ps.setString(6, r.method().code());
            ps.executeUpdate();
        }
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
