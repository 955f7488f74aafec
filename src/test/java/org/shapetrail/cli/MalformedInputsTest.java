package org.shapetrail.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.shapetrail.store.DataFolder;

/**
 * The malformed-input corpus (src/test/resources/org/shapetrail/exchange/malformed, listed in cases.tsv):
 * each file, imported into a copy of the sample academy, is refused with its line and the fix, in the dry
 * run and on commit, and the file is left byte-for-byte as it was.
 */
class MalformedInputsTest {
    static final String CORPUS = "/org/shapetrail/exchange/malformed/";

    @TempDir
    Path dir;

    record Case(String file, List<String> options, String expected) {
        @Override
        public String toString() {
            return file;
        }
    }

    static Stream<Case> corpus() throws Exception {
        List<Case> out = new ArrayList<>();
        try (InputStream in = MalformedInputsTest.class.getResourceAsStream(CORPUS + "cases.tsv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split("\t", 3);
                out.add(new Case(f[0], f[1].equals("-") ? List.of() : List.of(f[1].split(" ")), f[2]));
            }
        }
        return out.stream();
    }

    /** A copy of the bundled sample academy. */
    Path sampleCopy() throws Exception {
        Path db = dir.resolve("academy.sqlite");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, db, StandardCopyOption.REPLACE_EXISTING);
        }
        return db;
    }

    record Run(int code, String out, String err) {
        String all() {
            return out + err;
        }
    }

    static Run cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    /** Runs the import dry and for real; both refuse with the expected words and the file stays as it was. */
    void refused(Path input, List<String> options, String expected) throws Exception {
        Path db = sampleCopy();
        byte[] before = Files.readAllBytes(db);
        for (boolean commit : new boolean[] {false, true}) {
            List<String> args = new ArrayList<>(List.of("import", "--db", db.toString()));
            args.addAll(options);
            if (commit) {
                args.add("--commit");
            }
            args.add(input.toString());
            Run r = cli(args.toArray(String[]::new));
            assertTrue(r.code() == 1 || r.code() == 2, input.getFileName() + " exit " + r.code() + "\n" + r.all());
            assertTrue(r.all().contains(expected), input.getFileName() + ":\n" + r.all());
            assertEquals(1, r.all().split(java.util.regex.Pattern.quote(expected), -1).length - 1,
                    "told once: " + r.all());
            assertArrayEquals(before, Files.readAllBytes(db), input.getFileName() + ": the file is unchanged");
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void eachMalformedFileIsRefusedClearlyAndLeavesTheFileUnchanged(Case c) throws Exception {
        Path input = dir.resolve(c.file());
        try (InputStream in = getClass().getResourceAsStream(CORPUS + c.file())) {
            Files.copy(in, input);
        }
        refused(input, c.options(), c.expected());
    }

    @Test
    void aContextOfTenMillionCharactersIsRefusedWithTheLimit() throws Exception {
        Path input = dir.resolve("long-context.csv");
        String head = "person_id,name,birth_date,sex,date,time,measurer,context,site,trial,value,unit\n";
        String row = "1,Arlo Ashcombe,2012-11-13,M,2026-10-01,10:00,Imogen Tarrant," + "a".repeat(10_000_000)
                + ",stature,1,162.0,cm\n";
        Files.writeString(input, head + row);
        refused(input, List.of(), "line 2: rejected — the context is 10,000,000 characters long; the limit is 200:"
                + " shorten it");
    }

    @Test
    void aDatabaseInAMissingFolderIsAnErrorNamingThePathAndNothingIsCreated() throws Exception {
        Path missing = dir.resolve("no-such-folder").resolve("academy.sqlite");
        for (String[] args : List.of(new String[] {"people", "--db", missing.toString()},
                new String[] {"import", "--db", missing.toString(), "x.csv"})) {
            Run r = cli(args);
            assertEquals(2, r.code(), r.all());
            assertEquals("There is no Shapetrail file at " + missing.toAbsolutePath() + " (the folder "
                    + missing.toAbsolutePath().getParent() + " does not exist); check the path. Nothing was created:"
                    + " to start a new file, use New file… in the app.\n", r.err());
            assertTrue(!Files.exists(missing.getParent()), "no folder made");
        }
        Path absent = dir.resolve("absent.sqlite");
        Run r = cli("tem", "--db", absent.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().startsWith("There is no Shapetrail file at " + absent.toAbsolutePath() + "; check the path."),
                r.err());
        assertTrue(!Files.exists(absent));
    }
}
