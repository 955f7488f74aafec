package org.shapetrail.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.shapetrail.growth.MaturityEstimate;
import org.shapetrail.growth.Velocity;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.GrowthSummary;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.measure.Site;
import org.shapetrail.store.Database;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Spec;

/** {@code growth}: stature velocity, maturity and rapid-growth alerts for a person or a squad. */
@Command(name = "growth", mixinStandardHelpOptions = true)
final class GrowthCommand implements Callable<Integer> {
    @Mixin
    DbOption db;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Lookup.Who who;

    @Mixin
    FormatOption output;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    private static String other(GrowthSummary g, String what) {
        Velocity v = g.otherVelocities().get(what);
        return v == null ? "" : Table.num(v.perYear(), 1) + " ± " + Table.num(v.sePerYear(), 1);
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        List<PersonHistory> histories = new ArrayList<>();
        try (Database d = db.open()) {
            Academy a = Academy.load(d);
            HistoryBuilder b = HistoryBuilder.of(a, AnalysisSettings.standard());
            histories.addAll(who.histories(a, b, java.time.LocalDate.now()));
        }
        Table t = new Table("id", "name", "age", "stature_cm", "velocity_cm_per_year", "velocity_se", "interval_years",
                "velocity_6_months_cm_per_year", "velocity_6_months_interval_years", "rapid_growth", "maturity_status", "maturity_offset_years", "estimated_age_at_phv", "see_years",
                "method", "observed_phv", "mid_parent_target_cm", "percent_of_target", "predicted_adult_cm",
                "percent_of_predicted", "bio_band", "sitting_height_cm_per_year", "leg_length_cm_per_year",
                "mass_kg_per_year");
        for (PersonHistory h : histories) {
            if (h.visits().isEmpty()) {
                t.row(h.person().id(), h.person().displayName(), "", "", "", "", "", "", "", "", "", "", "", "", "",
                        org.shapetrail.i18n.Messages.tr("cli.growth.noVisits"), "", "", "", "", "", "", "", "");
                continue;
            }
            var last = h.latest().orElseThrow();
            GrowthSummary g = h.growth();
            Velocity v = g.latestVelocity();
            MaturityEstimate m = g.maturity();
            t.row(h.person().id(), h.person().displayName(), Table.num(last.ageYears(), 1),
                    last.value(Site.STATURE).map(x -> Table.num(x, 1)).orElse(""),
                    v == null ? "" : Table.num(v.perYear(), 1), v == null ? "" : Table.num(v.sePerYear(), 1),
                    v == null ? "" : Table.num(v.intervalYears(), 2),
                    g.alertVelocity() == null ? "" : Table.num(g.alertVelocity().perYear(), 1),
                    g.alertVelocity() == null ? "" : Table.num(g.alertVelocity().intervalYears(), 2),
                    g.rapidGrowth() ? "yes" : "no",
                    m == null ? "" : m.status().words(), m == null ? "" : Table.num(m.offsetYears(), 2),
                    m == null ? "" : Table.num(m.ageAtPhv(), 1), m == null ? "" : Table.num(m.seeYears(), 2),
                    m == null ? "" : m.method().citation(), g.observedPhv().describe(),
                    g.midParentTargetCm() == null ? "" : Table.num(g.midParentTargetCm(), 1),
                    g.percentOfTarget() == null ? "" : Table.num(g.percentOfTarget(), 1),
                    g.predictedAdultCm() == null ? "" : Table.num(g.predictedAdultCm(), 1),
                    g.percentOfPredicted() == null ? "" : Table.num(g.percentOfPredicted(), 1),
                    g.band() == null ? "" : g.band().words(), other(g, GrowthSummary.OTHER.get(0)),
                    other(g, GrowthSummary.OTHER.get(1)), other(g, GrowthSummary.OTHER.get(2)));
        }
        t.write(out, output.format);
        if (output.format == OutputFormat.TEXT) {
            out.println();
            out.println(org.shapetrail.i18n.Messages.tr("cli.growth.maturity", MaturityEstimate.caution()));
            out.println(org.shapetrail.i18n.Messages.tr("cli.growth.rapid", org.shapetrail.growth.GrowthAlert.caution()));
        }
        return 0;
    }
}
