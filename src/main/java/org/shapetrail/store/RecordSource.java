package org.shapetrail.store;

import java.nio.file.Path;
import java.util.Optional;

/**
 * Where an academy's record lives, as the app holds it between one piece of work and the next: a local
 * file (the default), or a schema on a PostgreSQL server with the password typed for this session (kept
 * in memory only, never written to the settings).
 */
public sealed interface RecordSource permits RecordSource.LocalFile, RecordSource.Server {
    /** Opens the record for one piece of work (the file must exist; a server is connected anew). */
    Database open();

    /** How a person reads where the record is: the file's path, or the server's address. */
    String name();

    /** The short form for a window title and status lines: the file's name, or "DATABASE on HOST". */
    String title();

    /** The file, for a local record. */
    Optional<Path> file();

    /** How the record is remembered in the settings (the path, or the address without any password). */
    String remembered();

    static RecordSource of(Path file) {
        return new LocalFile(file);
    }

    /** A local file. */
    record LocalFile(Path path) implements RecordSource {
        @Override
        public Database open() {
            return Database.openExisting(path);
        }

        @Override
        public String name() {
            return path.toAbsolutePath().toString();
        }

        @Override
        public String title() {
            return String.valueOf(path.getFileName());
        }

        @Override
        public Optional<Path> file() {
            return Optional.of(path);
        }

        @Override
        public String remembered() {
            return path.toAbsolutePath().toString();
        }
    }

    /** A record on a server, with this session's password (null: PGPASSWORD or ~/.pgpass). */
    record Server(ServerAddress address, char[] password) implements RecordSource {
        public Server {
            password = password == null ? null : password.clone();
        }

        @Override
        public Database open() {
            return Database.connect(address, password);
        }

        @Override
        public String name() {
            return address.toString();
        }

        @Override
        public String title() {
            return address.database() + " on " + address.host();
        }

        @Override
        public Optional<Path> file() {
            return Optional.empty();
        }

        @Override
        public String remembered() {
            return address.toString();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Server s && s.address.equals(address);
        }

        @Override
        public int hashCode() {
            return address.hashCode();
        }

        @Override
        public String toString() {
            return "Server[" + address + "]"; // never the password
        }
    }
}
