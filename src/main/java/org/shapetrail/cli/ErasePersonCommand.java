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

/** {@code erase-person ID}: erases a person and everything that refers to them (right to erasure). */
@Command(name = "erase-person", mixinStandardHelpOptions = true,
        description = "Erase a person with all their visits, trials, ratings and memberships. Cannot be undone;"
                + " take a backup first if you may need the data.")
final class ErasePersonCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "ID", description = "The person's id (see the people command).")
    long personId;

    @Option(names = "--yes", description = "Do not ask for confirmation.")
    boolean yes;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        var out = spec.commandLine().getOut();
        try (Database d = db.open()) {
            Person p = d.inTransaction(tx -> tx.people().find(personId))
                    .orElseThrow(() -> new StoreException("There is no person with id " + personId + "."));
            int visits = d.inTransaction(tx -> tx.visits().ofPerson(personId).size());
            if (!yes && !Confirmation.ask(out, "This erases " + p.displayName() + " and " + visits
                    + " visit(s) with all trials from " + d.file() + ". It cannot be undone.", "ERASE")) {
                out.println("Nothing was erased.");
                return 1;
            }
            d.inTransaction(tx -> tx.people().erase(personId));
            out.println("Erased " + p.displayName() + " and " + visits + " visit(s).");
        }
        return 0;
    }
}
