package org.shapetrail.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * Staff accounts on a server: PostgreSQL login roles that are members of one of the three group roles
 * ({@link StaffRole}). Adding and changing them needs an administrator whose login may create roles
 * (CREATEROLE; docs/server.md). A password is passed to the server once and never kept by Shapetrail.
 */
public final class Accounts {
    private static final Pattern NAME = Pattern.compile("[a-z_][a-z0-9_.-]{0,62}");

    /** One account and its role. */
    public record Account(String name, StaffRole role) {
    }

    private final Connection c;

    Accounts(Connection c) {
        this.c = c;
    }

    static String checkedName(String name) {
        if (name == null || !NAME.matcher(name).matches()) {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("account.badName", name));
        }
        return name;
    }

    /** Makes a login for {@code name} with a role; refused if it exists. */
    public void add(String name, StaffRole role, char[] password) throws SQLException {
        checkedName(name);
        if (password == null || password.length < 8) {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("account.shortPassword", name));
        }
        if (exists(name)) {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("account.taken", name));
        }
        execute("SELECT format('CREATE ROLE %I LOGIN PASSWORD %L IN ROLE %I', ?, ?, ?)", name, new String(password),
                role.serverRole());
        execute("SELECT format('GRANT CONNECT ON DATABASE %I TO %I', current_database(), ?)", name);
    }

    /** Gives an account another role (it keeps its login and password). */
    public void setRole(String name, StaffRole role) throws SQLException {
        requireExisting(name);
        for (StaffRole r : StaffRole.values()) {
            if (r != role) {
                execute("SELECT format('REVOKE %I FROM %I', ?, ?)", r.serverRole(), name);
            }
        }
        execute("SELECT format('GRANT %I TO %I', ?, ?)", role.serverRole(), name);
    }

    /** Ends an account: its login is removed; what it entered stays, and the trail keeps its name. */
    public void remove(String name) throws SQLException {
        requireExisting(name);
        execute("SELECT format('REVOKE CONNECT ON DATABASE %I FROM %I', current_database(), ?)", name);
        execute("SELECT format('DROP ROLE %I', ?)", name);
    }

    /** The accounts of the three roles, by name. */
    public List<Account> all() throws SQLException {
        List<Account> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT r.rolname, g.rolname FROM pg_auth_members m"
                + " JOIN pg_roles r ON r.oid = m.member JOIN pg_roles g ON g.oid = m.roleid"
                + " WHERE g.rolname IN ('shapetrail_measurer', 'shapetrail_coach', 'shapetrail_admin') AND r.rolcanlogin"
                + " ORDER BY r.rolname, g.rolname");
             ResultSet rs = ps.executeQuery()) {
            while (rs.next()) {
                out.add(new Account(rs.getString(1), StaffRole.byWord(rs.getString(2)).orElseThrow()));
            }
        }
        return out;
    }

    private boolean exists(String name) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT 1 FROM pg_roles WHERE rolname = ?")) {
            ps.setString(1, name);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next();
            }
        }
    }

    private void requireExisting(String name) throws SQLException {
        checkedName(name);
        if (!exists(name)) {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("account.none", name));
        }
    }

    /** Lets the server quote names and the password ({@code format}'s %I and %L), then runs the statement. */
    private void execute(String formatter, String... args) throws SQLException {
        String ddl;
        try (PreparedStatement ps = c.prepareStatement(formatter)) {
            for (int i = 0; i < args.length; i++) {
                ps.setString(i + 1, args[i]);
            }
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                ddl = rs.getString(1);
            }
        }
        try (Statement s = c.createStatement()) {
            s.execute(ddl);
        }
    }
}
