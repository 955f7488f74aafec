package org.shapetrail.cli;

import java.nio.file.Path;
import org.shapetrail.store.DataFolder;
import org.shapetrail.store.Database;
import picocli.CommandLine.Option;

/** The {@code --db} option shared by every command that reads or writes a Shapetrail record. */
final class DbOption {
    @Option(names = "--db", paramLabel = "FILE|URI")
    String target;

    /** Opens the chosen file (which must exist: nothing is created for a mistyped path) or server, or the default file. */
    Database open() {
        if (target != null) {
            return Database.open(target);
        }
        Path f = DataFolder.defaultFile();
        DataFolder.seedWithSample(f);
        return Database.openExisting(f);
    }
}
