package org.shapetrail.cli;

import java.io.PrintWriter;
import java.time.LocalDate;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.shapetrail.store.AuditEntry;
import org.shapetrail.store.Database;
import org.shapetrail.store.Engine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code trail}: the audit trail of a server's record, for a person, a visit or a range of days. */
@Command(name = "trail", mixinStandardHelpOptions = true)
final class TrailCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    static final class Which {
        @Option(names = "--person", paramLabel = "ID")
        Long person;

        @Option(names = "--visit", paramLabel = "ID")
        Long visit;

        @Option(names = "--from", paramLabel = "DATE")
        LocalDate from;
    }

    @ArgGroup(exclusive = true, multiplicity = "1")
    Which which;

    @Option(names = "--to", paramLabel = "DATE")
    LocalDate to;

    @Mixin
    FormatOption format;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        try (Database d = db.open()) {
            if (d.engine() == Engine.SQLITE) {
                spec.commandLine().getErr().println(org.shapetrail.i18n.Messages.tr("cli.trail.file"));
                return 1;
            }
            List<AuditEntry> lines = d.inTransaction(tx -> which.person != null ? tx.trail().ofPerson(which.person)
                    : which.visit != null ? tx.trail().ofVisit(which.visit)
                    : tx.trail().between(which.from, to == null ? LocalDate.now() : to));
            if (format.format == OutputFormat.CSV) {
                try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').build())) {
                    csv.printRecord("at", "who", "action", "what", "person_id", "visit_id", "changes");
                    for (AuditEntry e : lines) {
                        csv.printRecord(e.at(), e.who(), e.action(), e.what(), e.personId(), e.visitId(),
                                String.join("; ", e.changes()));
                    }
                }
                return 0;
            }
            out.print(AuditEntry.asText(lines));
        }
        return 0;
    }
}
