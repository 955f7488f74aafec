package org.shapetrail.cli;

import picocli.CommandLine.Option;

/** {@code --overwrite}: the only way a command replaces a file that exists already. */
final class OverwriteOption {
    static final String HOW = "add --overwrite";

    @Option(names = "--overwrite", description = "Replace output files that exist already (otherwise nothing is"
            + " written and the existing files are named).")
    boolean overwrite;
}
