package org.shapetrail.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * Where Shapetrail keeps its file when the user names none: the user's data folder, seeded on first run
 * with a copy of the demo database (the copy in the repository or jar stays clean).
 */
public final class DataFolder {
    /** Classpath location of the bundled demo database. */
    public static final String SAMPLE_RESOURCE = "/sample-db/saltmarsh-bay.sqlite";
    /** File name of the default database inside the data folder. */
    public static final String DEFAULT_FILE = "shapetrail.sqlite";

    private DataFolder() {
    }

    /**
     * The data folder: {@code $SHAPETRAIL_HOME} if set; otherwise the platform's per-user data folder
     * (XDG_DATA_HOME or ~/.local/share on Linux, ~/Library/Application Support on macOS, %APPDATA% on
     * Windows), with a "shapetrail" folder inside.
     */
    public static Path folder(Map<String, String> env, String userHome, String osName) {
        String own = env.get("SHAPETRAIL_HOME");
        if (own != null && !own.isBlank()) {
            return Path.of(own);
        }
        String os = osName.toLowerCase(Locale.ROOT);
        if (os.contains("win") && env.get("APPDATA") != null) {
            return Path.of(env.get("APPDATA"), "Shapetrail");
        }
        if (os.contains("mac")) {
            return Path.of(userHome, "Library", "Application Support", "Shapetrail");
        }
        String xdg = env.get("XDG_DATA_HOME");
        return (xdg != null && !xdg.isBlank() ? Path.of(xdg) : Path.of(userHome, ".local", "share")).resolve("shapetrail");
    }

    /** File name of the copy of the sample academy that Help → Open the sample academy opens. */
    public static final String SAMPLE_COPY = "sample-academy.sqlite";

    /**
     * The user's own copy of the sample academy in {@code folder}, made from the bundled original the first
     * time (later calls open the same copy, with whatever was tried in it; delete it for a fresh one). The
     * installed original is never opened, so it stays as shipped.
     */
    public static Path sampleCopy(Path folder) {
        Path p = folder.resolve(SAMPLE_COPY);
        seedWithSample(p);
        return p;
    }

    /** The default file of this user on this machine. */
    public static Path defaultFile() {
        return userFolder().resolve(DEFAULT_FILE);
    }

    /** This user's data folder on this machine. */
    public static Path userFolder() {
        return folder(System.getenv(), System.getProperty("user.home"), System.getProperty("os.name"));
    }

    /**
     * Makes sure {@code target} exists, copying the bundled demo database there if it does not.
     *
     * @return true when the demo database was copied
     */
    public static boolean seedWithSample(Path target) {
        if (Files.exists(target)) {
            return false;
        }
        try (InputStream in = DataFolder.class.getResourceAsStream(SAMPLE_RESOURCE)) {
            if (in == null) {
                throw new StoreException("The demo database is missing from this build (" + SAMPLE_RESOURCE + ").");
            }
            if (target.toAbsolutePath().getParent() != null) {
                Files.createDirectories(target.toAbsolutePath().getParent());
            }
            Path tmp = target.resolveSibling(target.getFileName() + ".part");
            Files.copy(in, tmp, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            Files.move(tmp, target, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
            return true;
        } catch (IOException e) {
            throw new StoreException("Cannot copy the demo database to " + target + ": " + e.getMessage(), e);
        }
    }
}
