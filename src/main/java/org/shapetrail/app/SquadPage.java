package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.MarkerShape;
import org.shapetrail.chart.Palette;
import org.shapetrail.chart.SomatochartBuilder;
import org.shapetrail.history.Academy;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.RatingSummary;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;

/**
 * What the squad page shows: every current member's latest rating on the chart with the squad's mean and
 * dispersion, the mean rating and SAM in words, members with their latest verdict and growth alert, and
 * the squad's training blocks.
 */
public record SquadPage(String summary, List<PersonRow> members, List<String> blocks, ChartModel chart,
                        java.util.function.DoubleFunction<ChartModel> chartAt) {
    public static SquadPage of(Loaded l, Squad squad, LocalDate day, Locale locale) {
        Academy a = l.builder().academy();
        List<PersonRow> members = new ArrayList<>();
        List<Rating> latest = new ArrayList<>();
        SomatochartBuilder chart = new SomatochartBuilder(squad.name(), locale);
        for (long id : a.membersOn(squad.id(), day)) {
            PersonHistory h = l.histories().get(id);
            members.add(WorkbenchViewModel.row(a, h));
            List<VisitResult> rated = h.rated();
            if (!rated.isEmpty()) {
                VisitResult r = rated.get(rated.size() - 1);
                latest.add(r.somatotype().rating());
                chart.point(r.somatotype().rating(), "person:" + id, h.person().displayName() + "\n"
                        + r.visit().measuredAt().toLocalDate() + "\n" + r.somatotype().rating().toDisplayString(locale),
                        Palette.series(0), MarkerShape.CIRCLE);
            }
        }
        String summary;
        if (latest.isEmpty()) {
            summary = tr("squad.none", members.size());
        } else {
            RatingSummary s = RatingSummary.of(latest);
            chart.groupMean(squad.name(), s, Palette.ACCENT);
            summary = tr("squad.summary", members.size(), s.n(), s.meanRating().toDisplayString(locale),
                    Numbers.fmt(locale, s.sam(), 2), Numbers.fmt(locale, s.sdi(), 2));
        }
        List<String> blocks = new ArrayList<>();
        for (TrainingBlock b : a.blocks()) {
            if (b.squadId() == squad.id()) {
                blocks.add(tr("squad.block", b.name(), b.startsOn(), b.endsOn()));
            }
        }
        return new SquadPage(summary, members, blocks, chart.buildAroundData(10), h -> chart.buildAroundData(10, h));
    }
}
