package org.shapetrail.store;

import java.sql.Connection;
import java.sql.SQLException;

/** The database engines a Shapetrail record can live in: a local file (the default) or a shared server. */
public enum Engine {
    SQLITE("sqlite"), POSTGRESQL("postgresql");

    /** The folder of this engine's own migration scripts. */
    final String folder;

    Engine(String folder) {
        this.folder = folder;
    }

    /**
     * Who a change is by, as the stamps record it: the login on a server, the desk's operating-system
     * user on a file (which has no accounts).
     */
    static String actor(Connection c) throws SQLException {
        if (of(c) == POSTGRESQL) {
            try (java.sql.Statement s = c.createStatement(); java.sql.ResultSet rs = s.executeQuery("SELECT session_user")) {
                rs.next();
                return rs.getString(1);
            }
        }
        return System.getProperty("user.name", "");
    }

    /** The engine behind a connection. */
    static Engine of(Connection c) throws SQLException {
        return c.getMetaData().getDatabaseProductName().toLowerCase(java.util.Locale.ROOT).contains("postgres")
                ? POSTGRESQL : SQLITE;
    }
}
