package org.shapetrail.app;

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
        String age = h.latest().map(v -> Numbers.fmt(locale, v.ageYears(), 1) + " years").orElse("no visits yet");
        profile.add(String.join(" · ", List.of(age, p.sex() == org.shapetrail.measure.Sex.FEMALE ? "female" : "male",
                squad.isEmpty() ? "no current squad" : squad, "born " + p.birthDate().format(dates))));
        GrowthSummary g = h.growth();
        boolean adult = h.latest().map(v -> v.ageYears() >= 18).orElse(false);
        g.velocity().filter(v -> !adult).ifPresent(v -> {
            String line = "Stature velocity " + velocity(v, locale);
            if (v.shortInterval()) {
                // common practice: a velocity is read over six months or more (Velocity.ALERT_MIN_DAYS)
                line += " (under six months: a wide error, never the alert on its own)"
                        + g.longerVelocity().map(l -> "; " + velocity(l, locale)).orElse("");
            }
            profile.add(line + (g.rapidGrowth() ? " — RAPID GROWTH" : ""));
            if (g.rapidGrowth()) {
                profile.add(GrowthAlert.CAUTION);
            }
        });
        if (!adult && !g.otherVelocities().isEmpty()) {
            List<String> parts = new ArrayList<>();
            g.otherVelocities().forEach((what, v) -> parts.add(what + " " + Numbers.fmt(locale, v.perYear(), 1) + " ± "
                    + Numbers.fmt(locale, v.sePerYear(), 1) + (what.equals("body mass") ? " kg" : " cm") + "/year"));
            profile.add("Also: " + String.join("; ", parts));
        }
        MaturityEstimate m = g.maturity();
        if (m != null) {
            profile.add("Maturity: " + m.summary() + ". " + MaturityEstimate.CAUTION);
        }
        if (!adult) {
            profile.add("Observed growth spurt: " + g.observedPhv().describe()
                    + g.spurtDisagreement().map(s -> ". " + s).orElse(""));
        }
        if (g.midParentTargetCm() != null) {
            profile.add("Mid-parent target height " + Numbers.fmt(locale, g.midParentTargetCm(), 1) + " cm; "
                    + Numbers.fmt(locale, g.percentOfTarget(), 1) + " % reached (Tanner et al. 1970; a guide only)");
        }
        if (g.predictedAdultCm() != null) {
            profile.add("Predicted adult stature " + Numbers.fmt(locale, g.predictedAdultCm(), 1) + " cm (entered); "
                    + Numbers.fmt(locale, g.percentOfPredicted(), 1) + " % reached — bio-banding band "
                    + g.band().words() + " (common practice; a guide only)");
        }
        if (!p.consent().photographs()) {
            profile.add("Photographs: off (no consent recorded)");
        }
        String latest = h.latestChange().map(c -> "Since " + c.from().visit().measuredAt().toLocalDate().format(dates)
                + ": " + words(c.verdict(), locale)).orElse("No change to judge yet: fewer than two rated visits.");
        List<VisitLine> lines = new ArrayList<>();
        for (VisitResult r : h.visits()) {
            var change = h.changeInto(r.visit().id());
            lines.add(new VisitLine(r.visit().id(), r.visit().measuredAt().toLocalDate().format(dates),
                    Numbers.fmt(locale, r.ageYears(), 1), r.measurer().name(), r.visit().context(),
                    r.value(Site.STATURE).map(x -> Numbers.fmt(locale, x, 1)).orElse(""),
                    r.value(Site.BODY_MASS).map(x -> Numbers.fmt(locale, x, 1)).orElse(""),
                    r.rating().map(s -> s.rating().toDisplayString()).orElse("—"),
                    r.rating().map(s -> s.category().displayName()).orElse(r.missing().isEmpty() ? ""
                            : "not rated: " + r.missing().get(0).message()),
                    change.map(c -> Numbers.fmt(locale, c.verdict().sad(), 2)).orElse(""),
                    change.map(c -> cell(c.verdict(), locale)).orElse("")));
        }
        return new PersonPage(p.displayName(), profile, latest, lines, Charts.migration(h, true, locale, false));
    }

    /** E.g. "6.1 ± 1.4 cm/year over 0.30 years". */
    static String velocity(org.shapetrail.growth.Velocity v, Locale locale) {
        return Numbers.fmt(locale, v.perYear(), 1) + " ± " + Numbers.fmt(locale, v.sePerYear(), 1) + " cm/year over "
                + Numbers.fmt(locale, v.intervalYears(), 2) + " years";
    }

    /**
     * E.g. "beyond noise: the change is 1.43 times the noise limit (1.00 is the limit; Imogen Tarrant's own
     * TEM). Distance moved: SAD 0.27", with a sentence when the distance alone would suggest otherwise.
     */
    public static String words(ChangeVerdict v, Locale locale) {
        String s = v.verdict().words() + ": the change is " + v.multipleText(locale) + " times the noise limit (1.00 is"
                + " the limit; " + v.basis() + "). Distance moved: SAD " + Numbers.fmt(locale, v.sad(), 2);
        if (v.sadAloneDisagrees()) {
            s += v.verdict() == org.shapetrail.noise.Verdict.BEYOND_NOISE
                    ? ". A short move, but in a direction the measurer's repeat error rarely takes"
                    : ". A long move, but in the direction the measurer's repeat error takes most";
        }
        return s;
    }

    /** A narrow cell: the shown noise multiple and one word of the verdict, e.g. "1.43× beyond" (list tables). */
    public static String shortCell(ChangeVerdict v, Locale locale) {
        return v.multipleText(locale) + "× " + switch (v.verdict()) {
            case BEYOND_NOISE -> "beyond";
            case BORDERLINE -> "borderline";
            case WITHIN_NOISE -> "within";
        };
    }

    /** A table cell: the shown noise multiple and the verdict it reads as, e.g. "1.43× beyond noise". */
    public static String cell(ChangeVerdict v, Locale locale) {
        return v.multipleText(locale) + "× " + v.verdict().words();
    }
}
