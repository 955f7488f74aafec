package org.shapetrail.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code changes ID}: each change of a person's somatotype with its verdict against measurement noise. */
@Command(name = "changes", mixinStandardHelpOptions = true)
final class ChangesCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "ID", descriptionKey = "shapetrail.changes.id")
    long personId;

    @Mixin
    FormatOption output;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PersonHistory h;
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            Person p = Lookup.person(a, personId);
            h = HistoryBuilder.of(a, AnalysisSettings.standard()).history(p);
        }
        Table t = new Table("from", "to", "from_rating", "to_rating", "noise_multiple", "verdict", "sad", "d2", "p",
                "endo_change", "endo_mdc95", "endo_beyond_mdc95", "meso_change", "meso_mdc95", "meso_beyond_mdc95",
                "ecto_change", "ecto_mdc95", "ecto_beyond_mdc95", "repeatability");
        for (PersonHistory.Change c : h.changes()) {
            add(t, c.from().visit().measuredAt().toLocalDate().toString(),
                    c.to().visit().measuredAt().toLocalDate().toString(), c.verdict());
        }
        if (h.firstToLast() != null && h.changes().size() > 1) {
            var rated = h.rated();
            add(t, org.shapetrail.i18n.Messages.tr("cli.changes.first", rated.get(0).visit().measuredAt().toLocalDate()),
                    org.shapetrail.i18n.Messages.tr("cli.changes.last", rated.get(rated.size() - 1).visit().measuredAt()
                            .toLocalDate()), h.firstToLast());
        }
        if (output.format == OutputFormat.TEXT) {
            out.println(org.shapetrail.i18n.Messages.tr("cli.changes.head", h.person().displayName(), h.rated().size()));
        }
        t.write(out, output.format);
        return 0;
    }

    private static void add(Table t, String from, String to, ChangeVerdict v) {
        t.row(from, to, v.from().toDisplayString(), v.to().toDisplayString(), v.multipleText(java.util.Locale.ROOT),
                v.verdict().words(), Table.num(v.sad(), 2), Table.num(v.d2(), 2), Table.num(v.pValue(), 4),
                Table.num(v.change()[0], 2), Table.num(v.mdc95()[0], 2), yesNo(v.componentBeyond(0)),
                Table.num(v.change()[1], 2), Table.num(v.mdc95()[1], 2), yesNo(v.componentBeyond(1)),
                Table.num(v.change()[2], 2), Table.num(v.mdc95()[2], 2), yesNo(v.componentBeyond(2)), v.basis());
    }

    private static String yesNo(boolean b) {
        return b ? "yes" : "no";
    }
}
