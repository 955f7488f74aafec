package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.MarkerShape;
import org.shapetrail.chart.Palette;
import org.shapetrail.chart.ProfileChartBuilder;
import org.shapetrail.chart.SomatochartBuilder;
import org.shapetrail.groups.BlockResult;
import org.shapetrail.groups.ComponentTest;
import org.shapetrail.history.BlockReview;
import org.shapetrail.noise.Verdict;

/**
 * What the training-block view shows: the answer in words (did the block change the group, and for
 * whom), each athlete's before→after arrow on the chart styled by verdict, the component profile before
 * and after, the table of athletes and who was left out.
 */
public record BlockPage(String summary, List<String> athletes, List<AthleteLine> rows, List<String> leftOut,
                        ChartModel chart, java.util.function.DoubleFunction<ChartModel> chartAt, ChartModel profile) {
    /** One athlete's line of the table: every cell in full. */
    public record AthleteLine(String name, String before, String after, String change, String sad, String words) {
    }

    public static BlockPage of(BlockReview r, Locale locale) {
        BlockResult g = r.result();
        String summary;
        if (g == null) {
            summary = tr("block.tooFew", r.block().name());
        } else {
            StringBuilder sb = new StringBuilder();
            sb.append(tr("block.head", r.block().name(), r.block().startsOn(), r.block().endsOn(), g.n()));
            sb.append(tr("block.beyond", g.beyondNoise(), g.n()));
            sb.append(tr("block.means", g.before().meanRating().toDisplayString(locale),
                    g.after().meanRating().toDisplayString(locale), Numbers.fmt(locale, g.sadBetweenMeans(), 2)));
            if (g.hotelling() != null) {
                sb.append(tr("block.hotelling", Numbers.fmt(locale, g.hotelling().t2(), 1), g.hotelling().df1(),
                        g.hotelling().df2(), Numbers.fmt(locale, g.hotelling().f(), 2),
                        Numbers.fmt(locale, g.hotelling().pValue(), 4)));
                sb.append(tr(g.hotelling().pValue() < 0.05 ? "block.changed" : "block.unclear"));
            }
            for (ComponentTest c : g.components()) {
                sb.append(tr("block.component", c.component().shown(), Numbers.fmt(locale, c.meanDifference(), 2),
                        Numbers.fmt(locale, c.pValue(), 3), Numbers.fmt(locale, c.effectSize(), 2)));
            }
            summary = sb.toString();
        }
        List<String> athletes = new ArrayList<>();
        List<AthleteLine> rows = new ArrayList<>();
        java.time.format.DateTimeFormatter dates = java.time.format.DateTimeFormatter.ofLocalizedDate(
                java.time.format.FormatStyle.MEDIUM).withLocale(locale);
        SomatochartBuilder chart = new SomatochartBuilder(r.block().name(), locale).withoutLegend();
        for (BlockReview.Athlete a : r.athletes()) {
            String words = a.person().displayName() + ": " + a.change().from().toDisplayString(locale) + " → "
                    + a.change().to().toDisplayString(locale) + ", " + PersonPage.words(a.change(), locale);
            athletes.add(words);
            rows.add(new AthleteLine(a.person().displayName(), a.before().visit().measuredAt().toLocalDate().format(dates)
                    + "  " + a.change().from().toDisplayString(locale), a.after().visit().measuredAt().toLocalDate()
                    .format(dates) + "  " + a.change().to().toDisplayString(locale), PersonPage.cell(a.change(), locale),
                    Numbers.fmt(locale, a.change().sad(), 2), words));
            String colour = a.change().verdict() == Verdict.BEYOND_NOISE ? Palette.series(0) : Palette.MUTED;
            chart.arrow(a.change().from(), a.change().to(), a.change().verdict(), colour);
            chart.point(a.change().to(), null, a.person().displayName() + "\n" + a.change().to().toDisplayString(locale) + "\n"
                    + a.change().verdict().shown(), colour, MarkerShape.CIRCLE);
        }
        List<String> left = r.missing().stream().map(m -> m.person().displayName() + ": " + m.reason()).toList();
        ChartModel profile = null;
        if (g != null) {
            chart.groupMean(tr("block.before"), g.before(), Palette.MUTED);
            chart.groupMean(tr("block.after"), g.after(), Palette.ACCENT);
            profile = new ProfileChartBuilder(r.block().name()).line(tr("block.before"), g.before().meanRating(), sds(r, true))
                    .line(tr("block.after"), g.after().meanRating(), sds(r, false)).build();
        }
        return new BlockPage(summary, athletes, rows, left, chart.buildAroundData(8), h -> chart.buildAroundData(8, h),
                profile);
    }

    /** Sample SD of each component over the athletes, before or after (Commons Math). */
    private static double[] sds(BlockReview r, boolean before) {
        double[] sd = new double[3];
        for (org.shapetrail.somatotype.Component c : org.shapetrail.somatotype.Component.values()) {
            double[] v = r.athletes().stream().mapToDouble(a -> (before ? a.change().from() : a.change().to()).get(c))
                    .toArray();
            sd[c.ordinal()] = v.length > 1 ? new org.apache.commons.math3.stat.descriptive.moment.StandardDeviation()
                    .evaluate(v) : 0;
        }
        return sd;
    }

}
