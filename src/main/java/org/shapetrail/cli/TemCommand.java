package org.shapetrail.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.NoiseModel;
import org.shapetrail.noise.TemTargets;
import org.shapetrail.store.Database;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;

/** {@code tem}: each measurer's technical error of measurement per site, against the targets. */
@Command(name = "tem", mixinStandardHelpOptions = true)
final class TemCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @Mixin
    FormatOption output;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        NoiseModel model;
        try (Database d = db.open()) {
            model = NoiseModel.build(Academy.load(d), AnalysisSettings.standard().defaults());
        }
        Table t = new Table("measurer", "site", "unit", "people", "occasions", "tem", "relative_tem_percent",
                "reliability", "target_percent", "standing", "used_in_verdicts");
        for (NoiseModel.TemRow r : model.temReport()) {
            t.row(r.measurer().name(), r.site().code(), r.site().unit().symbol(), r.estimate().people(),
                    r.estimate().subjects(), Table.num(r.estimate().duplicateTem(), 3),
                    Table.num(r.estimate().relativeTemPercent(), 2),
                    r.estimate().reliability().isPresent() ? Table.num(r.estimate().reliability().getAsDouble(), 3) : "",
                    Table.num(TemTargets.target(r.site().kind()), 1), r.standing().words(),
                    r.usesDefault() ? org.shapetrail.i18n.Messages.tr("cli.tem.default", model.defaults().minPeople())
                            : org.shapetrail.i18n.Messages.tr("measurers.own"));
        }
        t.write(out, output.format);
        if (!model.interMeasurer().isEmpty()) {
            out.println();
            Table i = new Table("measurer_1", "measurer_2", "site", "unit", "pairs", "inter_tem", "relative_percent");
            for (NoiseModel.InterMeasurer m : model.interMeasurer()) {
                i.row(m.first().name(), m.second().name(), m.site().code(), m.site().unit().symbol(), m.pairs(),
                        Table.num(m.tem(), 3), Table.num(m.relativePercent(), 2));
            }
            i.write(out, output.format);
        }
        return 0;
    }
}
