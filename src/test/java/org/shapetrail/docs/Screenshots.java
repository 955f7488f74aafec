package org.shapetrail.docs;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Where tests write the images a person looks at: target/screenshots by default, or the folder named by
 * {@code -Dshapetrail.screenshots=docs/screenshots} when refreshing the documentation.
 */
public final class Screenshots {
    private Screenshots() {
    }

    public static Path folder() throws java.io.IOException {
        Path p = Path.of(System.getProperty("shapetrail.screenshots", "target/screenshots"));
        Files.createDirectories(p);
        return p;
    }
}
