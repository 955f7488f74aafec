package org.shapetrail.cli;

import static org.shapetrail.i18n.Messages.tr;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.shapetrail.groups.BlockResult;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.BlockReview;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.store.Database;
import org.shapetrail.store.StoreException;
import org.shapetrail.store.TrainingBlock;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code block-report}: did a training block change the squad's physique, and whose? */
@Command(name = "block-report", mixinStandardHelpOptions = true)
final class BlockReportCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Option(names = "--block", paramLabel = "NAME")
    String blockName;

    @Option(names = "--window", paramLabel = "DAYS", defaultValue = "21")
    int window;

    @Mixin
    FormatOption output;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        BlockReview r;
        String squad;
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            List<TrainingBlock> blocks = a.blocks();
            if (blocks.isEmpty()) {
                throw new StoreException(tr("cli.blocks.none"));
            }
            TrainingBlock b = blockName == null ? blocks.get(blocks.size() - 1) : BlockCommand.named(d, blockName);
            r = BlockReview.of(HistoryBuilder.of(a, AnalysisSettings.standard()), b, window);
            squad = a.squad(b.squadId()).map(s -> s.name()).orElse("");
        }
        Table athletes = new Table("name", "before_date", "after_date", "before", "after", "noise_multiple",
                "verdict", "sad", "meso_change", "meso_mdc95", "repeatability");
        for (BlockReview.Athlete x : r.athletes()) {
            athletes.row(x.person().displayName(), x.before().visit().measuredAt().toLocalDate(),
                    x.after().visit().measuredAt().toLocalDate(), x.change().from().toDisplayString(),
                    x.change().to().toDisplayString(), x.change().multipleText(java.util.Locale.ROOT),
                    x.change().verdict().words(), Table.num(x.change().sad(), 2), Table.num(x.change().change()[1], 2),
                    Table.num(x.change().mdc95()[1], 2), x.change().basis());
        }
        if (output.format == OutputFormat.TEXT) {
            out.println(tr("cli.report.head", r.block().name(), squad, r.block().startsOn(), r.block().endsOn(), window));
            out.println();
        }
        athletes.write(out, output.format);
        out.println();
        Table missing = new Table("left_out", "reason");
        for (BlockReview.Missing m : r.missing()) {
            missing.row(m.person().displayName(), m.reason());
        }
        missing.write(out, output.format);
        BlockResult g = r.result();
        if (g != null) {
            out.println();
            Table.componentTests(g.components(), 0, "component", "mean_change", "t", "df", "p", "effect_size_dz",
                    "effect_ci_low", "effect_ci_high").write(out, output.format);
            out.println();
            Table s = new Table("measure", "value");
            s.row(tr("cli.report.both"), g.n());
            s.row(tr("cli.report.meanBefore"), g.before().meanRating().toDisplayString());
            s.row(tr("cli.report.meanAfter"), g.after().meanRating().toDisplayString());
            s.row(tr("cli.report.samBefore"), Table.num(g.before().sam(), 2));
            s.row(tr("cli.report.samAfter"), Table.num(g.after().sam(), 2));
            s.row(tr("cli.report.sadMeans"), Table.num(g.sadBetweenMeans(), 2));
            if (g.hotelling() != null) {
                s.row(tr("cli.report.hotelling"), Table.num(g.hotelling().t2(), 2));
                s.row("F (" + g.hotelling().df1() + ", " + g.hotelling().df2() + ")", // not words: the F statistic's notation
                        Table.num(g.hotelling().f(), 2));
                s.row("p", Table.num(g.hotelling().pValue(), 4));
            }
            s.row(tr("cli.report.beyond"), tr("cli.of", g.beyondNoise(), g.n()));
            s.write(out, output.format);
        }
        return 0;
    }
}
