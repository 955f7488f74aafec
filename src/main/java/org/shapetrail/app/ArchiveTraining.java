package org.shapetrail.app;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Enumeration;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;

/**
 * The run that records the installed image's class-data archive at build (and install) time, so that
 * even the first start of the installed app is fast: it loads, without running them, the classes of the
 * app and the libraries it starts with (the desktop toolkit's controls among them), then exits. Used by
 * the installer profile (pom.xml) and the Debian package's install script; not a user command.
 */
public final class ArchiveTraining {
    /** The packages whose classes a start of the app or a command may need. */
    private static final String[] PREFIXES = {"org/shapetrail/", "javafx/", "com/sun/javafx/", "com/sun/glass/",
        "com/sun/prism/", "com/sun/scenario/", "org/controlsfx/", "picocli/", "org/sqlite/", "org/apache/pdfbox/",
        "org/apache/fontbox/", "org/apache/commons/csv/", "org/apache/commons/math3/distribution/",
        "org/apache/commons/math3/special/", "org/apache/commons/math3/stat/"};

    private ArchiveTraining() {
    }

    public static void main(String[] args) throws IOException, java.net.URISyntaxException {
        // by URI, not by its path text, so that a Windows drive letter reads right
        Path jar = Path.of(ArchiveTraining.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        int loaded = 0;
        ClassLoader cl = ArchiveTraining.class.getClassLoader();
        try (JarFile j = new JarFile(jar.toFile())) {
            for (Enumeration<JarEntry> e = j.entries(); e.hasMoreElements(); ) {
                String n = e.nextElement().getName();
                if (!n.endsWith(".class") || n.startsWith("META-INF/") || n.endsWith("module-info.class")) {
                    continue;
                }
                boolean wanted = false;
                for (String p : PREFIXES) {
                    wanted |= n.startsWith(p);
                }
                if (!wanted) {
                    continue;
                }
                try {
                    Class.forName(n.substring(0, n.length() - 6).replace('/', '.'), false, cl);
                    loaded++;
                } catch (Throwable notLoadable) {
                    // a class for another platform or an optional library: left out of the archive
                }
            }
        }
        System.out.println("loaded " + loaded + " classes for the archive"); // not words: a build step's log
    }
}
