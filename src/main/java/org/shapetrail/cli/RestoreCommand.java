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
            if (!yes && !Confirmation.ask(out, "Everything in " + d.name() + " will be replaced by " + source + ".",
                    "RESTORE")) {
                out.println("Nothing was changed.");
                return 1;
            }
            d.restoreFrom(source);
            out.println("Restored " + d.name() + " from " + source + ".");
        }
        return 0;
    }
}
