package org.shapetrail.cli;

import picocli.CommandLine.Option;

/** {@code --overwrite}: the only way a command replaces a file that exists already. */
final class OverwriteOption {
    static final String HOW = "add --overwrite";

    @Option(names = "--overwrite")
    boolean overwrite;
}
