package org.shapetrail.cli;

import java.io.PrintWriter;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;

/** {@code people}: lists everyone in the file with their id and number of visits. */
@Command(name = "people", mixinStandardHelpOptions = true)
final class PeopleCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        try (Database d = db.open()) {
            record Row(List<Person> people, Map<Long, Integer> visits) {
            }
            Row row = d.inTransaction(tx -> {
                Map<Long, Integer> counts = new HashMap<>();
                for (Visit v : tx.visits().all()) {
                    counts.merge(v.personId(), 1, Integer::sum);
                }
                return new Row(tx.people().all(), counts);
            });
            out.printf("%-6s %-32s %-3s %-10s %s%n", "id", "name", "sex", "born", "visits");
            for (Person p : row.people()) {
                out.printf("%-6d %-32s %-3s %-10s %d%n", p.id(), p.displayName(), p.sex().code(), p.birthDate(),
                        row.visits().getOrDefault(p.id(), 0));
            }
        }
        return 0;
    }
}
