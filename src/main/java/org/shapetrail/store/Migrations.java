package org.shapetrail.store;

import java.io.IOException;
import java.io.InputStream;
import java.lang.reflect.Proxy;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;
import org.flywaydb.core.api.callback.Callback;
import org.flywaydb.core.api.callback.Context;
import org.flywaydb.core.api.callback.Event;

/**
 * The schema's versioned migrations, run by Flyway for both engines: the scripts under
 * {@code org/shapetrail/store/migrations/common} serve both, those under {@code sqlite/} and
 * {@code postgresql/} only where the SQL differs (ids, floating-point types).
 *
 * <p>A file keeps saying its schema in {@code PRAGMA user_version} as well, written in the same
 * transaction as each migration, so that every earlier Shapetrail still recognises a newer file, and a
 * file made before Flyway (user_version 1 to 5, no history table) is taken up at its own version
 * (Flyway's baseline) and migrated from there. Pending migrations run in one transaction: a file or a
 * server is either brought all the way up or left as it was.
 */
public final class Migrations {
    /** The schema version this build writes; a test checks it is the highest script of each engine. */
    static final int LATEST = 9;

    /** The key in {@code file_meta} naming the Shapetrail that brought the file to its schema. */
    static final String WRITTEN_BY = "schema_written_by";

    /** Flyway's record of what it ran, in the file or the server's schema. */
    static final String HISTORY = "flyway_schema_history";

    private static final String ROOT = "org/shapetrail/store/migrations/";

    private Migrations() {
    }

    /** The schema version this build writes. */
    public static int latest() {
        return LATEST;
    }

    /** The schema the database holds now: 0 for an empty one. */
    static int currentVersion(Connection c) throws SQLException {
        if (Engine.of(c) == Engine.SQLITE) {
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA user_version")) {
                return rs.next() ? rs.getInt(1) : 0;
            }
        }
        if (!tableExists(c, HISTORY)) {
            return 0;
        }
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery(
                "SELECT max(CAST(version AS INTEGER)) FROM " + HISTORY + " WHERE success AND version IS NOT NULL")) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    /** The Shapetrail that brought the file to its schema, when the file says (schema 6 on). */
    static Optional<String> writtenBy(Connection c) {
        try {
            if (!tableExists(c, "file_meta")) {
                return Optional.empty(); // a file from before schema 6, or a hand-made one
            }
            try (var ps = c.prepareStatement("SELECT value FROM file_meta WHERE key = ?")) {
                ps.setString(1, WRITTEN_BY);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
                }
            }
        } catch (SQLException e) {
            return Optional.empty();
        }
    }

    static boolean tableExists(Connection c, String table) throws SQLException {
        String sql = Engine.of(c) == Engine.SQLITE
                ? "SELECT count(*) FROM sqlite_master WHERE type = 'table' AND name = ?"
                : "SELECT count(*) FROM information_schema.tables WHERE table_schema = current_schema() AND table_name = ?";
        try (var ps = c.prepareStatement(sql)) {
            ps.setString(1, table);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() && rs.getInt(1) > 0;
            }
        }
    }

    /**
     * Brings the database from schema {@code from} to {@code to} with Flyway, on this connection, in one
     * transaction. A file from before Flyway is first recorded at its own version (baseline).
     */
    static void migrate(Connection c, int from, int to) throws SQLException {
        Engine engine = Engine.of(c);
        boolean auto = c.getAutoCommit();
        if (engine == Engine.SQLITE && from > 0 && tableExists(c, HISTORY) && historyRows(c) == 0) {
            // a history table made by a run that stopped before its first migration committed: as if absent
            try (Statement s = c.createStatement()) {
                s.executeUpdate("DROP TABLE " + HISTORY);
            }
        }
        var config = Flyway.configure(Migrations.class.getClassLoader())
                .dataSource(new OneConnection(c).dataSource())
                .locations("classpath:" + ROOT + "common", "classpath:" + ROOT + engine.folder)
                .table(HISTORY)
                .target(String.valueOf(to))
                .group(true)
                .cleanDisabled(true)
                .callbacks(new VersionRecord(to))
                .failOnMissingLocations(true);
        if (from > 0 && !tableExists(c, HISTORY)) {
            config = config.baselineOnMigrate(true).baselineVersion(String.valueOf(from))
                    .baselineDescription("schema " + from + " before Flyway");
        }
        try {
            config.load().migrate();
        } catch (FlywayException e) {
            throw new SQLException("The schema could not be brought from version " + from + " to " + to + ": "
                    + e.getMessage(), e);
        } finally {
            if (c.getAutoCommit() != auto) {
                c.setAutoCommit(auto);
            }
        }
    }

    private static int historyRows(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT count(*) FROM " + HISTORY)) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    /** The text of the SQLite script that produces {@code version} (tests rebuild older files with it). */
    public static String script(int version) {
        return script(Engine.SQLITE, version);
    }

    /** The text of the script that produces {@code version} on an engine. */
    public static String script(Engine engine, int version) {
        for (String folder : List.of(engine.folder, "common")) {
            for (String name : scriptNames(folder)) {
                if (name.startsWith("V" + version + "__")) {
                    try (InputStream in = Migrations.class.getClassLoader().getResourceAsStream(ROOT + folder + "/" + name)) {
                        return new String(in.readAllBytes(), StandardCharsets.UTF_8);
                    } catch (IOException e) {
                        throw new StoreException("Migration script " + name + " cannot be read.", e);
                    }
                }
            }
        }
        throw new StoreException("There is no migration script for schema " + version + " in the build.");
    }

    /** The scripts of one folder, from the index written beside them. */
    static List<String> scriptNames(String folder) {
        try (InputStream in = Migrations.class.getClassLoader().getResourceAsStream(ROOT + folder + "/index.txt")) {
            if (in == null) {
                throw new StoreException("The migration index of " + folder + " is missing from the build.");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().map(String::strip)
                    .filter(l -> !l.isEmpty() && !l.startsWith("#")).toList();
        } catch (IOException e) {
            throw new StoreException("The migration index of " + folder + " cannot be read.", e);
        }
    }

    /** Splits a script into statements: comments dropped, split on ';' at the end of a line. */
    static List<String> statements(String script) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        for (String line : script.split("\n")) {
            String t = line.strip();
            if (t.startsWith("--") || t.isEmpty()) {
                continue;
            }
            cur.append(line).append('\n');
            if (t.endsWith(";")) {
                out.add(cur.toString().strip().replaceAll(";$", ""));
                cur.setLength(0);
            }
        }
        if (!cur.toString().isBlank()) {
            out.add(cur.toString().strip());
        }
        return out;
    }

    /**
     * In each migration's transaction: the file's user_version (SQLite), and at the last one the
     * Shapetrail that wrote the schema.
     */
    private static final class VersionRecord implements Callback {
        private final int to;

        VersionRecord(int to) {
            this.to = to;
        }

        @Override
        public boolean supports(Event event, Context context) {
            return event == Event.AFTER_EACH_MIGRATE;
        }

        @Override
        public boolean canHandleInTransaction(Event event, Context context) {
            return true;
        }

        @Override
        public void handle(Event event, Context context) {
            int v = Integer.parseInt(context.getMigrationInfo().getVersion().getVersion());
            Connection c = context.getConnection();
            try (Statement s = c.createStatement()) {
                if (Engine.of(c) == Engine.SQLITE) {
                    s.executeUpdate("PRAGMA user_version = " + v);
                }
                if (v == to && v >= 6) {
                    try (var ps = c.prepareStatement("INSERT INTO file_meta (key, value) VALUES (?, ?)"
                            + " ON CONFLICT (key) DO UPDATE SET value = excluded.value")) {
                        ps.setString(1, WRITTEN_BY);
                        ps.setString(2, AppVersion.named());
                        ps.executeUpdate();
                    }
                }
            } catch (SQLException e) {
                throw new FlywayException("Recording schema " + v + " failed: " + e.getMessage(), e);
            }
        }

        @Override
        public String getCallbackName() {
            return "shapetrail-schema-record";
        }
    }

    /** Lends Flyway the store's own connection (its locks, read-only state and pragmas), never closing it. */
    private record OneConnection(Connection c) {
        javax.sql.DataSource dataSource() {
            Connection lent = (Connection) Proxy.newProxyInstance(Migrations.class.getClassLoader(),
                    new Class<?>[] {Connection.class}, (proxy, m, args) -> {
                        if (m.getName().equals("close")) {
                            return null;
                        }
                        if (m.getName().equals("isClosed")) {
                            return false;
                        }
                        try {
                            return m.invoke(c, args);
                        } catch (java.lang.reflect.InvocationTargetException e) {
                            throw e.getCause();
                        }
                    });
            return (javax.sql.DataSource) Proxy.newProxyInstance(Migrations.class.getClassLoader(),
                    new Class<?>[] {javax.sql.DataSource.class}, (proxy, m, args) -> switch (m.getName()) {
                        case "getConnection" -> lent;
                        case "getLoginTimeout" -> 0;
                        case "getLogWriter", "getParentLogger" -> null;
                        case "isWrapperFor" -> false;
                        case "unwrap" -> throw new SQLException("not a wrapper");
                        case "hashCode" -> System.identityHashCode(proxy);
                        case "equals" -> proxy == args[0];
                        case "toString" -> "Shapetrail's connection";
                        default -> null;
                    });
        }
    }
}
