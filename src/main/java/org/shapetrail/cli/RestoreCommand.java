package org.shapetrail.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shapetrail.store.Database;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code restore SOURCE}: replaces the file's whole content with a backup, after confirmation. */
@Command(name = "restore", mixinStandardHelpOptions = true)
final class RestoreCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "SOURCE", descriptionKey = "shapetrail.restore.source")
    Path source;

    @Option(names = "--yes")
    boolean yes;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        try (Database d = db.open()) {
            if (!yes && !Confirmation.ask(out, org.shapetrail.i18n.Messages.tr("cli.restore.ask", d.name(),
                    source), "RESTORE")) { // not words: the word typed to confirm
                out.println(org.shapetrail.i18n.Messages.tr("cli.nothingChanged"));
                return 1;
            }
            d.restoreFrom(source);
            out.println(org.shapetrail.i18n.Messages.tr("cli.restore.done", d.name(), source));
        }
        return 0;
    }
}
