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
            "V5__block_aims_and_picks.sql");

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
