package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.cli.ShapetrailCli;
import org.shapetrail.measure.Sex;

/**
 * Erasure leaves no trace: a person with a distinctive name, notes and visit context is added to a copy of
 * the sample academy, the app-like use leaves their pages in the file and its WAL, then {@code
 * erase-person} runs, and the raw bytes of every file in the data folder are scanned for those texts.
 */
class ErasureScanTest {
    static final String NAME = "Quillon Marrowbright-Zephyrine";
    static final String NOTE = "Xanthe-private-note-4471";
    static final String CONTEXT = "zzyzx-session-9902";

    @TempDir
    Path dir;

    /** Where any of the texts is found in the folder's files, in UTF-8 or UTF-16 (either byte order). */
    static List<String> traces(Path folder) throws Exception {
        List<String> found = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path f : files.filter(Files::isRegularFile).toList()) {
                byte[] bytes = Files.readAllBytes(f);
                for (String text : List.of(NAME, NOTE, CONTEXT)) {
                    for (Charset cs : List.of(StandardCharsets.UTF_8, StandardCharsets.UTF_16LE, StandardCharsets.UTF_16BE)) {
                        if (indexOf(bytes, text.getBytes(cs)) >= 0) {
                            found.add(f.getFileName() + ": " + text + " (" + cs + ")");
                        }
                    }
                    // a fragment as well: half a name left in a page is still a trace
                    if (indexOf(bytes, text.substring(0, 10).getBytes(StandardCharsets.UTF_8)) >= 0) {
                        found.add(f.getFileName() + ": " + text.substring(0, 10) + "…");
                    }
                }
            }
        }
        return found;
    }

    static int indexOf(byte[] hay, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= hay.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (hay[i + j] != needle[j]) {
                    continue outer;
                }
            }
            return i;
        }
        return -1;
    }

    @Test
    void anErasedPersonIsNowhereInTheBytesOfTheDataFolder() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("data"));
        Path db = folder.resolve("shapetrail.sqlite");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, db, StandardCopyOption.REPLACE_EXISTING);
        }
        long id;
        try (Database d = Database.open(db)) {
            id = d.inTransaction(tx -> {
                Person p = tx.people().insert(new Person(0, NAME, Sex.FEMALE, LocalDate.of(2011, 2, 3), null, null, NOTE,
                        Consent.NONE, null));
                long m = tx.measurers().all().get(0).id();
                for (int k = 0; k < 3; k++) {
                    tx.visits().insert(new Visit(0, p.id(), LocalDateTime.of(2025, 1 + k * 3, 5, 9, 0), m, CONTEXT, NOTE,
                            Fixtures.visit(p.id(), m, LocalDateTime.of(2025, 1, 5, 9, 0)).trials()));
                }
                return p.id();
            });
            // an edit leaves older versions of the pages behind as well
            d.inTransaction(tx -> {
                Person p = tx.people().find(id).orElseThrow();
                tx.people().update(new Person(p.id(), NAME, p.sex(), p.birthDate(), null, null, NOTE + " edited",
                        p.consent(), null));
                return null;
            });
        }
        assertFalse(traces(folder).isEmpty(), "the texts are in the file before the erasure (the scan can find them)");
        // SQLite keeps deleted content in free pages: a plain delete leaves the name readable (the defect)
        Path plain = Files.createDirectories(dir.resolve("plain"));
        Files.copy(db, plain.resolve("copy.sqlite"));
        try (Database d = Database.open(plain.resolve("copy.sqlite"))) {
            d.inTransaction(tx -> {
                try (var s = tx.connection().createStatement()) {
                    s.execute("PRAGMA secure_delete = OFF");
                }
                return tx.people().erase(id);
            });
        }
        assertFalse(traces(plain).isEmpty(), "a plain delete leaves traces, so the wipe is what removes them");

        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(new String[] {"erase-person", "--yes", "--db", db.toString(),
            String.valueOf(id)}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        // three visits, in the plural (cli.erase.file's wording)
        assertTrue(out.toString().startsWith("Erased " + NAME + " and 3 visits; no trace of them is left in "), out.toString());
        assertEquals(List.of(), traces(folder));
        try (Database d = Database.open(db)) {
            assertEquals("ok", d.integrityCheck());
            assertEquals(60, (int) d.inTransaction(tx -> tx.people().all().size()), "the sample academy's 60 stay");
        }
        assertEquals(List.of(), traces(folder), "and after opening it again");
    }

    @Test
    void theErasureNamesTheBackupsThatStillHoldThePerson() throws Exception {
        Path db = dir.resolve("academy.sqlite");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, db, StandardCopyOption.REPLACE_EXISTING);
        }
        Path backup = dir.resolve("before-erasure.sqlite");
        Path gone = dir.resolve("deleted-backup.sqlite");
        try (Database d = Database.open(db)) {
            d.backupTo(gone);
            d.backupTo(backup);
        }
        Files.delete(gone);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, ShapetrailCli.execute(new String[] {"erase-person", "--yes", "--db", db.toString(), "1"},
                new PrintWriter(out), new PrintWriter(err)), err.toString());
        String text = out.toString();
        assertTrue(text.contains("Copies made earlier still hold Arlo Ashcombe's data; erasure does not reach them."),
                text);
        assertTrue(text.contains("  " + backup.toAbsolutePath() + " (backup, "), text);
        assertFalse(text.contains(gone.toString()), "a copy no longer there is not listed");
        // the backup itself still holds the person: erasure never reaches outside the file
        try (Database b = Database.open(backup)) {
            assertTrue(b.inTransaction(tx -> tx.people().find(1)).isPresent());
        }
    }
}
