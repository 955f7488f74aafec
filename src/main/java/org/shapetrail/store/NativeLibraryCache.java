package org.shapetrail.store;

import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.Optional;
import java.util.jar.JarEntry;
import java.util.zip.CRC32;

/**
 * Keeps a copy of SQLite's native library, which sqlite-jdbc carries inside its jar, in Shapetrail's data
 * folder and points sqlite-jdbc at it. Otherwise sqlite-jdbc unpacks the library into the temporary folder
 * and compares it with the jar's on every start, which took about 0.15 s of each start here
 * (docs/performance.md). The copy sits in a folder named after the CRC-32 that the jar records for the
 * library, and is used only when its own CRC-32 matches; anything unexpected leaves sqlite-jdbc to its
 * own way.
 */
public final class NativeLibraryCache {
    private NativeLibraryCache() {
    }

    /** Points sqlite-jdbc at a checked copy under {@code dataFolder}, unless it was told where to look already. */
    public static void use(Path dataFolder) {
        if (System.getProperty("org.sqlite.lib.path") != null) {
            return;
        }
        copyIn(dataFolder.resolve("cache")).ifPresent(lib -> {
            System.setProperty("org.sqlite.lib.path", lib.getParent().toString());
            System.setProperty("org.sqlite.lib.name", lib.getFileName().toString());
        });
    }

    /** The checked copy of the library for this machine under {@code cacheFolder}, made if needed. */
    static Optional<Path> copyIn(Path cacheFolder) {
        try {
            String name = System.mapLibraryName("sqlitejdbc");
            Optional<String> folder = nativeFolder(System.getProperty("os.name"), System.getProperty("os.arch"));
            if (folder.isEmpty()) {
                return Optional.empty();
            }
            URL url = org.sqlite.SQLiteConnection.class.getResource("/org/sqlite/native/" + folder.get() + "/" + name);
            if (url == null || !(url.openConnection() instanceof JarURLConnection jar)) {
                return Optional.empty();
            }
            jar.setUseCaches(false);
            JarEntry entry = jar.getJarEntry();
            long crc = entry.getCrc();
            if (crc < 0) {
                return Optional.empty();
            }
            Path lib = cacheFolder.resolve("sqlite-native").resolve(String.format(Locale.ROOT, "%08x", crc))
                    .resolve(name);
            if (Files.isRegularFile(lib) && Files.size(lib) == entry.getSize() && crcOf(lib) == crc) {
                return Optional.of(lib);
            }
            Files.createDirectories(lib.getParent());
            Path part = Files.createTempFile(lib.getParent(), name, ".part");
            try (InputStream in = url.openStream()) {
                Files.copy(in, part, StandardCopyOption.REPLACE_EXISTING);
            }
            if (crcOf(part) != crc) {
                Files.deleteIfExists(part);
                return Optional.empty();
            }
            Files.move(part, lib, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return Optional.of(lib);
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /**
     * sqlite-jdbc's folder for the common desktops, worked out here because its own way takes about 50 ms;
     * anything else is left to sqlite-jdbc. A wrong guess costs nothing: sqlite-jdbc falls back to its own
     * way when a library will not load.
     */
    static Optional<String> nativeFolder(String osName, String osArch) {
        String os = osName == null ? "" : osName.toLowerCase(Locale.ROOT);
        String arch = osArch == null ? "" : osArch.toLowerCase(Locale.ROOT);
        String a = arch.equals("amd64") || arch.equals("x86_64") ? "x86_64"
                : arch.equals("aarch64") || arch.equals("arm64") ? "aarch64" : null;
        String o = os.startsWith("linux") ? "Linux" : os.startsWith("mac") ? "Mac" : os.startsWith("windows") ? "Windows"
                : null;
        return a == null || o == null ? Optional.empty() : Optional.of(o + "/" + a);
    }

    static long crcOf(Path file) throws IOException {
        CRC32 crc = new CRC32();
        crc.update(Files.readAllBytes(file));
        return crc.getValue();
    }
}
