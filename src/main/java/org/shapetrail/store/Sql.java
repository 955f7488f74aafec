package org.shapetrail.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.LocalDate;

/** Small JDBC helpers shared by the repositories. */
final class Sql {
    private Sql() {
    }

    static void setNullableDouble(PreparedStatement ps, int index, Double value) throws SQLException {
        if (value == null) {
            ps.setNull(index, Types.REAL);
        } else {
            ps.setDouble(index, value);
        }
    }

    static Double nullableDouble(ResultSet rs, String column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? null : v;
    }

    static LocalDate nullableDate(ResultSet rs, String column) throws SQLException {
        String s = rs.getString(column);
        return s == null ? null : LocalDate.parse(s);
    }

    static String dateText(LocalDate d) {
        return d == null ? null : d.toString();
    }

    static long generatedId(Statement s) throws SQLException {
        try (ResultSet keys = s.getGeneratedKeys()) {
            if (!keys.next()) {
                throw new SQLException("no id was generated");
            }
            return keys.getLong(1);
        }
    }
}
