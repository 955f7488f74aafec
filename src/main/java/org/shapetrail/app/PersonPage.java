package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.time.format.DateTimeFormatter;
import java.time.format.FormatStyle;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.Charts;
import org.shapetrail.growth.GrowthAlert;
import org.shapetrail.growth.MaturityEstimate;
import org.shapetrail.history.GrowthSummary;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.ChangeVerdict;

/**
 * What the person page shows, computed from a history: profile lines with their cautions, the visit
 * table, the verdict of the latest change in words, and the chart. Plain values, so it is testable
 * without the toolkit.
 */
public record PersonPage(String title, List<String> profile, String latestChange, List<VisitLine> visits,
                         ChartModel chart) {
    public static PersonPage of(PersonHistory h, String squad, Locale locale) {
        DateTimeFormatter dates = DateTimeFormatter.ofLocalizedDate(FormatStyle.MEDIUM).withLocale(locale);
        List<String> profile = new ArrayList<>();
        var p = h.person();
        String age = h.latest().map(v -> tr("person.age", Numbers.fmt(locale, v.ageYears(), 1)))
                .orElse(tr("person.noVisitsYet"));
        profile.add(String.join(" · ", List.of(age, tr(p.sex() == org.shapetrail.measure.Sex.FEMALE ? "person.female"
                : "person.male"), squad.isEmpty() ? tr("person.noSquad") : squad,
                tr("person.born", p.birthDate().format(dates)))));
        GrowthSummary g = h.growth();
        boolean adult = h.latest().map(v -> v.ageYears() >= 18).orElse(false);
        g.velocity().filter(v -> !adult).ifPresent(v -> {
            String line = velocity(v, locale);
            if (v.shortInterval()) {
                // common practice: a velocity is read over six months or more (Velocity.ALERT_MIN_DAYS)
                line = tr("person.velocity.short", line, g.longerVelocity().map(l -> "; " + velocity(l, locale))
                        .orElse(""));
            }
            profile.add(tr("person.velocity", line) + (g.rapidGrowth() ? rapidMark() : ""));
            if (g.rapidGrowth()) {
                profile.add(GrowthAlert.caution());
            }
        });
        if (!adult && !g.otherVelocities().isEmpty()) {
            List<String> parts = new ArrayList<>();
            g.otherVelocities().forEach((what, v) -> parts.add(tr(what.equals(GrowthSummary.OTHER.get(2)) ? "person.other.kg"
                    : "person.other.cm", tr("growth.other." + what.replace(' ', '_')), Numbers.fmt(locale, v.perYear(), 1),
                    Numbers.fmt(locale, v.sePerYear(), 1))));
            profile.add(tr("person.also", String.join("; ", parts)));
        }
        MaturityEstimate m = g.maturity();
        if (m != null) {
            profile.add(tr("person.maturity", m.summary(), MaturityEstimate.caution()));
        }
        if (!adult) {
            profile.add(tr("person.spurt", g.observedPhv().describe())
                    + g.spurtDisagreement().map(s -> ". " + s).orElse(""));
        }
        if (g.midParentTargetCm() != null) {
            profile.add(tr("person.target", Numbers.fmt(locale, g.midParentTargetCm(), 1),
                    Numbers.fmt(locale, g.percentOfTarget(), 1)));
        }
        if (g.predictedAdultCm() != null) {
            profile.add(tr("person.predicted", Numbers.fmt(locale, g.predictedAdultCm(), 1),
                    Numbers.fmt(locale, g.percentOfPredicted(), 1), g.band().shown()));
        }
        if (!p.consent().photographs()) {
            profile.add(tr("person.photos.off"));
        }
        String latest = h.latestChange().map(c -> tr("person.since", c.from().visit().measuredAt().toLocalDate()
                .format(dates), words(c.verdict(), locale))).orElse(tr("person.noChange"));
        List<VisitLine> lines = new ArrayList<>();
        for (VisitResult r : h.visits()) {
            var change = h.changeInto(r.visit().id());
            lines.add(new VisitLine(r.visit().id(), r.visit().measuredAt().toLocalDate().format(dates),
                    Numbers.fmt(locale, r.ageYears(), 1), r.measurer().name(), r.visit().context(),
                    r.value(Site.STATURE).map(x -> Numbers.fmt(locale, x, 1)).orElse(""),
                    r.value(Site.BODY_MASS).map(x -> Numbers.fmt(locale, x, 1)).orElse(""),
                    r.rating().map(s -> s.rating().toDisplayString(locale)).orElse("—"),
                    r.rating().map(s -> s.category().shown()).orElse(r.missing().isEmpty() ? ""
                            : tr("person.notRated", r.missing().get(0).message())),
                    change.map(c -> Numbers.fmt(locale, c.verdict().sad(), 2)).orElse(""),
                    change.map(c -> cell(c.verdict(), locale)).orElse("")));
        }
        return new PersonPage(p.displayName(), profile, latest, lines, Charts.migration(h, true, locale, false));
    }

    /** E.g. "6.1 ± 1.4 cm/year over 0.30 years". */
    static String velocity(org.shapetrail.growth.Velocity v, Locale locale) {
        return tr("person.velocity.value", Numbers.fmt(locale, v.perYear(), 1), Numbers.fmt(locale, v.sePerYear(), 1),
                Numbers.fmt(locale, v.intervalYears(), 2));
    }

    /** Ends the velocity line of a person growing fast. */
    static String rapidMark() {
        return tr("person.rapid");
    }

    /**
     * E.g. "beyond noise: the change is 1.43 times the noise limit (1.00 is the limit; Imogen Tarrant's own
     * TEM). Distance moved: SAD 0.27", with a sentence when the distance alone would suggest otherwise.
     */
    public static String words(ChangeVerdict v, Locale locale) {
        String s = tr("verdict.sentence", v.verdict().shown(), v.multipleText(locale), v.basis(),
                Numbers.fmt(locale, v.sad(), 2));
        if (v.sadAloneDisagrees()) {
            s += tr(v.verdict() == org.shapetrail.noise.Verdict.BEYOND_NOISE ? "verdict.shortLong" : "verdict.longShort");
        }
        return s;
    }

    /** A narrow cell: the shown noise multiple and one word of the verdict, e.g. "1.43× beyond" (list tables). */
    public static String shortCell(ChangeVerdict v, Locale locale) {
        return v.multipleText(locale) + "× " + tr("verdict.short." + v.verdict().name());
    }

    /** A table cell: the shown noise multiple and the verdict it reads as, e.g. "1.43× beyond noise". */
    public static String cell(ChangeVerdict v, Locale locale) {
        return v.multipleText(locale) + "× " + v.verdict().shown();
    }
}
