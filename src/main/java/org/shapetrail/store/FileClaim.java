package org.shapetrail.store;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * One app window at a time edits a file: the window holds an operating-system lock on a small file beside
 * it ({@code NAME.in-use}, saying who and since when). A second window that cannot take the lock opens the
 * file read-only and says who has it; the lock goes with the process that held it, so a crash leaves
 * nothing stale. The lock file itself stays (deleting it could let two windows lock two different files).
 *
 * <p>The command line takes no claim: each of its commands is one transaction that SQLite serialises with
 * the window's own, and the window reloads what it shows after every save.
 */
public final class FileClaim implements AutoCloseable {
    private static final Set<Path> READ_ONLY = ConcurrentHashMap.newKeySet();
    private static final java.util.Map<Path, String> HOLDERS = new ConcurrentHashMap<>();

    private final Path database;
    private final FileChannel channel;
    private final FileLock lock;

    private FileClaim(Path database, FileChannel channel, FileLock lock) {
        this.database = database;
        this.channel = channel;
        this.lock = lock;
    }

    /** The lock file beside {@code database}. */
    public static Path lockFile(Path database) {
        Path abs = database.toAbsolutePath();
        return abs.resolveSibling(abs.getFileName() + ".in-use");
    }

    /**
     * Claims {@code database} for this window. Empty when another window has it: then every
     * {@link Database#open} of that file in this process is read-only until {@link #release(Path)}, and
     * {@link #holder(Path)} says who has it.
     */
    public static Optional<FileClaim> claim(Path database) {
        Path abs = database.toAbsolutePath().normalize();
        Path lf = lockFile(abs);
        FileChannel ch = null;
        try {
            ch = FileChannel.open(lf, StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
            FileLock l;
            try {
                l = ch.tryLock();
            } catch (OverlappingFileLockException e) {
                l = null; // another window of this same process
            }
            if (l == null) {
                String who = new String(Files.readAllBytes(lf), StandardCharsets.UTF_8).strip();
                ch.close();
                READ_ONLY.add(abs);
                HOLDERS.put(abs, shown(who));
                return Optional.empty();
            }
            // one line a person can read in the file itself; each window says it again in its own language (shown)
            String who = "Shapetrail (" + System.getProperty("user.name", "?") + " on " + host() + ", since " // not words
                    + LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm")) + ")"; // not words
            ch.truncate(0);
            ch.write(ByteBuffer.wrap((who + "\n").getBytes(StandardCharsets.UTF_8)), 0);
            ch.force(false);
            READ_ONLY.remove(abs);
            HOLDERS.remove(abs);
            return Optional.of(new FileClaim(abs, ch, l));
        } catch (IOException e) {
            // a folder we may not write in: the file itself is then read-only to us too (Database says so)
            closeQuietly(ch);
            return Optional.empty();
        }
    }

    private static final java.util.regex.Pattern LINE = java.util.regex.Pattern.compile(
            "Shapetrail \\((.*) on (.*), since (.*)\\)");

    /** The holder in the reader's language, from the lock file's line (who, on which computer, since when). */
    static String shown(String line) {
        java.util.regex.Matcher m = LINE.matcher(line);
        if (m.matches()) {
            return org.shapetrail.i18n.Messages.tr("claim.holder", m.group(1), m.group(2).isBlank()
                    ? org.shapetrail.i18n.Messages.tr("claim.thisComputer") : m.group(2), m.group(3));
        }
        return line.isEmpty() ? org.shapetrail.i18n.Messages.tr("claim.another") : line;
    }

    /** Who holds the file when this process opened it read-only because of them, else empty. */
    public static Optional<String> holder(Path database) {
        return Optional.ofNullable(HOLDERS.get(database.toAbsolutePath().normalize()));
    }

    /** Ends read-only mode for a file this window could not claim (it opens another file). */
    public static void release(Path database) {
        Path abs = database.toAbsolutePath().normalize();
        READ_ONLY.remove(abs);
        HOLDERS.remove(abs);
    }

    static boolean heldElsewhere(Path database) {
        return READ_ONLY.contains(database.toAbsolutePath().normalize());
    }

    public Path database() {
        return database;
    }

    @Override
    public void close() {
        try {
            lock.release();
        } catch (IOException e) {
            // closing the channel below releases it too
        }
        closeQuietly(channel);
    }

    /** The computer's name from the environment (a name look-up could stall the start on a bad network). */
    private static String host() {
        for (String k : new String[] {"HOSTNAME", "COMPUTERNAME"}) {
            String v = System.getenv(k);
            if (v != null && !v.isBlank()) {
                return v.strip();
            }
        }
        try {
            return Files.readString(Path.of("/etc/hostname"), StandardCharsets.UTF_8).strip();
        } catch (IOException | RuntimeException e) {
            return "";
        }
    }

    private static void closeQuietly(FileChannel ch) {
        if (ch != null) {
            try {
                ch.close();
            } catch (IOException e) {
                // nothing more to do
            }
        }
    }
}
