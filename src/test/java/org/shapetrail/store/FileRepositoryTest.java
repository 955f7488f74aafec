package org.shapetrail.store;

import java.nio.file.Path;
import org.junit.jupiter.api.io.TempDir;

/** The repositories' contract on a local file. */
class FileRepositoryTest extends RepositoryContract {
    @TempDir
    Path dir;

    @Override
    Database fresh(String label) {
        return Database.open(dir.resolve(label + ".sqlite"));
    }
}
