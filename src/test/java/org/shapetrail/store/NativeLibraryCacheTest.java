package org.shapetrail.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class NativeLibraryCacheTest {
    @TempDir
    Path dir;

    static byte[] libraryInJar(Path copy) throws Exception {
        String folder = org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS();
        try (InputStream in = org.sqlite.SQLiteConnection.class.getResourceAsStream("/org/sqlite/native/" + folder
                + "/" + copy.getFileName())) {
            return in.readAllBytes();
        }
    }

    @Test
    void theCopyIsTheJarsLibraryAndIsMadeOnce() throws Exception {
        Path lib = NativeLibraryCache.copyIn(dir).orElseThrow();
        assertTrue(lib.startsWith(dir.resolve("sqlite-native")), lib.toString());
        assertArrayEquals(libraryInJar(lib), Files.readAllBytes(lib));
        FileTime made = FileTime.fromMillis(1_000_000_000_000L);
        Files.setLastModifiedTime(lib, made);
        assertEquals(lib, NativeLibraryCache.copyIn(dir).orElseThrow());
        assertEquals(made, Files.getLastModifiedTime(lib), "an intact copy is used as it is");
    }

    @Test
    void theFolderForThisMachineIsSqliteJdbcsOwn() {
        assertEquals(org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS(), NativeLibraryCache.nativeFolder(
                System.getProperty("os.name"), System.getProperty("os.arch")).orElseThrow());
        // folder names as sqlite-jdbc's jar lays them out (org/sqlite/native/<OS>/<arch>/)
        assertEquals("Windows/x86_64", NativeLibraryCache.nativeFolder("Windows 11", "amd64").orElseThrow());
        assertEquals("Mac/aarch64", NativeLibraryCache.nativeFolder("Mac OS X", "aarch64").orElseThrow());
        assertTrue(NativeLibraryCache.nativeFolder("FreeBSD", "amd64").isEmpty());
    }

    @Test
    void aDamagedCopyIsReplaced() throws Exception {
        Path lib = NativeLibraryCache.copyIn(dir).orElseThrow();
        byte[] bytes = Files.readAllBytes(lib);
        bytes[bytes.length / 2] ^= 0x5a;
        Files.write(lib, bytes);
        assertEquals(lib, NativeLibraryCache.copyIn(dir).orElseThrow());
        assertArrayEquals(libraryInJar(lib), Files.readAllBytes(lib));
    }
}
