package org.shapetrail.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shapetrail.exchange.ImportOptions;
import org.shapetrail.exchange.ImportPlan;
import org.shapetrail.exchange.Importer;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.store.Database;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code import FILE.csv}: a dry run by default; {@code --commit} writes, all or nothing. */
@Command(name = "import", mixinStandardHelpOptions = true)
final class ImportCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "FILE.csv")
    Path file;

    @Option(names = "--commit")
    boolean commit;

    @Option(names = "--create-missing")
    boolean createMissing;

    @Option(names = "--decimal-comma")
    boolean decimalComma;

    @Option(names = "--decimal-point")
    boolean decimalPoint;

    @Option(names = "--month-first")
    boolean monthFirst;

    @Option(names = "--show", defaultValue = "rejected")
    String show;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        DecimalStyle d = decimalComma ? DecimalStyle.COMMA : decimalPoint ? DecimalStyle.POINT : null;
        ImportOptions o = new ImportOptions(d, monthFirst, createMissing);
        try (Database database = db.open()) {
            // with --commit the file is read, checked and written in one pass, rolled back on any rejection
            ImportPlan plan = commit ? Importer.importFile(database, file, o, null)
                    : Importer.dryRun(file, Academy.load(database), o);
            if (!plan.fileProblems().isEmpty()) {
                spec.commandLine().getErr().println(plan.summary());
                return 2;
            }
            if (show.equals("all")) {
                for (ImportPlan.RowReport r : plan.rows()) {
                    out.println(org.shapetrail.i18n.Messages.tr("reading.line", String.valueOf(r.line()))
                            + r.outcome().words() + (r.reason().isEmpty() ? "" : " — " + r.reason()));
                }
            } else if (show.equals("rejected")) {
                plan.findings().forEach(f -> out.println(f.describe()));
            }
            out.println(plan.summary());
            if (!commit) {
                out.println(org.shapetrail.i18n.Messages.tr("cli.import.dryRun"));
                return plan.canCommit() ? 0 : 1;
            }
            if (!plan.canCommit()) {
                out.println(org.shapetrail.i18n.Messages.tr("cli.import.refused"));
                return 1;
            }
            out.println(org.shapetrail.i18n.Messages.tr("import.done", plan.written()));
        }
        return 0;
    }
}
