package org.shapetrail.store;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Locale;
import java.util.Properties;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * The real PostgreSQL server the server tests use: the one {@code .ci/run} starts from Debian's packages on
 * 127.0.0.1 and names in {@code SHAPETRAIL_TEST_PG} (with its password in {@code PGPASSWORD}). Each test
 * gets a schema of its own in that database, so tests never see each other's rows. The tests tagged
 * {@code server} are selected only when that variable is set (pom.xml); {@code .ci/run} always sets it
 * and checks that they ran.
 */
public final class TestServer {
    private static final AtomicInteger COUNT = new AtomicInteger();

    private TestServer() {
    }

    /** The server's URI as {@code .ci/run} exported it. */
    public static String uri() {
        String u = System.getenv("SHAPETRAIL_TEST_PG");
        if (u == null || u.isBlank()) {
            throw new IllegalStateException("SHAPETRAIL_TEST_PG is not set: the server tests need the PostgreSQL"
                    + " server that .ci/run starts (see .ci/postgres.sh)");
        }
        return u;
    }

    public static ServerAddress address() {
        return ServerAddress.parse(uri());
    }

    /** A new, empty schema for one test; the URI that works in it. */
    public static String freshSchema(String label) {
        String schema = ("t_" + label + "_" + ProcessHandle.current().pid() + "_" + COUNT.incrementAndGet())
                .toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9_]", "_");
        try (Connection c = admin(); Statement s = c.createStatement()) {
            s.executeUpdate("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot make a test schema on " + uri() + ": " + e.getMessage(), e);
        }
        return uri() + (uri().contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }

    /** A plain JDBC connection as the test database's owner (what an administrator's psql would be). */
    public static Connection admin() throws SQLException {
        return as(address().user(), System.getenv("PGPASSWORD"), null);
    }

    /** A plain JDBC connection as any account, in a schema (null: the default one). */
    public static Connection as(String user, String password, String schema) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", user);
        if (password != null) {
            p.setProperty("password", password);
        }
        if (schema != null) {
            p.setProperty("currentSchema", schema);
        }
        return DriverManager.getConnection(address().jdbcUrl(), p);
    }

    /** The sample academy, written into a fresh schema; the URI that works in it. */
    public static String sampleAcademy(String label) {
        String uri = freshSchema(label);
        try (Database owner = Database.open(uri)) {
            org.shapetrail.store.demo.DemoAcademy.generateInto(owner);
        }
        return uri;
    }

    /** A login name no other test run uses (logins are the whole server's, not one schema's). */
    public static String uniqueLogin(String first) {
        return first + "_" + ProcessHandle.current().pid() + "_" + System.nanoTime() % 100000;
    }

    /** Makes staff accounts, each with its role, as the record's owner. */
    public static void addAccounts(String uri, String password, java.util.Map<String, StaffRole> accounts) {
        try (Database owner = Database.open(uri)) {
            owner.accounts(a -> {
                for (var e : accounts.entrySet()) {
                    a.add(e.getKey(), e.getValue(), password.toCharArray());
                }
                return null;
            });
        }
    }

    /** Ends the accounts a test made. */
    public static void removeAccounts(String uri, java.util.Collection<String> names) {
        try (Database owner = Database.open(uri)) {
            owner.accounts(a -> {
                for (String n : names) {
                    a.remove(n);
                }
                return null;
            });
        }
    }

    /** The schema named in a URI made by {@link #freshSchema}. */
    public static String schemaOf(String uri) {
        return uri.substring(uri.indexOf("currentSchema=") + "currentSchema=".length());
    }
}
