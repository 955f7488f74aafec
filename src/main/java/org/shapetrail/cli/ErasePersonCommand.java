package org.shapetrail.cli;

import java.util.concurrent.Callable;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.StoreException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code erase-person ID}: erases a person and everything that refers to them (right to erasure), leaves
 * no trace of them in the file, its WAL or journal, and names the copies made earlier that still hold them.
 */
@Command(name = "erase-person", mixinStandardHelpOptions = true)
final class ErasePersonCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", arity = "0..1", paramLabel = "ID", descriptionKey = "shapetrail.erase-person.id")
    Long personId;

    @Option(names = "--yes")
    boolean yes;

    @Option(names = "--wipe-only")
    boolean wipeOnly;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        try (Database d = db.open()) {
            if (wipeOnly) {
                d.wipeFreedSpace();
                out.println("Wiped the free space of " + d.name() + ".");
                return 0;
            }
            if (personId == null) {
                throw new StoreException("Name the person's id (see the people command), or use --wipe-only.");
            }
            Person p = d.inTransaction(tx -> tx.people().find(personId))
                    .orElseThrow(() -> new StoreException("There is no person with id " + personId + "."));
            int visits = d.inTransaction(tx -> tx.visits().ofPerson(personId).size());
            if (!yes && !Confirmation.ask(out, "This erases " + p.displayName() + " and " + visits
                    + " visit(s) with all trials from " + d.name() + ". It cannot be undone.", "ERASE")) {
                out.println("Nothing was erased.");
                return 1;
            }
            Database.Erasure e = d.erasePerson(personId);
            if (d.engine() == org.shapetrail.store.Engine.POSTGRESQL) {
                out.println("Erased " + p.displayName() + " and " + e.visits() + " visit(s) from " + d.name()
                        + ", with their lines of the audit trail (one line records that an erasure happened), and"
                        + " rewrote the tables. The server's write-ahead log, its archives and replicas, and dumps made"
                        + " before may still hold them (docs/server.md).");
                return 0;
            }
            out.println("Erased " + p.displayName() + " and " + e.visits() + " visit(s); no trace of them is left in "
                    + d.name() + " or its journal.");
            var held = e.copies().stream().filter(Database.KnownCopy::stillThere).toList();
            if (held.isEmpty()) {
                out.println("Shapetrail knows of no earlier copy of this file that still exists.");
            } else {
                out.println("Copies made earlier still hold " + p.displayName() + "'s data; erasure does not reach"
                        + " them. Delete or destroy them if the data must go everywhere:");
                held.forEach(c -> out.println("  " + c.path() + " (" + c.kind() + ", " + c.madeAt() + ")"));
            }
            out.println("Copies made outside Shapetrail (other backups, exports, letters sent) are not known to it.");
        }
        return 0;
    }
}
