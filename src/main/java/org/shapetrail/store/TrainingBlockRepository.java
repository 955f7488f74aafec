package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/** Training blocks of squads. */
public final class TrainingBlockRepository {
    private final Connection c;

    TrainingBlockRepository(Connection c) {
        this.c = c;
    }

    public TrainingBlock insert(TrainingBlock b) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO training_block (name, squad_id, starts_on, ends_on)"
                + " VALUES (?, ?, ?, ?)", Statement.RETURN_GENERATED_KEYS)) {
            ps.setString(1, TextRules.require(TextRules.Field.BLOCK_NAME, b.name()));
            ps.setLong(2, b.squadId());
            ps.setString(3, b.startsOn().toString());
            ps.setString(4, b.endsOn().toString());
            ps.executeUpdate();
            return new TrainingBlock(Sql.generatedId(ps), b.name(), b.squadId(), b.startsOn(), b.endsOn());
        }
    }

    public List<TrainingBlock> all() throws SQLException {
        List<TrainingBlock> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name, squad_id, starts_on, ends_on"
                + " FROM training_block ORDER BY starts_on, id");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new TrainingBlock(rs.getLong("id"), rs.getString("name"), rs.getLong("squad_id"),
                        LocalDate.parse(rs.getString("starts_on")), LocalDate.parse(rs.getString("ends_on"))));
            }
        }
        return out;
    }
}
