package org.shapetrail.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shapetrail.store.Database;
import org.shapetrail.store.PersonExport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code export-person ID}: one person's complete record as JSON (right of access). */
@Command(name = "export-person", mixinStandardHelpOptions = true)
final class ExportPersonCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "ID", descriptionKey = "shapetrail.export-person.id")
    long personId;

    @Option(names = "--out", paramLabel = "FILE")
    Path out;

    @picocli.CommandLine.Mixin
    OverwriteOption overwrite;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        try (Database d = db.open()) {
            String json = d.inTransaction(tx -> PersonExport.toJson(tx, personId));
            if (out == null) {
                spec.commandLine().getOut().print(json);
            } else {
                org.shapetrail.OutputFiles.refuseExisting(java.util.List.of(out), overwrite.overwrite,
                        OverwriteOption.how());
                org.shapetrail.OutputFiles.writeWhole(out, s -> s.write(json.getBytes(StandardCharsets.UTF_8)));
                spec.commandLine().getOut().println(org.shapetrail.i18n.Messages.tr("cli.exportPerson.wrote",
                        String.valueOf(personId), out));
            }
        }
        return 0;
    }
}
