package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.noise.Verdict;

/** Ready-made charts of the product, built from computed histories. */
public final class Charts {
    private Charts() {
    }

    /** A person's stature and mass against age, with velocities, the observed curve and age at PHV. */
    public static ChartModel growth(PersonHistory h) {
        List<GrowthChartBuilder.Visit> vs = new ArrayList<>();
        for (VisitResult r : h.visits()) {
            vs.add(new GrowthChartBuilder.Visit(r.ageYears(), r.value(org.shapetrail.measure.Site.STATURE).orElse(null),
                    r.value(org.shapetrail.measure.Site.BODY_MASS).orElse(null)));
        }
        GrowthChartBuilder b = new GrowthChartBuilder(h.person().displayName()).visits(vs);
        var phv = h.growth().observedPhv();
        if (phv.status() == org.shapetrail.growth.ObservedPhv.Status.FOUND) {
            b.curve(phv.curve()).ageAtPhv(phv.ageAtPeak(), phv.seAgeAtPeak(), org.shapetrail.i18n.Messages.tr("chart.phv.observed"));
        } else if (h.growth().maturity() != null) {
            b.ageAtPhv(h.growth().maturity().ageAtPhv(), h.growth().maturity().seeYears(), org.shapetrail.i18n.Messages.tr("chart.phv.estimated"));
        }
        return b.build();
    }

    /** A person's migration path: every rated visit, noise ellipses, steps styled by verdict. */
    public static ChartModel migration(PersonHistory h, boolean ellipses, java.util.Locale locale) {
        return migration(h, ellipses, locale, true);
    }

    /** As above; {@code legend} false leaves the key out (the screen draws it beside the chart). */
    public static ChartModel migration(PersonHistory h, boolean ellipses, java.util.Locale locale, boolean legend) {
        return migration(h, ellipses, locale, legend, false);
    }

    /** As above; {@code regions} adds the category regions. */
    public static ChartModel migration(PersonHistory h, boolean ellipses, java.util.Locale locale, boolean legend,
                                       boolean regions) {
        return migration(h, ellipses, locale, legend, regions, 520);
    }

    /** As above, with the labels laid out for a chart {@code heightPt} tall (see ChartCanvas#setLayout). */
    public static ChartModel migration(PersonHistory h, boolean ellipses, java.util.Locale locale, boolean legend,
                                       boolean regions, double heightPt) {
        List<SomatochartBuilder.PathPoint> pts = new ArrayList<>();
        for (VisitResult r : h.rated()) {
            pts.add(new SomatochartBuilder.PathPoint(r.visit().measuredAt().toLocalDate(), r.somatotype().rating(),
                    r.covariance(), "visit:" + r.visit().id()));
        }
        List<Verdict> verdicts = h.changes().stream().map(c -> c.verdict().verdict()).toList();
        SomatochartBuilder b = new SomatochartBuilder(h.person().displayName(), locale);
        if (!legend) {
            b.withoutLegend();
        }
        if (regions) {
            b.withCategoryRegions();
        }
        return b.path(h.person().displayName(), pts, verdicts, ellipses).buildAroundData(7, heightPt);
    }
}
