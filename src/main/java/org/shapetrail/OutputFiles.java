package org.shapetrail;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * Writing a file a person asked for: never over an existing file unless they said so, and whole or not
 * at all (written beside the target, then moved into place), so a failure leaves no half-written file.
 */
public final class OutputFiles {
    private OutputFiles() {
    }

    /** Work that writes a file's content. */
    @FunctionalInterface
    public interface Content {
        void write(OutputStream out) throws IOException;
    }

    /** The targets that exist already (to be named before anything is written). */
    public static List<Path> existing(List<Path> targets) {
        return targets.stream().filter(Files::exists).toList();
    }

    /**
     * Refuses when a target exists and {@code overwrite} is false, naming it and how to go on.
     *
     * @param how what the person does to replace it, e.g. "add --overwrite"
     */
    public static void refuseExisting(List<Path> targets, boolean overwrite, String how) {
        List<Path> there = existing(targets);
        if (!overwrite && !there.isEmpty()) {
            throw new ShapetrailException(org.shapetrail.i18n.Messages.tr("output.exists", there.size(),
                    there.get(0), how));
        }
    }

    /** Writes {@code target} whole: into a temporary file beside it, then moved over it. */
    public static void writeWhole(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath();
        Files.createDirectories(abs.getParent());
        Path tmp = Files.createTempFile(abs.getParent(), "." + abs.getFileName(), ".part");
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.write(out);
            }
            Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
