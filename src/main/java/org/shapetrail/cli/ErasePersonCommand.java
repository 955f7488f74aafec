package org.shapetrail.cli;

import static org.shapetrail.i18n.Messages.tr;

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
                out.println(tr("cli.erase.wiped", d.name()));
                return 0;
            }
            if (personId == null) {
                throw new StoreException(tr("cli.erase.which"));
            }
            Person p = d.inTransaction(tx -> tx.people().find(personId))
                    .orElseThrow(() -> new StoreException(tr("store.noPerson", String.valueOf(personId))));
            int visits = d.inTransaction(tx -> tx.visits().ofPerson(personId).size());
            if (!yes && !Confirmation.ask(out, tr("cli.erase.ask", p.displayName(), visits, d.name()), "ERASE")) { // not words: the word typed to confirm
                out.println(tr("cli.erase.nothing"));
                return 1;
            }
            Database.Erasure e = d.erasePerson(personId);
            if (d.engine() == org.shapetrail.store.Engine.POSTGRESQL) {
                out.println(tr("cli.erase.server", p.displayName(), e.visits(), d.name()));
                return 0;
            }
            out.println(tr("cli.erase.file", p.displayName(), e.visits(), d.name()));
            var held = e.copies().stream().filter(Database.KnownCopy::stillThere).toList();
            if (held.isEmpty()) {
                out.println(tr("cli.erase.noCopies"));
            } else {
                out.println(tr("cli.erase.copies", p.displayName()));
                held.forEach(c -> out.println("  " + c.path() + " (" + c.kind() + ", " + c.madeAt() + ")"));
            }
            out.println(tr("cli.erase.outside"));
        }
        return 0;
    }
}
