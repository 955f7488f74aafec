package org.shapetrail.cli;

import java.io.PrintWriter;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.shapetrail.groups.GroupComparison;
import org.shapetrail.groups.GroupTests;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.VisitResult;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.store.Database;
import org.shapetrail.store.Squad;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code compare-squads A B}: two independent groups' latest ratings compared. */
@Command(name = "compare-squads", mixinStandardHelpOptions = true)
final class CompareSquadsCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Parameters(index = "0", paramLabel = "SQUAD_A")
    String first;

    @Parameters(index = "1", paramLabel = "SQUAD_B")
    String second;

    @Option(names = "--on", paramLabel = "DATE")
    LocalDate on;

    @Mixin
    FormatOption output;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        LocalDate day = on == null ? LocalDate.now() : on;
        GroupComparison c;
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            HistoryBuilder b = HistoryBuilder.of(a, AnalysisSettings.standard());
            c = GroupTests.compare(latest(a, b, first, day), latest(a, b, second, day));
        }
        Table.componentTests(c.components(), 1, "component", "difference_a_minus_b", "welch_t", "df", "p", "cohens_d",
                "d_ci_low", "d_ci_high").write(out, output.format);
        out.println();
        Table s = new Table("measure", "value");
        s.row(org.shapetrail.i18n.Messages.tr("cli.compare.group", first), c.first().n() + ", " + c.first().meanRating().toDisplayString() + ", "
                + Table.num(c.first().sam(), 2));
        s.row(org.shapetrail.i18n.Messages.tr("cli.compare.group", second), c.second().n() + ", " + c.second().meanRating().toDisplayString() + ", "
                + Table.num(c.second().sam(), 2));
        s.row(org.shapetrail.i18n.Messages.tr("cli.report.sadMeans"), Table.num(c.sadBetweenMeans(), 2));
        if (c.hotelling() != null) {
            s.row(org.shapetrail.i18n.Messages.tr("cli.compare.hotelling"), Table.num(c.hotelling().t2(), 2));
            s.row("F (" + c.hotelling().df1() + ", " + c.hotelling().df2() + ")", // not words: the F statistic's notation
                    Table.num(c.hotelling().f(), 2));
            s.row("p", Table.num(c.hotelling().pValue(), 4));
        }
        s.write(out, output.format);
        return 0;
    }

    private static List<Rating> latest(Academy a, HistoryBuilder b, String name, LocalDate day) {
        Squad s = Lookup.squad(a, name);
        List<Rating> out = new ArrayList<>();
        for (long id : a.membersOn(s.id(), day)) {
            List<VisitResult> rated = b.history(a.person(id).orElseThrow()).rated().stream()
                    .filter(r -> !r.visit().measuredAt().toLocalDate().isAfter(day)).toList();
            if (!rated.isEmpty()) {
                out.add(rated.get(rated.size() - 1).somatotype().rating());
            }
        }
        return out;
    }
}
