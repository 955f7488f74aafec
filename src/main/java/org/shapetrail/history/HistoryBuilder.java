package org.shapetrail.history;

import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.shapetrail.growth.DecimalAge;
import org.shapetrail.growth.MaturityEstimate;
import org.shapetrail.growth.MaturityMethod;
import org.shapetrail.growth.MaturityOffset;
import org.shapetrail.growth.ObservedPhv;
import org.shapetrail.growth.TargetHeight;
import org.shapetrail.growth.Velocity;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.noise.ChangeAssessment;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.ErrorProfile;
import org.shapetrail.noise.ErrorPropagation;
import org.shapetrail.noise.SiteUncertainty;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.SomatotypeRater;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/** Computes a {@link PersonHistory} from raw visits with the file's noise model and the user's settings. */
public final class HistoryBuilder {
    /** Maturity offset is reported up to this age (the equations were built on juniors). */
    public static final double MAX_MATURITY_AGE = 18.0;

    private final Academy academy;
    private final NoiseModel noise;
    private final AnalysisSettings settings;

    public HistoryBuilder(Academy academy, NoiseModel noise, AnalysisSettings settings) {
        this.academy = academy;
        this.noise = noise;
        this.settings = settings;
    }

    /** Builds the model of a whole file with the given settings. */
    public static HistoryBuilder of(Academy academy, AnalysisSettings settings) {
        return new HistoryBuilder(academy, NoiseModel.build(academy, settings.defaults()), settings);
    }

    public NoiseModel noise() {
        return noise;
    }

    public Academy academy() {
        return academy;
    }

    public AnalysisSettings settings() {
        return settings;
    }

    /** One visit computed. */
    public VisitResult result(Person p, Visit v) {
        VisitEvaluation ev = VisitCheck.evaluate(v.trials());
        SomatotypeRater.Outcome o = SomatotypeRater.rate(v.trials(), settings.endomorphy());
        ErrorProfile profile = noise.profileOf(v.measurerId());
        Map<Site, Double> se = SiteUncertainty.of(ev.outcomes(), profile, settings.biological());
        ComponentCovariance cov = ComponentCovariance.ZERO;
        List<Problem> missing = List.of();
        if (o.rated()) {
            cov = ErrorPropagation.covariance(HeathCarterInput.fromFinalValues(ev.finalValues()), se,
                    settings.endomorphy());
        } else {
            missing = o.problems();
        }
        double age = DecimalAge.years(p.birthDate(), v.measuredAt().toLocalDate());
        return new VisitResult(v, academy.measurer(v.measurerId()), age, ev.finalValues(),
                o.rated() ? o.somatotype() : null, missing, cov, profile.describe(HeathCarterInput.SITES), se);
    }

    /** The whole history of a person. */
    public PersonHistory history(Person p) {
        List<VisitResult> results = new ArrayList<>();
        for (Visit v : academy.visitsOf(p.id())) {
            results.add(result(p, v));
        }
        List<PersonHistory.Change> changes = new ArrayList<>();
        VisitResult previous = null;
        VisitResult first = null;
        for (VisitResult r : results) {
            if (r.somatotype() == null) {
                continue;
            }
            if (first == null) {
                first = r;
            }
            if (previous != null) {
                changes.add(new PersonHistory.Change(previous, r, verdict(previous, r)));
            }
            previous = r;
        }
        ChangeVerdict firstToLast = first != null && previous != first ? verdict(first, previous) : null;
        return new PersonHistory(p, results, changes, firstToLast, growth(p, results));
    }

    /** The verdict on the change between two rated visits (measurers possibly different). */
    public ChangeVerdict verdict(VisitResult a, VisitResult b) {
        String basis = a.basis().equals(b.basis()) ? a.basis() : org.shapetrail.i18n.Messages.tr("basis.both", a.basis(),
                b.basis());
        return ChangeAssessment.assess(a.somatotype().rating(), a.covariance(), b.somatotype().rating(),
                b.covariance(), basis);
    }

    private GrowthSummary growth(Person p, List<VisitResult> results) {
        List<VisitResult> withStature = results.stream().filter(r -> r.value(Site.STATURE).isPresent()).toList();
        Velocity velocity = statureVelocity(withStature, Velocity.MIN_READABLE_DAYS);
        Velocity alertVelocity = statureVelocity(withStature, Velocity.ALERT_MIN_DAYS);
        MaturityEstimate maturity = null;
        Double target = null;
        Double percent = null;
        Double predictedPercent = null;
        if (!withStature.isEmpty()) {
            VisitResult last = withStature.get(withStature.size() - 1);
            double stature = last.finalValues().get(Site.STATURE);
            if (last.ageYears() < MAX_MATURITY_AGE && last.ageYears() >= 8) {
                Double sh = last.finalValues().get(Site.SITTING_HEIGHT);
                Double mass = last.finalValues().get(Site.BODY_MASS);
                if (sh != null && mass != null) {
                    maturity = MaturityOffset.estimate(MaturityMethod.MIRWALD_2002, p.sex(), last.ageYears(), stature,
                            sh, mass);
                } else if (sh != null || p.sex() == org.shapetrail.measure.Sex.FEMALE) {
                    maturity = MaturityOffset.estimate(MaturityMethod.MOORE_2015, p.sex(), last.ageYears(), stature,
                            sh == null ? Double.NaN : sh, Double.NaN);
                }
            }
            if (p.predictedAdultStatureCm() != null) {
                predictedPercent = TargetHeight.percentAttained(stature, p.predictedAdultStatureCm());
            }
            if (p.fatherStatureCm() != null && p.motherStatureCm() != null) {
                target = TargetHeight.midParent(p.sex(), p.fatherStatureCm(), p.motherStatureCm());
                percent = TargetHeight.percentAttained(stature, target);
            }
        }
        List<ObservedPhv.Point> points = new ArrayList<>();
        for (VisitResult r : withStature) {
            points.add(new ObservedPhv.Point(r.ageYears(), r.finalValues().get(Site.STATURE)));
        }
        GrowthSummary.PhvFit phv = new GrowthSummary.PhvFit(points);
        boolean rapid = alertVelocity != null && last(results).ageYears() < MAX_MATURITY_AGE
                && settings.alert().raisedBy(alertVelocity);
        return new GrowthSummary(velocity, alertVelocity, maturity, phv, target, percent, rapid, p.predictedAdultStatureCm(),
                predictedPercent, otherVelocities(results));
    }

    /** Stature velocity from the latest visit back to the most recent one at least {@code minDays} earlier, or null. */
    private static Velocity statureVelocity(List<VisitResult> withStature, int minDays) {
        if (withStature.isEmpty()) {
            return null;
        }
        VisitResult last = withStature.get(withStature.size() - 1);
        for (int i = withStature.size() - 2; i >= 0; i--) {
            VisitResult earlier = withStature.get(i);
            long days = ChronoUnit.DAYS.between(earlier.visit().measuredAt().toLocalDate(),
                    last.visit().measuredAt().toLocalDate());
            if (days >= minDays) {
                return Velocity.between(earlier.finalValues().get(Site.STATURE), earlier.standardErrors().get(Site.STATURE),
                        last.finalValues().get(Site.STATURE), last.standardErrors().get(Site.STATURE), days);
            }
        }
        return null;
    }

    /**
     * Velocities of sitting height, leg length and body mass from the latest visit back to the most recent
     * one at least three months earlier that has them. Leg length = stature − sitting height; its SE
     * combines both (independent errors).
     */
    private static java.util.Map<String, Velocity> otherVelocities(List<VisitResult> results) {
        java.util.Map<String, Velocity> out = new java.util.LinkedHashMap<>();
        java.util.function.Function<VisitResult, double[]> sh = r -> r.value(Site.SITTING_HEIGHT).map(v ->
                new double[] {v, r.standardErrors().get(Site.SITTING_HEIGHT)}).orElse(null);
        java.util.function.Function<VisitResult, double[]> leg = r -> {
            Double st = r.finalValues().get(Site.STATURE);
            Double s = r.finalValues().get(Site.SITTING_HEIGHT);
            if (st == null || s == null) {
                return null;
            }
            double a = r.standardErrors().get(Site.STATURE);
            double b = r.standardErrors().get(Site.SITTING_HEIGHT);
            return new double[] {st - s, Math.sqrt(a * a + b * b)};
        };
        java.util.function.Function<VisitResult, double[]> mass = r -> r.value(Site.BODY_MASS).map(v ->
                new double[] {v, r.standardErrors().get(Site.BODY_MASS)}).orElse(null);
        List<java.util.function.Function<VisitResult, double[]>> fs = List.of(sh, leg, mass);
        for (int k = 0; k < fs.size(); k++) {
            var f = fs.get(k);
            List<VisitResult> with = results.stream().filter(r -> f.apply(r) != null).toList();
            if (with.size() < 2) {
                continue;
            }
            VisitResult last = with.get(with.size() - 1);
            for (int i = with.size() - 2; i >= 0; i--) {
                long days = ChronoUnit.DAYS.between(with.get(i).visit().measuredAt().toLocalDate(),
                        last.visit().measuredAt().toLocalDate());
                if (days >= Velocity.MIN_READABLE_DAYS) {
                    double[] a = f.apply(with.get(i));
                    double[] b = f.apply(last);
                    out.put(GrowthSummary.OTHER.get(k), Velocity.between(a[0], a[1], b[0], b[1], days));
                    break;
                }
            }
        }
        return out;
    }

    private static VisitResult last(List<VisitResult> results) {
        return results.get(results.size() - 1);
    }
}
