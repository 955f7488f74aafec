package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.cli.ShapetrailCli;
import org.shapetrail.store.AppVersion;
import org.shapetrail.store.DataFolder;

/** What the installed app relies on: a double-clicked file opens, the version is the pom's, the sample copy. */
class InstalledAppTest {
    @TempDir
    Path dir;

    @Test
    void aDoubleClickedAcademyFileOpensTheWindowOnIt() throws Exception {
        // the desktop entry passes the file's path as the only argument (packaging/linux/resources/shapetrail.desktop: Exec=... %f)
        Path f = Files.writeString(dir.resolve("north-shore.shapetrail"), "");
        String[] args = {f.toString()};
        assertFalse(ShapetrailCli.wantsCommandLine(args));
        assertEquals(f, ShapetrailApp.chooseStart(List.of(args)).file().orElseThrow());
    }

    @Test
    void aCommandOrAMissingFileStillGoesToTheCommandLine() {
        assertTrue(ShapetrailCli.wantsCommandLine(new String[] {"people"}));
        // a missing file is not opened (nor created): the command line says it does not know the argument
        assertTrue(ShapetrailCli.wantsCommandLine(new String[] {dir.resolve("missing.shapetrail").toString()}));
        assertNull(ShapetrailCli.academyFileArgument(new String[] {dir.toString()}));
        assertFalse(ShapetrailCli.wantsCommandLine(new String[] {}));
        assertFalse(ShapetrailCli.wantsCommandLine(new String[] {"--db", "x.sqlite"}));
    }

    @Test
    void theVersionIsThePomsInTheCommandLineAndInTheFile() throws Exception {
        Matcher m = Pattern.compile("<artifactId>shapetrail</artifactId>\\s*<version>([^<]+)</version>")
                .matcher(Files.readString(Path.of("pom.xml")));
        assertTrue(m.find());
        assertEquals("Shapetrail " + m.group(1), AppVersion.named());
        StringWriter out = new StringWriter();
        assertEquals(0, ShapetrailCli.execute(new String[] {"--version"}, new PrintWriter(out),
                new PrintWriter(new StringWriter())));
        assertEquals(AppVersion.named(), out.toString().strip());
    }

    @Test
    void theSampleAcademyOpensAsTheUsersOwnCopyNeverTheOriginal() throws Exception {
        byte[] original;
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            original = in.readAllBytes();
        }
        Path copy = DataFolder.sampleCopy(dir);
        assertEquals(dir.resolve(DataFolder.SAMPLE_COPY), copy);
        assertArrayEquals(original, Files.readAllBytes(copy));
        // what the user tried in the copy stays: a second call opens the same copy, not a fresh one
        Files.write(copy, new byte[] {1, 2, 3});
        assertEquals(copy, DataFolder.sampleCopy(dir));
        assertArrayEquals(new byte[] {1, 2, 3}, Files.readAllBytes(copy));
    }
}
