package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the audit trail. On a server it is written by the server's own triggers for every insert, edit
 * and deletion of a person, visit, trial or rating (so no program can change the record unrecorded); a
 * file has no accounts and keeps no trail, and reads as empty.
 */
public final class AuditTrail {
    private final Connection c;

    AuditTrail(Connection c) {
        this.c = c;
    }

    /** Everything recorded of a person, their visits, trials and ratings, oldest first. */
    public List<AuditEntry> ofPerson(long personId) throws SQLException {
        // a deleted visit's trials were recorded after the visit row was gone: found through the visit's own lines
        return query("WHERE person_id = ? OR visit_id IN (SELECT id FROM visit WHERE person_id = ?)"
                + " OR visit_id IN (SELECT a.visit_id FROM audit_entry a WHERE a.entity = 'visit' AND a.person_id = ?)",
                personId, personId, personId);
    }

    /** Everything recorded of one visit (its row, trials and rating), oldest first. */
    public List<AuditEntry> ofVisit(long visitId) throws SQLException {
        return query("WHERE visit_id = ?", visitId);
    }

    /** Everything recorded on the days from {@code from} to {@code to} (UTC), oldest first. */
    public List<AuditEntry> between(LocalDate from, LocalDate to) throws SQLException {
        return query("WHERE at >= ? AND at < ?", from.toString(), to.plusDays(1).toString());
    }

    private List<AuditEntry> query(String where, Object... params) throws SQLException {
        List<AuditEntry> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, at, who, action, entity, person_id, visit_id,"
                + " old_values, new_values FROM audit_entry " + where + " ORDER BY id")) {
            for (int i = 0; i < params.length; i++) {
                if (params[i] instanceof Long l) {
                    ps.setLong(i + 1, l);
                } else {
                    ps.setString(i + 1, (String) params[i]);
                }
            }
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long pid = rs.getLong(6);
                    Long person = rs.wasNull() ? null : pid;
                    long vid = rs.getLong(7);
                    Long visit = rs.wasNull() ? null : vid;
                    out.add(new AuditEntry(rs.getLong(1), rs.getString(2), rs.getString(3), rs.getString(4),
                            rs.getString(5), person, visit, FlatJson.read(rs.getString(8)), FlatJson.read(rs.getString(9))));
                }
            }
        }
        return out;
    }
}
