package org.shapetrail.cli;

import java.nio.file.Path;
import org.shapetrail.store.DataFolder;
import org.shapetrail.store.Database;
import picocli.CommandLine.Option;

/** The {@code --db FILE} option shared by every command that reads or writes a Shapetrail file. */
final class DbOption {
    @Option(names = "--db", paramLabel = "FILE",
            description = "Shapetrail file to use; it must exist (default: the file in your data folder, seeded"
                    + " with the demo academy on first use).")
    Path file;

    /** The chosen file, or the default one (copied from the demo database if it does not exist yet). */
    Path resolve() {
        if (file != null) {
            return file;
        }
        Path f = DataFolder.defaultFile();
        DataFolder.seedWithSample(f);
        return f;
    }

    /** Opens the chosen file, which must exist (nothing is created for a mistyped path), or the default one. */
    Database open() {
        return Database.openExisting(resolve());
    }
}
