package org.shapetrail.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * The ordered schema migrations, keyed by {@code PRAGMA user_version}: version N is reached by running
 * script N in one transaction. Scripts live in resources under {@code org/shapetrail/store/migrations}.
 */
public final class Migrations {
    /** Script names in order; index + 1 is the version each produces. */
    static final List<String> SCRIPTS = List.of("V1__people_and_visits.sql", "V2__ratings_and_blocks.sql",
            "V3__predicted_adult_stature.sql", "V4__backup_record.sql",
            "V5__block_aims_and_picks.sql", "V6__file_meta.sql");

    /** The key in {@code file_meta} naming the Shapetrail that brought the file to its schema. */
    static final String WRITTEN_BY = "schema_written_by";

    private Migrations() {
    }

    /** The schema version this build writes. */
    public static int latest() {
        return SCRIPTS.size();
    }

    static int currentVersion(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA user_version")) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    /** The Shapetrail that brought the file to its schema, when the file says (schema 6 on). */
    static java.util.Optional<String> writtenBy(Connection c) {
        try (var ps = c.prepareStatement("SELECT value FROM file_meta WHERE key = ?")) {
            ps.setString(1, WRITTEN_BY);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? java.util.Optional.of(rs.getString(1)) : java.util.Optional.empty();
            }
        } catch (SQLException e) {
            return java.util.Optional.empty(); // no such table: a file from before schema 6, or a hand-made one
        }
    }

    /** Runs the scripts after {@code from} up to {@code to}, each in its own transaction. */
    static void migrate(Connection c, int from, int to) throws SQLException {
        for (int v = from + 1; v <= to; v++) {
            boolean auto = c.getAutoCommit();
            c.setAutoCommit(false);
            try (Statement s = c.createStatement()) {
                for (String stmt : statements(script(v))) {
                    s.executeUpdate(stmt);
                }
                s.executeUpdate("PRAGMA user_version = " + v);
                if (v == to && v >= 6) {
                    try (var ps = c.prepareStatement("INSERT OR REPLACE INTO file_meta (key, value) VALUES (?, ?)")) {
                        ps.setString(1, WRITTEN_BY);
                        ps.setString(2, AppVersion.named());
                        ps.executeUpdate();
                    }
                }
                c.commit();
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            } finally {
                c.setAutoCommit(auto);
            }
        }
    }

    /** The text of the script that produces {@code version}. */
    public static String script(int version) {
        String name = SCRIPTS.get(version - 1);
        try (InputStream in = Migrations.class.getResourceAsStream("migrations/" + name)) {
            if (in == null) {
                throw new StoreException("Migration script " + name + " is missing from the build.");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new StoreException("Migration script " + name + " cannot be read.", e);
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
}
