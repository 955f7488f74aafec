package org.shapetrail.store;

import static org.shapetrail.i18n.Messages.tr;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.concurrent.locks.ReentrantLock;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteDataSource;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/**
 * One Shapetrail file: a SQLite database with foreign keys on, WAL journal and a busy timeout, migrated
 * to the current schema when opened (after a backup copy of an existing file is written beside it).
 * All access goes through {@link #inTransaction}: commit on return, roll back on throw.
 *
 * <p>One connection is shared and guarded by a lock, so calls from several threads are serialised; other
 * processes may read and write the same file at the same time (SQLite's locking).
 */
public final class Database implements AutoCloseable {
    /** Milliseconds a write waits for another process's lock before giving up with {@link FileBusyException}. */
    public static final int BUSY_TIMEOUT_MS = 5000;

    /** A change refused for a missing or still-used reference, in the same words on both engines. */
    private static String foreignKey() {
        return tr("store.foreignKey");
    }

    /** The oldest PostgreSQL release Shapetrail is tested on or expects to work with. */
    public static final int OLDEST_SERVER = 13;

    private final Path file;
    private final Connection connection;
    private final ReentrantLock lock = new ReentrantLock();
    private final Path migrationBackup;
    private final Engine engine;
    /** The file's path or the server's address, as a person reads it (never a password). */
    private final String name;
    /** A server's address and login properties, for the connection that listens for others' changes. */
    private ServerAddress server;
    private java.util.Properties serverLogin;

    private Database(Path file, Connection connection, Path migrationBackup) {
        this(file, connection, migrationBackup, Engine.SQLITE, file.toString());
    }

    private Database(Path file, Connection connection, Path migrationBackup, Engine engine, String name) {
        this.file = file;
        this.connection = connection;
        this.migrationBackup = migrationBackup;
        this.engine = engine;
        this.name = name;
    }

    /**
     * Opens what a person named with {@code --db}: a server's connection URI
     * ({@code postgresql://user@host:port/database}), or a file that must already exist.
     */
    public static Database open(String target) {
        return ServerAddress.isServer(target) ? connect(ServerAddress.parse(target), null)
                : openExisting(Path.of(target));
    }

    /**
     * Connects to a shared record on a PostgreSQL server and brings its schema up to date (Flyway, one
     * transaction, under Flyway's lock so two desks never upgrade at once). The password is
     * {@code password} when given (the app's prompt), else {@code PGPASSWORD}, else the driver's password
     * file ({@code ~/.pgpass}).
     *
     * @throws StoreException saying what to fix: the address, the server, the password, the database, the
     *     server's version, or a schema newer than this Shapetrail; nothing is written then
     */
    public static Database connect(ServerAddress address, char[] password) {
        java.util.Properties props = new java.util.Properties();
        props.setProperty("user", address.user());
        String envPassword = System.getenv("PGPASSWORD");
        if (password != null) {
            props.setProperty("password", new String(password));
        } else if (envPassword != null && !envPassword.isEmpty()) {
            props.setProperty("password", envPassword);
        }
        props.setProperty("ApplicationName", "Shapetrail " + AppVersion.current());
        props.setProperty("connectTimeout", "10");
        String shown = address.toString();
        Connection c = null;
        try {
            c = java.sql.DriverManager.getConnection(address.jdbcUrl(), props);
            int major = c.getMetaData().getDatabaseMajorVersion();
            if (major < OLDEST_SERVER) {
                throw new StoreException(tr("store.oldServer", address.host() + ":" + address.port(),
                        c.getMetaData().getDatabaseProductVersion(), OLDEST_SERVER));
            }
            int version = Migrations.currentVersion(c);
            if (version > Migrations.latest()) {
                throw new StoreException(tr("store.newerRecord", shown, Migrations.writtenBy(c)
                        .orElse(tr("store.newerShapetrail")), version, AppVersion.named(), Migrations.latest(),
                        Migrations.writtenBy(c).map(w -> tr("store.orLater", w)).orElse(tr("store.newerShapetrail"))));
            }
            if (version > 0 && version < Migrations.latest() && !ownsSchema(c)) {
                throw new StoreException(tr("store.olderRecord", shown, version, AppVersion.named(),
                        Migrations.latest()));
            }
            if (version < Migrations.latest()) {
                Migrations.migrate(c, version, Migrations.latest());
            }
            Database db = new Database(null, c, null, Engine.POSTGRESQL, shown);
            db.server = address;
            db.serverLogin = props;
            return db;
        } catch (SQLException e) {
            closeQuietly(c);
            throw translateServer(address, e);
        } catch (RuntimeException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** Whether this login owns the record's tables (and so may migrate them). */
    private static boolean ownsSchema(Connection c) throws SQLException {
        try (Statement s = c.createStatement(); var rs = s.executeQuery("SELECT tableowner = session_user FROM pg_tables"
                + " WHERE schemaname = current_schema() AND tablename = 'person'")) {
            return rs.next() && rs.getBoolean(1);
        }
    }

    /** What went wrong reaching or using a server, said as what to fix (PostgreSQL's SQLSTATE classes). */
    static StoreException translateServer(ServerAddress a, SQLException e) {
        String state = e.getSQLState() == null ? "" : e.getSQLState();
        String where = a.host() + ":" + a.port();
        if (state.equals("28P01") || state.equals("28000")) {
            return new PasswordRefusedException(tr("store.passwordRefused", where, a.user()), e);
        }
        if (state.equals("3D000")) {
            return new StoreException(tr("store.noDatabase", a.database(), where), e);
        }
        // 08004: the connection rejected, as the driver reports a password wanted and none given (in any language)
        if (state.equals("08004") || state.startsWith("08") && e.getMessage() != null
                && e.getMessage().contains("password")) {
            return new PasswordRefusedException(tr("store.passwordWanted", where, a.user()), e);
        }
        if (state.startsWith("08")) {
            return new StoreException(tr("store.unreachable", where, firstLine(e.getMessage())), e);
        }
        return inSession(a.toString(), e);
    }

    /** What the server refused once connected, said as what to fix: rights, the record's rules, anything else. */
    private static StoreException inSession(String record, SQLException e) {
        String state = e.getSQLState() == null ? "" : e.getSQLState();
        if (state.equals("42501")) {
            return new StoreException(tr("store.noRight", firstLine(e.getMessage())), e);
        }
        if (state.equals("23503")) {
            return new StoreException(foreignKey(), e);
        }
        if (state.startsWith("23")) {
            return new StoreException(tr("store.rule", firstLine(e.getMessage())), e);
        }
        return new StoreException(tr("store.unusable", record, firstLine(e.getMessage())), e);
    }

    private static String firstLine(String s) {
        return s == null ? tr("store.noDetail") : s.lines().findFirst().orElse("").strip();
    }

    /** Work done inside one transaction. */
    @FunctionalInterface
    public interface TransactionWork<T> {
        T run(Tx tx) throws SQLException;
    }

    /** Opens (creating if absent) and migrates the file. */
    public static Database open(Path file) {
        return open(file, BUSY_TIMEOUT_MS);
    }

    /**
     * Opens a file that must already exist: what a person names with {@code --db} or at start-up. A
     * missing file or folder, or a folder given as the file, is refused with the path and nothing is
     * created (only the default file is seeded, and New file… creates on purpose).
     */
    public static Database openExisting(Path file) {
        Path abs = file.toAbsolutePath();
        if (Files.isDirectory(abs)) {
            throw new StoreException(tr("store.folder", abs));
        }
        if (!Files.exists(abs)) {
            Path parent = abs.getParent();
            throw new StoreException(tr("store.noFile", abs, parent != null && !Files.isDirectory(parent)
                    ? tr("store.noFolder", parent) : ""));
        }
        return open(abs, BUSY_TIMEOUT_MS);
    }

    /** Opens with a chosen busy timeout (tests of contention use a short one). */
    public static Database open(Path file, int busyTimeoutMs) {
        Path abs = file.toAbsolutePath();
        try {
            if (abs.getParent() != null) {
                Files.createDirectories(abs.getParent());
            }
        } catch (IOException e) {
            throw new StoreException(tr("store.cannotCreateFolder", abs, e.getMessage()), e);
        }
        boolean existed = Files.exists(abs) && sizeOf(abs) > 0;
        boolean readOnly = existed && (!writable(abs) || FileClaim.heldElsewhere(abs));
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(readOnly);
        config.enforceForeignKeys(true);
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        config.setBusyTimeout(busyTimeoutMs);
        config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        // take the write lock when a transaction begins, so a busy file fails before any work, not at commit
        config.setTransactionMode(SQLiteConfig.TransactionMode.IMMEDIATE);
        SQLiteDataSource ds = new SQLiteDataSource(config);
        ds.setUrl("jdbc:sqlite:" + abs);
        Connection c = null;
        try {
            c = ds.getConnection();
            int version = Migrations.currentVersion(c);
            if (version > Migrations.latest()) {
                throw new StoreException(newerFileMessage(abs, version, Migrations.writtenBy(c).orElse(null)));
            }
            Path backup = null;
            if (version < Migrations.latest() && readOnly) {
                throw new StoreException(tr("store.readOnlyOld", abs, version));
            }
            if (version < Migrations.latest()) {
                if (existed) {
                    String stem = abs.getFileName() + ".before-schema-" + Migrations.latest() + "-"
                            + LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss"));
                    backup = abs.resolveSibling(stem + ".bak");
                    // an upgrade tried twice within a second (one stopped half-way): the earlier copy is kept too
                    for (int n = 2; Files.exists(backup); n++) {
                        backup = abs.resolveSibling(stem + "-" + n + ".bak");
                    }
                    try (Statement s = c.createStatement()) {
                        s.executeUpdate("VACUUM INTO '" + backup.toString().replace("'", "''") + "'");
                    }
                }
                Migrations.migrate(c, version, Migrations.latest());
                if (backup != null) {
                    recordBackup(c, backup, "before migration");
                }
            }
            try (Statement s = c.createStatement()) {
                // deleted rows are overwritten, not left readable in free space (erasure, docs/guide.md)
                s.execute("PRAGMA secure_delete = ON");
            }
            return new Database(abs, c, backup);
        } catch (SQLException e) {
            closeQuietly(c);
            throw translate(abs.toString(), e);
        } catch (RuntimeException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** Names both versions: the one that wrote the file (when it says) and this one; the file is untouched. */
    static String newerFileMessage(Path file, int schema, String writer) {
        return tr("store.newerFile", file, writer == null ? tr("store.newerShapetrail") : writer, schema,
                AppVersion.named(), Migrations.latest(), writer == null ? tr("store.newerShapetrail")
                : tr("store.orLater", writer));
    }

    /**
     * Whether the file may be written: by the operating system's answer and, on POSIX systems, by its
     * owner's write permission too, so a file made read-only is treated so even for the superuser.
     */
    private static boolean writable(Path p) {
        if (!Files.isWritable(p)) {
            return false;
        }
        try {
            return Files.getPosixFilePermissions(p).contains(java.nio.file.attribute.PosixFilePermission.OWNER_WRITE);
        } catch (UnsupportedOperationException | IOException e) {
            return true;
        }
    }

    /** True when the file was opened for reading only (its permissions forbid writing). */
    public boolean readOnly() {
        try {
            return connection.isReadOnly();
        } catch (SQLException e) {
            return false;
        }
    }

    private static long sizeOf(Path p) {
        try {
            return Files.size(p);
        } catch (IOException e) {
            return 0;
        }
    }

    private static void closeQuietly(Connection c) {
        if (c != null) {
            try {
                c.close();
            } catch (SQLException ignored) {
                // nothing more to do: the open already failed
            }
        }
    }

    /** The file this database reads and writes; null for a server. */
    public Path file() {
        return file;
    }

    /** The file's path or the server's address, as a person reads it (never a password). */
    public String name() {
        return name;
    }

    /** Which engine holds the record. */
    public Engine engine() {
        return engine;
    }

    /**
     * What the person at this desk may do: on a file, everything (a file has no accounts); on a server,
     * the role of their login (the schema's owner counts as an administrator). Empty for a login with
     * none of the three roles (it may read what it was granted, nothing more).
     */
    public java.util.Optional<StaffRole> role() {
        if (engine == Engine.SQLITE) {
            return java.util.Optional.of(StaffRole.ADMINISTRATOR);
        }
        return inTransaction(tx -> {
            if (ownsSchema(tx.connection())) {
                return java.util.Optional.of(StaffRole.ADMINISTRATOR);
            }
            try (Statement s = tx.connection().createStatement(); var rs = s.executeQuery("SELECT CASE"
                    + " WHEN pg_has_role(session_user, 'shapetrail_admin', 'MEMBER') THEN 'administrator'"
                    + " WHEN pg_has_role(session_user, 'shapetrail_coach', 'MEMBER') THEN 'coach'"
                    + " WHEN pg_has_role(session_user, 'shapetrail_measurer', 'MEMBER') THEN 'measurer' ELSE '' END")) {
                rs.next();
                return StaffRole.byWord(rs.getString(1));
            }
        });
    }

    /** The login this desk is connected as on a server; the operating system's user on a file. */
    public String actor() {
        return inTransaction(tx -> Engine.actor(tx.connection()));
    }

    /**
     * Calls {@code onChange} (on a thread of its own, with the table's name) whenever someone else saves
     * a change to people, visits, ratings, memberships or blocks of this record; on a server by
     * PostgreSQL's LISTEN/NOTIFY on a second connection. A file has one writer at a time (FileClaim) and
     * hears nothing. Close the result to stop listening.
     */
    public AutoCloseable listenForChanges(java.util.function.Consumer<String> onChange) {
        if (engine == Engine.SQLITE) {
            return () -> { };
        }
        Connection listening;
        String schema;
        int self = inTransaction(tx -> {
            try (Statement s = tx.connection().createStatement(); var rs = s.executeQuery("SELECT pg_backend_pid()")) {
                rs.next();
                return rs.getInt(1);
            }
        });
        try {
            listening = java.sql.DriverManager.getConnection(server.jdbcUrl(), serverLogin);
            try (Statement s = listening.createStatement(); var rs = s.executeQuery("SELECT current_schema()")) {
                rs.next();
                schema = rs.getString(1);
                s.execute("LISTEN shapetrail_change");
            }
        } catch (SQLException e) {
            throw translateServer(server, e);
        }
        org.postgresql.PGConnection pg;
        try {
            pg = listening.unwrap(org.postgresql.PGConnection.class);
        } catch (SQLException e) {
            closeQuietly(listening);
            throw translateServer(server, e);
        }
        java.util.concurrent.atomic.AtomicBoolean open = new java.util.concurrent.atomic.AtomicBoolean(true);
        Thread t = new Thread(() -> {
            while (open.get()) {
                try {
                    org.postgresql.PGNotification[] got = pg.getNotifications(500);
                    if (got == null) {
                        continue;
                    }
                    java.util.Set<String> tables = new java.util.LinkedHashSet<>();
                    for (org.postgresql.PGNotification n : got) {
                        String[] parts = n.getParameter().split(" ", 2);
                        if (parts.length == 2 && parts[0].equals(schema) && n.getPID() != self) { // not our own saves
                            tables.add(parts[1]);
                        }
                    }
                    tables.forEach(onChange);
                } catch (SQLException lost) {
                    if (open.get()) {
                        onChange.accept("");  // the connection dropped: the caller reloads, and the next save says so
                    }
                    return;
                }
            }
        }, "shapetrail-change-listener");
        t.setDaemon(true);
        t.start();
        return () -> {
            open.set(false);
            t.join(2000);
            closeQuietly(listening);
        };
    }

    /** Work on the staff accounts, in one transaction. */
    @FunctionalInterface
    public interface AccountWork<T> {
        T run(Accounts accounts) throws SQLException;
    }

    /** Staff accounts, on a server only (the server refuses a login that may not create roles). */
    public <T> T accounts(AccountWork<T> work) {
        if (engine == Engine.SQLITE) {
            throw new StoreException(tr("store.fileNoAccounts"));
        }
        return inTransaction(tx -> work.run(new Accounts(tx.connection())));
    }

    /** Refuses the file-only operations on a server, saying what serves there instead. */
    private void fileOnly(String what) {
        if (engine != Engine.SQLITE) {
            throw new StoreException(tr("store.serverCopies", tr("store.what." + what.replace(' ', '_'))));
        }
    }

    /** The copy written before migrating this file when it was opened, or null if none was needed. */
    public Path migrationBackup() {
        return migrationBackup;
    }

    /** The schema version of the open file. */
    public int schemaVersion() {
        return inTransaction(tx -> Migrations.currentVersion(tx.connection()));
    }

    /**
     * Runs {@code work} in one transaction: commits when it returns, rolls back when it throws (the
     * exception is passed on; an {@link SQLException} is wrapped in a {@link StoreException}).
     */
    public <T> T inTransaction(TransactionWork<T> work) {
        lock.lock();
        if (lock.getHoldCount() > 1) {
            // nested call: part of the caller's transaction
            try {
                return work.run(new Tx(connection));
            } catch (SQLException e) {
                throw translateHere(e);
            } finally {
                lock.unlock();
            }
        }
        try {
            connection.setAutoCommit(false);
            try {
                T result = work.run(new Tx(connection));
                connection.commit();
                return result;
            } catch (SQLException | RuntimeException | Error e) {
                try {
                    connection.rollback();
                } catch (SQLException suppressed) {
                    e.addSuppressed(suppressed);
                }
                throw e;
            }
        } catch (SQLException e) {
            throw translateHere(e);
        } finally {
            try {
                connection.setAutoCommit(true);
            } catch (SQLException ignored) {
                // the connection is broken; the next call reports it
            }
            lock.unlock();
        }
    }

    /**
     * Writes a consistent copy of the whole file to {@code target} while the database stays open (SQLite
     * online backup), and records it (an erasure lists the copies that still hold the data). An existing
     * target is replaced.
     */
    public void backupTo(Path target) {
        fileOnly("backed up");
        lock.lock();
        try (Statement s = connection.createStatement()) {
            Files.deleteIfExists(target);
            s.executeUpdate("backup to '" + target.toAbsolutePath().toString().replace("'", "''") + "'");
            recordBackup(connection, target.toAbsolutePath(), "backup");
        } catch (SQLException e) {
            throw translateHere(e);
        } catch (IOException e) {
            throw new StoreException(tr("store.backupUnwritable", target, e.getMessage()), e);
        } finally {
            lock.unlock();
        }
    }

    /**
     * Replaces the whole content of this file with the backup at {@code source} (SQLite online restore).
     * The backup must be a Shapetrail file; it is checked before anything is replaced.
     */
    public void restoreFrom(Path source) {
        fileOnly("restored");
        if (!Files.isRegularFile(source)) {
            throw new StoreException(tr("store.backupMissing", source));
        }
        String integrity;
        try (Database check = Database.openReadOnlyCheck(source)) {
            check.schemaVersion();
            integrity = check.integrityCheck();
        } catch (StoreException refused) {
            // the refusal without its own "nothing was changed": the sentence after says what stayed as it was
            throw new StoreException(tr("store.backupUnusable", refused.getMessage().replaceAll(" "
                    + java.util.regex.Pattern.quote(tr("store.nothingChanged")) + ".*$", ""), file), refused);
        }
        if (!integrity.equals("ok")) {
            throw new StoreException(tr("store.backupDamaged", source, integrity.lines().findFirst().orElse(""), file));
        }
        lock.lock();
        try (Statement s = connection.createStatement()) {
            s.executeUpdate("restore from '" + source.toAbsolutePath().toString().replace("'", "''") + "'");
            int version = Migrations.currentVersion(connection);
            if (version < Migrations.latest()) {
                Migrations.migrate(connection, version, Migrations.latest());
            }
        } catch (SQLException e) {
            throw translateHere(e);
        } finally {
            lock.unlock();
        }
    }

    private static Database openReadOnlyCheck(Path source) {
        SQLiteConfig config = new SQLiteConfig();
        config.setReadOnly(true);
        SQLiteDataSource ds = new SQLiteDataSource(config);
        ds.setUrl("jdbc:sqlite:" + source.toAbsolutePath());
        try {
            Connection c = ds.getConnection();
            int v = Migrations.currentVersion(c);
            if (v < 1 || v > Migrations.latest()) {
                c.close();
                throw new StoreException(tr("store.notBackup", source, v));
            }
            return new Database(source.toAbsolutePath(), c, null);
        } catch (SQLException e) {
            throw translate(source.toString(), e);
        }
    }

    private static void recordBackup(Connection c, Path copy, String kind) throws SQLException {
        try (java.sql.PreparedStatement ps = c.prepareStatement("INSERT INTO backup_record (path, made_at, kind)"
                + " VALUES (?, ?, ?)")) {
            ps.setString(1, copy.toString());
            ps.setString(2, LocalDateTime.now().withNano(0).toString());
            ps.setString(3, kind);
            ps.executeUpdate();
        }
    }

    /** A copy of this file that Shapetrail made (a backup, or the copy kept before a migration). */
    public record KnownCopy(Path path, LocalDateTime madeAt, String kind, boolean stillThere) {
    }

    /** The copies of this file Shapetrail made and recorded, oldest first, with whether each is still there. */
    public java.util.List<KnownCopy> knownCopies() {
        return inTransaction(tx -> {
            java.util.List<KnownCopy> out = new java.util.ArrayList<>();
            try (Statement s = tx.connection().createStatement();
                 var rs = s.executeQuery("SELECT path, made_at, kind FROM backup_record ORDER BY made_at, id")) {
                while (rs.next()) {
                    Path p = Path.of(rs.getString(1));
                    out.add(new KnownCopy(p, LocalDateTime.parse(rs.getString(2)), rs.getString(3), Files.exists(p)));
                }
            }
            return out;
        });
    }

    /** What an erasure did. */
    public record Erasure(Person person, int visits, java.util.List<KnownCopy> copies) {
    }

    /**
     * Erases a person with everything that hangs on them (visits, trials, ratings, memberships), then wipes
     * the traces: secure deletion overwrote the rows, VACUUM rebuilds the file without the freed pages,
     * and a truncating checkpoint empties the write-ahead log, so the person's data is nowhere in the file,
     * its WAL or journal. Copies made before (backups) are not reached; they are returned to be named.
     *
     * @throws StoreException when there is no such person, or when another program holds the file open so
     *     the traces cannot be wiped yet (the rows are erased; {@link #wipeFreedSpace} finishes the work)
     */
    public Erasure erasePerson(long personId) {
        if (engine == Engine.POSTGRESQL) {
            return eraseOnServer(personId);
        }
        Erasure e = inTransaction(tx -> {
            Person p = tx.people().find(personId)
                    .orElseThrow(() -> new StoreException(tr("store.noPerson", String.valueOf(personId))));
            int visits = tx.visits().ofPerson(personId).size();
            tx.people().erase(personId);
            return new Erasure(p, visits, java.util.List.of());
        });
        try {
            wipeFreedSpace();
        } catch (StoreException busy) {
            throw new StoreException(tr("store.erasedBusy", e.person().displayName(), name), busy);
        }
        return new Erasure(e.person(), e.visits(), knownCopies());
    }

    /**
     * On a server: the server's own erase function (administrators only, refused by the server otherwise)
     * removes the person's rows and their lines of the audit trail and leaves one line that an erasure
     * happened; then the tables are rewritten so the rows' old versions leave the server's storage.
     */
    private Erasure eraseOnServer(long personId) {
        Erasure e = inTransaction(tx -> {
            Person p = tx.people().find(personId)
                    .orElseThrow(() -> new StoreException(tr("store.noPerson", String.valueOf(personId))));
            int visits = tx.visits().ofPerson(personId).size();
            try (var ps = tx.connection().prepareStatement("SELECT erase_person(?)")) {
                ps.setLong(1, personId);
                ps.executeQuery().close();
            }
            return new Erasure(p, visits, java.util.List.of());
        });
        try {
            wipeFreedSpace();
        } catch (StoreException notOwner) {
            throw new StoreException(tr("store.erasedBut", e.person().displayName(), name, notOwner.getMessage()),
                    notOwner);
        }
        return new Erasure(e.person(), e.visits(), knownCopies());
    }

    /**
     * Rebuilds the file without free pages (VACUUM) and empties the write-ahead log, so nothing deleted
     * can be read from the file's bytes.
     *
     * @throws StoreException when another program reads the file meanwhile (close it, then run again)
     */
    public void wipeFreedSpace() {
        lock.lock();
        try (Statement s = connection.createStatement()) {
            if (engine == Engine.POSTGRESQL) {
                // the erased rows' old versions stay in the tables' pages until they are rewritten, which
                // only the tables' owner may do (the server skips the others with a mere warning)
                if (!ownsSchema(connection)) {
                    throw new StoreException(tr("store.erasedServer"));
                }
                for (String table : List.of("trial", "visit_rating", "block_pick", "membership", "visit", "person",
                        "audit_entry")) {
                    s.execute("VACUUM FULL " + table);
                }
                return;
            }
            s.execute("VACUUM");
            try (var rs = s.executeQuery("PRAGMA wal_checkpoint(TRUNCATE)")) {
                if (rs.next() && (rs.getInt(1) != 0 || rs.getInt(2) != 0 && rs.getInt(2) != rs.getInt(3))) {
                    throw new StoreException(tr("store.walBusy", file));
                }
            }
        } catch (SQLException e) {
            throw translateHere(e);
        } finally {
            lock.unlock();
        }
    }

    /** {@code PRAGMA integrity_check}: "ok" for a sound file, otherwise SQLite's description. */
    public String integrityCheck() {
        if (engine == Engine.POSTGRESQL) {
            throw new StoreException(tr("store.serverIntegrity"));
        }
        return inTransaction(tx -> {
            try (Statement s = tx.connection().createStatement();
                 var rs = s.executeQuery("PRAGMA integrity_check")) {
                StringBuilder sb = new StringBuilder();
                while (rs.next()) {
                    sb.append(sb.length() == 0 ? "" : "\n").append(rs.getString(1));
                }
                return sb.toString();
            }
        });
    }

    @Override
    public void close() {
        lock.lock();
        try {
            connection.close();
        } catch (SQLException e) {
            throw translateHere(e);
        } finally {
            lock.unlock();
        }
    }

    private StoreException translateHere(SQLException e) {
        if (engine == Engine.POSTGRESQL) {
            String state = e.getSQLState() == null ? "" : e.getSQLState();
            if (state.startsWith("08") || state.equals("57P01")) {
                return new StoreException(tr("store.lost", name, firstLine(e.getMessage())), e);
            }
            return inSession(name, e);
        }
        return translate(file.toString(), e);
    }

    static StoreException translate(String file, SQLException e) {
        if (e instanceof SQLiteException se) {
            SQLiteErrorCode code = se.getResultCode();
            if (code == SQLiteErrorCode.SQLITE_BUSY || code == SQLiteErrorCode.SQLITE_LOCKED
                    || code.name().startsWith("SQLITE_BUSY")) {
                return new FileBusyException(file, e);
            }
            if (code.name().startsWith("SQLITE_CONSTRAINT_FOREIGNKEY")) {
                return new StoreException(foreignKey(), e);
            }
            if (code == SQLiteErrorCode.SQLITE_NOTADB) {
                return new StoreException(tr("store.notADb", file), e);
            }
            if (code.name().startsWith("SQLITE_CORRUPT")) {
                return new StoreException(tr("store.corrupt", file), e);
            }
            java.util.Optional<String> holder = FileClaim.holder(Path.of(file));
            if (code.name().startsWith("SQLITE_READONLY") && holder.isPresent()) {
                return new StoreException(tr("store.heldElsewhere", file, holder.get()), e);
            }
            if (code.name().startsWith("SQLITE_READONLY")) {
                return new StoreException(tr("store.readOnly", file), e);
            }
        }
        return new StoreException(tr("store.fileUnusable", file, e.getMessage()), e);
    }
}
