package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Measurers. A measurer with visits cannot be deleted (the visits keep who measured them). */
public final class MeasurerRepository {
    private final Connection c;

    MeasurerRepository(Connection c) {
        this.c = c;
    }

    public Measurer insert(String name, String accreditation) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO measurer (name, accreditation) VALUES (?, ?)",
                Statement.RETURN_GENERATED_KEYS)) {
            ps.setString(1, TextRules.require(TextRules.Field.MEASURER_NAME, name));
            ps.setString(2, accreditation);
            ps.executeUpdate();
            return new Measurer(Sql.generatedId(ps), name, accreditation);
        }
    }

    public List<Measurer> all() throws SQLException {
        List<Measurer> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name, accreditation FROM measurer ORDER BY name");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Measurer(rs.getLong("id"), rs.getString("name"), rs.getString("accreditation")));
            }
        }
        return out;
    }

    public Optional<Measurer> find(long id) throws SQLException {
        return all().stream().filter(m -> m.id() == id).findFirst();
    }

    public void delete(long id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM measurer WHERE id = ?")) {
            ps.setLong(1, id);
            ps.executeUpdate();
        }
    }
}
