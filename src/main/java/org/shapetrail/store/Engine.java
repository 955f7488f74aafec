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

    /** The engine behind a connection. */
    static Engine of(Connection c) throws SQLException {
        return c.getMetaData().getDatabaseProductName().toLowerCase(java.util.Locale.ROOT).contains("postgres")
                ? POSTGRESQL : SQLITE;
    }
}
