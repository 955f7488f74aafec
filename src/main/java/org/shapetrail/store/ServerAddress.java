package org.shapetrail.store;

import java.net.URI;
import java.net.URISyntaxException;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Where a shared record lives on a PostgreSQL server, from a connection URI in the standard form
 * {@code postgresql://user@host:5432/dbname?sslmode=require} (also {@code postgres://} and
 * {@code jdbc:postgresql://}). As with PostgreSQL's own tools, a missing port is 5432, a missing user is
 * the operating system's user, and a missing database is named after the user. The password is not part
 * of the address: it comes from {@code PGPASSWORD}, the password file ({@code ~/.pgpass} or
 * {@code PGPASSFILE}, read by the driver) or the app's prompt, and is never shown or stored.
 */
public record ServerAddress(String host, int port, String database, String user, Map<String, String> options) {
    /** The default PostgreSQL port. */
    public static final int DEFAULT_PORT = 5432;

    public ServerAddress {
        options = Map.copyOf(options);
    }

    /** Whether {@code target} names a server rather than a file. */
    public static boolean isServer(String target) {
        String t = target.strip().toLowerCase(Locale.ROOT);
        return t.startsWith("postgresql://") || t.startsWith("postgres://") || t.startsWith("jdbc:postgresql://");
    }

    /**
     * Reads a connection URI.
     *
     * @throws StoreException naming what is wrong with it and the form it should have
     */
    public static ServerAddress parse(String target) {
        String t = target.strip();
        if (!isServer(t)) {
            throw new StoreException(wrong(target, org.shapetrail.i18n.Messages.tr("address.scheme")));
        }
        String rest = t.substring(t.indexOf("://") + 3);
        if (rest.isBlank() || rest.startsWith("/")) {
            throw new StoreException(wrong(target, org.shapetrail.i18n.Messages.tr("address.noHost")));
        }
        URI u;
        try {
            u = new URI("postgresql://" + rest);
        } catch (URISyntaxException e) {
            throw new StoreException(wrong(target, e.getReason()), e);
        }
        if (u.getHost() == null || u.getHost().isBlank()) {
            throw new StoreException(wrong(target, org.shapetrail.i18n.Messages.tr("address.noHost")));
        }
        if (u.getRawUserInfo() != null && u.getRawUserInfo().contains(":")) {
            throw new StoreException(org.shapetrail.i18n.Messages.tr("address.password", redact(target)));
        }
        Map<String, String> query = new LinkedHashMap<>();
        if (u.getRawQuery() != null) {
            for (String pair : u.getRawQuery().split("&")) {
                if (pair.isEmpty()) {
                    continue;
                }
                int eq = pair.indexOf('=');
                String k = decode(eq < 0 ? pair : pair.substring(0, eq));
                String v = eq < 0 ? "" : decode(pair.substring(eq + 1));
                if (k.equals("password")) {
                    throw new StoreException(org.shapetrail.i18n.Messages.tr("address.password", redact(target)));
                }
                query.put(k, v);
            }
        }
        String user = u.getUserInfo() != null ? u.getUserInfo() : query.remove("user");
        if (user == null || user.isBlank()) {
            user = System.getProperty("user.name");
        }
        query.remove("user");
        String path = u.getPath() == null ? "" : u.getPath().replaceFirst("^/", "");
        if (path.contains("/")) {
            throw new StoreException(wrong(target, org.shapetrail.i18n.Messages.tr("address.slash", path)));
        }
        String db = path.isBlank() ? user : path;
        int port = u.getPort() < 0 ? DEFAULT_PORT : u.getPort();
        return new ServerAddress(u.getHost(), port, db, user, query);
    }

    private static String wrong(String target, String why) {
        return org.shapetrail.i18n.Messages.tr("address.wrong", redact(target), why);
    }

    /** The address as it may be shown: any password in it replaced. */
    static String redact(String target) {
        return target.replaceAll("(://[^:/@]*):[^@/]*@", "$1:•••@").replaceAll("(?i)(password=)[^&]*", "$1•••");
    }

    private static String decode(String s) {
        return URLDecoder.decode(s, StandardCharsets.UTF_8);
    }

    /** The same record, logged in as another account. */
    public ServerAddress withUser(String other) {
        return new ServerAddress(host, port, database, other, options);
    }

    /** The driver's URL for this address (no user or password in it; those go as properties). */
    public String jdbcUrl() {
        StringBuilder sb = new StringBuilder("jdbc:postgresql://").append(host.contains(":") ? "[" + host + "]" : host)
                .append(':').append(port).append('/').append(java.net.URLEncoder.encode(database, StandardCharsets.UTF_8));
        String sep = "?";
        for (var e : options.entrySet()) {
            sb.append(sep).append(java.net.URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8)).append('=')
                    .append(java.net.URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8));
            sep = "&";
        }
        return sb.toString();
    }

    /** How the address is shown to a person, and remembered: {@code postgresql://user@host:port/database}. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("postgresql://").append(user).append('@')
                .append(host.contains(":") ? "[" + host + "]" : host).append(':').append(port).append('/').append(database);
        String sep = "?";
        for (var e : options.entrySet()) {
            sb.append(sep).append(e.getKey()).append('=').append(e.getValue());
            sep = "&";
        }
        return sb.toString();
    }
}
