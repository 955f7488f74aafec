package org.shapetrail.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.Database;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code backup TARGET}: a consistent copy of the file, safe while the app has it open. */
@Command(name = "backup", mixinStandardHelpOptions = true)
final class BackupCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "TARGET", descriptionKey = "shapetrail.backup.target")
    Path target;

    @picocli.CommandLine.Mixin
    OverwriteOption overwrite;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        org.shapetrail.OutputFiles.refuseExisting(java.util.List.of(target), overwrite.overwrite, OverwriteOption.how());
        try (Database d = db.open()) {
            d.backupTo(target);
            String digest = ContentDigest.of(d);
            try (Database copy = Database.open(target)) {
                if (!digest.equals(ContentDigest.of(copy))) {
                    spec.commandLine().getErr().println(org.shapetrail.i18n.Messages.tr("cli.backup.mismatch", target));
                    return 1;
                }
            }
            spec.commandLine().getOut().println(org.shapetrail.i18n.Messages.tr("cli.backup.done", d.name(),
                    target.toAbsolutePath()));
        }
        return 0;
    }
}
