package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.DriverManager;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.store.DataFolder;

/**
 * Files the tool is pointed at that it cannot use: each gets a clear message, and the file is left
 * byte-for-byte as it was; a restore from a wrong or damaged backup is refused and leaves the current
 * file as it was.
 */
class PointedFilesTest {
    @TempDir
    Path dir;

    Path sample(String name) throws Exception {
        Path p = dir.resolve(name);
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, p, StandardCopyOption.REPLACE_EXISTING);
        }
        return p;
    }

    static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    void refused(Path file, String expected, String... command) throws Exception {
        byte[] before = Files.isRegularFile(file) ? Files.readAllBytes(file) : null;
        String[] args = new String[command.length + 2];
        System.arraycopy(command, 0, args, 0, command.length);
        args[command.length] = "--db";
        args[command.length + 1] = file.toString();
        String[] r = run(args);
        assertEquals("2", r[0], String.join("\n", r));
        assertTrue(r[2].contains(expected), r[2]);
        if (before != null) {
            assertArrayEquals(before, Files.readAllBytes(file), file.getFileName() + " is unchanged");
        }
    }

    @Test
    void aTruncatedFileIsCalledDamaged() throws Exception {
        Path f = sample("truncated.sqlite");
        byte[] b = Files.readAllBytes(f);
        Files.write(f, java.util.Arrays.copyOf(b, b.length / 2));
        refused(f, "is damaged: SQLite finds it malformed (cut short or overwritten). Nothing was changed; restore it"
                + " from a backup", "people");
    }

    @Test
    void garbageIsNotAShapetrailFile() throws Exception {
        Path f = dir.resolve("garbage.sqlite");
        byte[] noise = new byte[100_000];
        new Random(5).nextBytes(noise);
        Files.write(f, noise);
        refused(f, "is not a Shapetrail database (nor any SQLite file); check that you chose the right file.", "people");
    }

    @Test
    void aFolderIsNotAFile() throws Exception {
        Path f = Files.createDirectories(dir.resolve("folder.sqlite"));
        refused(f, "is a folder, not a Shapetrail file; name the .sqlite file inside it.", "people");
    }

    @Test
    void aFileOfANewerSchemaIsRefusedWithBothSchemas() throws Exception {
        Path f = sample("newer.sqlite");
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + f); var s = c.createStatement()) {
            s.executeUpdate("DELETE FROM file_meta"); // a file that does not say which Shapetrail wrote it
            s.executeUpdate("PRAGMA user_version = 99");
        }
        refused(f, "was written by a newer Shapetrail (schema 99); this is " + org.shapetrail.store.AppVersion.named()
                + ", which reads files up to schema", "people");
    }

    @Test
    void aNewerFileNamesTheVersionThatWroteItAndThisOne() throws Exception {
        Path f = sample("newer-named.sqlite");
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + f); var s = c.createStatement()) {
            // what a later Shapetrail records when it brings a file to its schema (Migrations.WRITTEN_BY)
            s.executeUpdate("INSERT OR REPLACE INTO file_meta (key, value) VALUES ('schema_written_by', 'Shapetrail 7.2.0')");
            s.executeUpdate("PRAGMA user_version = 99");
        }
        refused(f, "was written by Shapetrail 7.2.0 (schema 99); this is " + org.shapetrail.store.AppVersion.named()
                + ", which reads files up to schema " + org.shapetrail.store.Migrations.latest()
                + ". Open it with Shapetrail 7.2.0 or later; the file was not changed.", "people");
    }

    @Test
    void aReadOnlyFileIsReadButNeverWritten() throws Exception {
        Path f = sample("read-only.sqlite");
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("r--r--r--"));
        byte[] before = Files.readAllBytes(f);
        String[] read = run("people", "--db", f.toString());
        assertEquals("0", read[0], read[2]);
        assertTrue(read[1].contains("Arlo Ashcombe"));
        refused(f, "is read-only, so nothing was saved; make it writable (its file permissions) or work on a copy.",
                "erase-person", "--yes", "1");
        assertArrayEquals(before, Files.readAllBytes(f));
    }

    @Test
    void aRestoreFromAWrongOrDamagedBackupIsRefusedAndTheFileStaysAsItWas() throws Exception {
        Path current = sample("current.sqlite");
        String[] erased = run("erase-person", "--yes", "--db", current.toString(), "2");
        assertEquals("0", erased[0], erased[2]);
        byte[] before = Files.readAllBytes(current);
        // a damaged backup: the sample cut short after its first pages
        Path damaged = sample("damaged-backup.sqlite");
        byte[] b = Files.readAllBytes(damaged);
        Files.write(damaged, java.util.Arrays.copyOf(b, b.length * 2 / 3));
        // a wrong backup: an SQLite file that is no Shapetrail file
        Path wrong = dir.resolve("other-program.sqlite");
        try (var c = DriverManager.getConnection("jdbc:sqlite:" + wrong); var s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE invoices (id INTEGER PRIMARY KEY, total REAL)");
        }
        for (Path backup : new Path[] {damaged, wrong, dir.resolve("missing-backup.sqlite")}) {
            String[] r = run("restore", "--yes", "--db", current.toString(), backup.toString());
            assertEquals("2", r[0], backup + ": " + String.join("\n", r));
            assertTrue(r[2].contains(backup.toString()), r[2]);
            assertArrayEquals(before, Files.readAllBytes(current), backup.getFileName() + ": the current file is unchanged");
        }
    }

    @Test
    void aFileHasNoAccountsAndNoTrailAndSaysSo() throws Exception {
        Path f = sample("no-accounts.sqlite");
        byte[] before = Files.readAllBytes(f);
        String[] trail = run("trail", "--person", "1", "--db", f.toString());
        assertEquals("1", trail[0]);
        assertTrue(trail[2].startsWith("A file has no accounts and keeps no audit trail"), trail[2]);
        String[] list = run("account", "list", "--db", f.toString());
        assertEquals("2", list[0]);
        assertTrue(list[2].startsWith("A file has no accounts: whoever opens it may do everything."), list[2]);
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(f)), "the file is untouched");
    }
}
