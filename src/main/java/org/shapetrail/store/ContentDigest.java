package org.shapetrail.store;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.Statement;
import java.util.HexFormat;
import java.util.List;

/**
 * A SHA-256 fingerprint of a file's content: every row of every table, in a fixed order, independent of
 * page layout. Two files with equal digests hold the same data (used to check backups and that the
 * demo database regenerates exactly).
 */
public final class ContentDigest {
    static final List<String> TABLES = List.of("person", "squad", "membership", "measurer", "visit", "trial",
            "visit_rating", "training_block", "block_pick");
    /** The key columns of each table, which give its rows a total order. */
    private static final java.util.Map<String, String> ORDER = java.util.Map.of("person", "id", "squad", "id",
            "membership", "person_id, squad_id, joined_on", "measurer", "id", "visit", "id",
            "trial", "visit_id, site, trial_no", "visit_rating", "visit_id", "training_block", "id", "block_pick", "block_id, person_id");

    /**
     * Bookkeeping columns left out: who entered or changed a row, when, and its version say how the
     * record came to be, not what it holds (they differ between a file and a server holding the same).
     */
    private static final java.util.Set<String> STAMPS = java.util.Set.of("row_version", "entered_by", "changed_by",
            "changed_at");

    private ContentDigest() {
    }

    /** The hex digest of the database's content. */
    public static String of(Database db) {
        return db.inTransaction(tx -> {
            MessageDigest md;
            try {
                md = MessageDigest.getInstance("SHA-256");
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException(e);
            }
            md.update(("schema " + Migrations.currentVersion(tx.connection()) + "\n").getBytes(StandardCharsets.UTF_8));
            for (String table : TABLES) {
                md.update(("table " + table + "\n").getBytes(StandardCharsets.UTF_8));
                try (Statement s = tx.connection().createStatement();
                     ResultSet rs = s.executeQuery("SELECT * FROM " + table + " ORDER BY " + ORDER.get(table))) {
                    ResultSetMetaData meta = rs.getMetaData();
                    int n = meta.getColumnCount();
                    StringBuilder row = new StringBuilder();
                    while (rs.next()) {
                        row.setLength(0);
                        for (int i = 1; i <= n; i++) {
                            if (STAMPS.contains(meta.getColumnName(i).toLowerCase(java.util.Locale.ROOT))) {
                                continue;
                            }
                            Object o = rs.getObject(i);
                            row.append(o == null ? "\u2400" : o.toString()).append('\u241f');
                        }
                        row.append('\n');
                        md.update(row.toString().getBytes(StandardCharsets.UTF_8));
                    }
                }
            }
            return HexFormat.of().formatHex(md.digest());
        });
    }

    /** Number of rows per table, in {@link #TABLES} order. */
    public static List<Integer> rowCounts(Database db) {
        return db.inTransaction(tx -> {
            java.util.ArrayList<Integer> out = new java.util.ArrayList<>();
            for (String table : TABLES) {
                try (Statement s = tx.connection().createStatement();
                     ResultSet rs = s.executeQuery("SELECT count(*) FROM " + table)) {
                    rs.next();
                    out.add(rs.getInt(1));
                }
            }
            return out;
        });
    }
}
