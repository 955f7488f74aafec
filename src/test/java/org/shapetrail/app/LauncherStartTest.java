package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.store.DataFolder;

/**
 * The desktop app started the way its launchers start it (Launcher.main in a JVM of its own, headless
 * Monocle), as far as the people list: the path the GUI tests, which build the window themselves, do not
 * take.
 */
class LauncherStartTest {
    @TempDir
    Path dir;

    @Test
    void theLauncherOpensTheWindowOnADoubleClickedFile() throws Exception {
        Path f = dir.resolve("academy.shapetrail");
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, f, StandardCopyOption.REPLACE_EXISTING);
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(List.of(java, "-cp", System.getProperty("java.class.path"),
                "-Dglass.platform=Monocle", "-Dmonocle.platform=Headless", "-Dprism.order=sw",
                "-Dheadless.geometry=1600x1000-32", "-Djava.util.prefs.userRoot=" + dir.resolve("prefs"),
                "-Dshapetrail.startupProbe=true", Launcher.class.getName(), f.toString()));
        pb.environment().put("SHAPETRAIL_HOME", dir.resolve("data").toString());
        pb.redirectErrorStream(true);
        Process p = pb.start();
        boolean ended = p.waitFor(90, TimeUnit.SECONDS);
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!ended) {
            p.destroyForcibly();
        }
        assertTrue(ended, "the app did not reach the people list and quit: " + out);
        // the sample academy holds 60 people (sample-db/README.md: 40 juniors and a senior squad of 20)
        assertTrue(out.contains("usable window with 60 people"), out);
        assertEquals(0, p.exitValue(), out);
    }
}
