package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** One window edits a file at a time; a second copy of the app gets it read-only and is told who has it. */
class FileClaimTest {
    @TempDir
    Path dir;

    Path sample() throws Exception {
        Path p = dir.resolve("academy.sqlite");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, p, StandardCopyOption.REPLACE_EXISTING);
        }
        return p;
    }

    /** A second process (another copy of the app) holds the claim until its input closes. */
    public static final class HoldClaim {
        public static void main(String[] args) throws Exception {
            try (FileClaim c = FileClaim.claim(Path.of(args[0])).orElseThrow()) {
                System.out.println("held " + c.database());
                System.out.flush();
                System.in.read();
            }
        }
    }

    @Test
    void aSecondCopyOfTheAppGetsTheFileReadOnlyAndIsToldWhoHasIt() throws Exception {
        Path f = sample();
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process other = new ProcessBuilder(List.of(java, "-cp", System.getProperty("java.class.path"),
                HoldClaim.class.getName(), f.toString())).redirectErrorStream(true).start();
        try {
            String line = new BufferedReader(new InputStreamReader(other.getInputStream(), StandardCharsets.UTF_8))
                    .readLine();
            assertTrue(line != null && line.startsWith("held "), String.valueOf(line));

            Optional<FileClaim> mine = FileClaim.claim(f);
            assertTrue(mine.isEmpty(), "two windows must never both write the file");
            String who = FileClaim.holder(f).orElseThrow();
            assertTrue(who.startsWith("Shapetrail (" + System.getProperty("user.name") + " on "), who);

            // reading works; a write is refused with the holder named, and nothing changes
            try (Database db = Database.openExisting(f)) {
                assertEquals(Migrations.latest(), db.schemaVersion());
            }
            byte[] before = Files.readAllBytes(f);
            StoreException e = assertThrows(StoreException.class, () -> {
                try (Database db = Database.openExisting(f)) {
                    db.erasePerson(1);
                }
            });
            assertTrue(e.getMessage().contains("is open for editing in " + who + ", so this window has it read-only"
                    + " and nothing was saved"), e.getMessage());
            assertArrayEquals(before, Files.readAllBytes(f));
        } finally {
            other.getOutputStream().close();
            other.waitFor();
            FileClaim.release(f);
        }
        // the other copy closed: the file can be claimed and written again
        try (FileClaim c = FileClaim.claim(f).orElseThrow()) {
            assertEquals(f.toAbsolutePath().normalize(), c.database());
            assertTrue(FileClaim.holder(f).isEmpty());
        }
    }

    @Test
    void twoWindowsOfOneProcessDoNotBothWrite() throws Exception {
        Path f = sample();
        try (FileClaim first = FileClaim.claim(f).orElseThrow()) {
            assertTrue(FileClaim.claim(f).isEmpty());
            assertTrue(FileClaim.heldElsewhere(f));
            FileClaim.release(f);
        }
        assertTrue(!FileClaim.heldElsewhere(f));
    }

    @Test
    void theLockFileSaysWhoAndSinceWhen() throws Exception {
        Path f = sample();
        try (FileClaim c = FileClaim.claim(f).orElseThrow()) {
            String text = Files.readString(FileClaim.lockFile(f)).strip();
            // "Shapetrail (USER on HOST, since YYYY-MM-DD HH:MM)"
            assertTrue(text.matches("Shapetrail \\(.+ on .+, since \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2}\\)"), text);
        }
    }
}
