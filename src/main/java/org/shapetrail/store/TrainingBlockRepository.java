package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Training blocks of squads: insert, update, delete, find and list, each with its chosen visits. A block's
 * name is unique in the file (the command line names blocks), its dates are in order, and a chosen visit
 * belongs to its member, the before one earlier than the after one.
 */
public final class TrainingBlockRepository {
    private final Connection c;

    TrainingBlockRepository(Connection c) {
        this.c = c;
    }

    /** Saves a new block (id 0) with its picks and returns it with its id. */
    public TrainingBlock insert(TrainingBlock b) throws SQLException {
        check(b);
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO training_block (name, squad_id, starts_on, ends_on,"
                + " aim) VALUES (?, ?, ?, ?, ?)", Statement.RETURN_GENERATED_KEYS)) {
            bind(ps, b);
            ps.executeUpdate();
            TrainingBlock saved = b.withId(Sql.generatedId(ps));
            writePicks(saved);
            return saved;
        }
    }

    /** Replaces an existing block's fields and picks. */
    public void update(TrainingBlock b) throws SQLException {
        check(b);
        try (PreparedStatement ps = c.prepareStatement("UPDATE training_block SET name = ?, squad_id = ?, starts_on = ?,"
                + " ends_on = ?, aim = ? WHERE id = ?")) {
            bind(ps, b);
            ps.setLong(6, b.id());
            if (ps.executeUpdate() != 1) {
                throw new StoreException(org.shapetrail.i18n.Messages.tr("blockstore.none", String.valueOf(b.id())));
            }
        }
        try (PreparedStatement del = c.prepareStatement("DELETE FROM block_pick WHERE block_id = ?")) {
            del.setLong(1, b.id());
            del.executeUpdate();
        }
        writePicks(b);
    }

    /** Deletes a block with its picks; true when it existed. */
    public boolean delete(long id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM training_block WHERE id = ?")) {
            ps.setLong(1, id);
            return ps.executeUpdate() == 1;
        }
    }

    public Optional<TrainingBlock> find(long id) throws SQLException {
        return all().stream().filter(b -> b.id() == id).findFirst();
    }

    /** Every block, by start, with its picks. */
    public List<TrainingBlock> all() throws SQLException {
        Map<Long, Map<Long, TrainingBlock.Pick>> picks = new HashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT block_id, person_id, before_visit_id, after_visit_id"
                + " FROM block_pick"); ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                picks.computeIfAbsent(rs.getLong(1), k -> new HashMap<>()).put(rs.getLong(2),
                        new TrainingBlock.Pick(rs.getLong(3), rs.getLong(4)));
            }
        }
        List<TrainingBlock> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name, squad_id, starts_on, ends_on, aim"
                + " FROM training_block ORDER BY starts_on, id");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new TrainingBlock(rs.getLong("id"), rs.getString("name"), rs.getLong("squad_id"),
                        LocalDate.parse(rs.getString("starts_on")), LocalDate.parse(rs.getString("ends_on")),
                        rs.getString("aim"), picks.getOrDefault(rs.getLong("id"), Map.of())));
            }
        }
        return out;
    }

    private static void bind(PreparedStatement ps, TrainingBlock b) throws SQLException {
        ps.setString(1, TextRules.require(TextRules.Field.BLOCK_NAME, b.name().strip()));
        ps.setLong(2, b.squadId());
        ps.setString(3, b.startsOn().toString());
        ps.setString(4, b.endsOn().toString());
        ps.setString(5, TextRules.require(TextRules.Field.BLOCK_AIM, b.aim()));
    }

    /** Refuses a name used by another block, and picks whose visits are not the member's or out of order. */
    private void check(TrainingBlock b) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id FROM training_block WHERE lower(trim(name)) ="
                + " lower(trim(?)) AND id <> ?")) {
            ps.setString(1, b.name());
            ps.setLong(2, b.id());
            try (ResultSet rs = ps.executeQuery()) {
                if (rs.next()) {
                    throw new StoreException(org.shapetrail.i18n.Messages.tr("blockstore.taken", b.name().strip()));
                }
            }
        }
        for (Map.Entry<Long, TrainingBlock.Pick> e : b.picks().entrySet()) {
            try (PreparedStatement ps = c.prepareStatement("SELECT count(*) FROM membership WHERE person_id = ? AND"
                    + " squad_id = ? AND joined_on <= ? AND (left_on IS NULL OR left_on >= ?)")) {
                ps.setLong(1, e.getKey());
                ps.setLong(2, b.squadId());
                ps.setString(3, b.endsOn().toString());
                ps.setString(4, b.startsOn().toString());
                try (ResultSet rs = ps.executeQuery()) {
                    if (rs.next() && rs.getInt(1) == 0) {
                        throw new StoreException(org.shapetrail.i18n.Messages.tr("blockstore.notMember", String.valueOf(e.getKey()),
                                b.startsOn(), b.endsOn()));
                    }
                }
            }
            Optional<Visit> before = new VisitRepository(c).find(e.getValue().beforeVisitId());
            Optional<Visit> after = new VisitRepository(c).find(e.getValue().afterVisitId());
            if (before.isEmpty() || after.isEmpty() || before.get().personId() != e.getKey()
                    || after.get().personId() != e.getKey()) {
                throw new StoreException(org.shapetrail.i18n.Messages.tr("blockstore.notTheirs", String.valueOf(e.getKey())));
            }
            if (!before.get().measuredAt().isBefore(after.get().measuredAt())) {
                throw new StoreException(org.shapetrail.i18n.Messages.tr("blockstore.order", String.valueOf(e.getKey()),
                        before.get().measuredAt().toLocalDate(), after.get().measuredAt().toLocalDate()));
            }
        }
    }

    private void writePicks(TrainingBlock b) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO block_pick (block_id, person_id, before_visit_id,"
                + " after_visit_id) VALUES (?, ?, ?, ?)")) {
            for (Map.Entry<Long, TrainingBlock.Pick> e : b.picks().entrySet()) {
                ps.setLong(1, b.id());
                ps.setLong(2, e.getKey());
                ps.setLong(3, e.getValue().beforeVisitId());
                ps.setLong(4, e.getValue().afterVisitId());
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }
}
