package org.shapetrail.cli;

import picocli.CommandLine.Option;

/** {@code --overwrite}: the only way a command replaces a file that exists already. */
final class OverwriteOption {
    static String how() {
        return org.shapetrail.i18n.Messages.tr("cli.overwrite.how");
    }

    @Option(names = "--overwrite")
    boolean overwrite;
}
