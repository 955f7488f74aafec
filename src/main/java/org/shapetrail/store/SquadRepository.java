package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Squads and their dated memberships. */
public final class SquadRepository {
    private final Connection c;

    SquadRepository(Connection c) {
        this.c = c;
    }

    public Squad insert(String name) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO squad (name) VALUES (?)",
                Statement.RETURN_GENERATED_KEYS)) {
            ps.setString(1, TextRules.require(TextRules.Field.SQUAD_NAME, name));
            ps.executeUpdate();
            return new Squad(Sql.generatedId(ps), name);
        }
    }

    public List<Squad> all() throws SQLException {
        List<Squad> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name FROM squad ORDER BY name");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Squad(rs.getLong("id"), rs.getString("name")));
            }
        }
        return out;
    }

    public Optional<Squad> find(long id) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id, name FROM squad WHERE id = ?")) {
            ps.setLong(1, id);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(new Squad(rs.getLong("id"), rs.getString("name"))) : Optional.empty();
            }
        }
    }

    public void addMember(Membership m) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "INSERT INTO membership (person_id, squad_id, joined_on, left_on) VALUES (?, ?, ?, ?)")) {
            ps.setLong(1, m.personId());
            ps.setLong(2, m.squadId());
            ps.setString(3, m.joinedOn().toString());
            ps.setString(4, Sql.dateText(m.leftOn()));
            ps.executeUpdate();
        }
    }

    /** Sets the last day of a membership (the one that started on {@code m.joinedOn()}); true when it existed. */
    public boolean endMembership(Membership m, LocalDate lastDay) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE membership SET left_on = ? WHERE person_id = ?"
                + " AND squad_id = ? AND joined_on = ?")) {
            ps.setString(1, lastDay.toString());
            ps.setLong(2, m.personId());
            ps.setLong(3, m.squadId());
            ps.setString(4, m.joinedOn().toString());
            return ps.executeUpdate() == 1;
        }
    }

    /** Every membership, by squad then person. */
    public List<Membership> memberships() throws SQLException {
        List<Membership> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT person_id, squad_id, joined_on, left_on FROM membership"
                + " ORDER BY squad_id, person_id, joined_on");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Membership(rs.getLong("person_id"), rs.getLong("squad_id"),
                        LocalDate.parse(rs.getString("joined_on")), Sql.nullableDate(rs, "left_on")));
            }
        }
        return out;
    }

    /** Memberships of one person. */
    public List<Membership> membershipsOf(long personId) throws SQLException {
        return memberships().stream().filter(m -> m.personId() == personId).toList();
    }
}
