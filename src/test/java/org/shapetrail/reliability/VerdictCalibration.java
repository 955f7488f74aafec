package org.shapetrail.reliability;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.IntervalUtils;
import org.shapetrail.measure.RepeatRule;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteKind;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.noise.BiologicalVariation;
import org.shapetrail.noise.ChangeAssessment;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.ErrorProfile;
import org.shapetrail.noise.ErrorPropagation;
import org.shapetrail.noise.SiteError;
import org.shapetrail.noise.SiteUncertainty;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;

/**
 * Calibrates the verdicts by simulation: synthetic people (a spread of bodies from junior to senior
 * sizes) measured twice with the errors the tool assumes — each trial the true value plus a normal error
 * of the measurer's single-trial SD, the ISAK third trial where the rule asks, body mass varying 0.5 kg
 * from day to day — then judged as the tool judges them. With no true change, the share called beyond
 * noise is the false-positive rate (nominal 5 %); with a known change, the share found is the power.
 * {@code main} prints the table of docs/decisions/0002-noise-model.md.
 */
public final class VerdictCalibration {
    static final EndomorphyVariant V = EndomorphyVariant.HEIGHT_CORRECTED;
    /** Day-to-day SD of body mass the standard settings assume (docs/decisions/0002). */
    static final double MASS_DAY_SD = 0.5;

    private VerdictCalibration() {
    }

    /**
     * A measurer at typical accredited repeatability, in the form the tool models it: skinfolds 4 % of the
     * fold, girths 0.2 cm, breadths 0.05 cm, stature 0.2 cm, mass 0.1 kg (common practice, from memory).
     */
    static double singleSd(Site s, double v) {
        return switch (s.kind()) {
            case SKINFOLD -> 0.04 * v;
            case LENGTH -> 0.2;
            case MASS -> 0.1;
            case GIRTH -> 0.2;
            case BREADTH -> 0.05;
        };
    }

    /** The tool's profile of that measurer (relative TEMs for skinfolds, absolute for the rest). */
    static ErrorProfile profile() {
        Map<Site, SiteError> m = new EnumMap<>(Site.class);
        for (Site s : Site.values()) {
            double typical = s.kind() == SiteKind.SKINFOLD ? 10 : 100;
            double tem = singleSd(s, typical);
            m.put(s, new SiteError(s, tem, tem / typical * 100, 30, false));
        }
        return new ErrorProfile("simulated measurer", m);
    }

    /** A synthetic body, from a 10-year-old's size to an adult's. */
    static HeathCarterInput body(RandomGenerator r) {
        double stature = 140 + 45 * r.nextDouble();
        double bmi = 17 + 7 * r.nextDouble();
        double mass = bmi * stature * stature / 10_000;
        double fold = 5 + 10 * r.nextDouble();
        double scale = stature / 170;
        return new HeathCarterInput(stature, mass, fold * (0.9 + 0.3 * r.nextDouble()), fold * (0.8 + 0.4 * r.nextDouble()),
                fold * (0.6 + 0.4 * r.nextDouble()), fold * (0.8 + 0.4 * r.nextDouble()), 6.6 * scale * (0.95 + 0.1
                * r.nextDouble()), 9.4 * scale * (0.95 + 0.1 * r.nextDouble()), 29 * Math.sqrt(bmi / 21) * (0.95 + 0.1
                * r.nextDouble()), 35 * Math.sqrt(bmi / 21) * scale * (0.95 + 0.1 * r.nextDouble()));
    }

    /** One visit measured by the ISAK procedure on a day when body mass is off by the day's variation. */
    static VisitEvaluation measure(HeathCarterInput truth, RandomGenerator r) {
        List<SiteTrials> trials = new ArrayList<>();
        double massToday = truth.get(Site.BODY_MASS) + MASS_DAY_SD * r.nextGaussian();
        for (Site s : HeathCarterInput.SITES) {
            double t = s == Site.BODY_MASS ? massToday : truth.get(s);
            double sd = singleSd(s, truth.get(s));
            double a = read(s, t + sd * r.nextGaussian());
            double b = read(s, t + sd * r.nextGaussian());
            trials.add(RepeatRule.thirdTrialNeeded(s, a, b) ? SiteTrials.of(s, a, b, read(s, t + sd * r.nextGaussian()))
                    : SiteTrials.of(s, a, b));
        }
        return VisitCheck.evaluate(trials);
    }

    /** Whether readings are rounded to the instrument's step, as they are in practice. */
    static boolean rounding = true;

    /** A reading as the instrument shows it: to 0.2 mm on calipers, 0.1 cm on a tape or stadiometer, 0.1 kg. */
    static double read(Site s, double x) {
        if (!rounding) {
            return x;
        }
        double step = SiteUncertainty.readingStep(s.kind());
        return Math.round(x / step) * step;
    }

    static ChangeVerdict pair(HeathCarterInput before, HeathCarterInput after, ErrorProfile p, RandomGenerator r) {
        BiologicalVariation bio = new BiologicalVariation(Map.of(Site.BODY_MASS, MASS_DAY_SD));
        VisitEvaluation a = measure(before, r);
        VisitEvaluation b = measure(after, r);
        HeathCarterInput ia = HeathCarterInput.fromFinalValues(a.finalValues());
        HeathCarterInput ib = HeathCarterInput.fromFinalValues(b.finalValues());
        ComponentCovariance ca = ErrorPropagation.covariance(ia, SiteUncertainty.of(a.outcomes(), p, bio), V);
        ComponentCovariance cb = ErrorPropagation.covariance(ib, SiteUncertainty.of(b.outcomes(), p, bio), V);
        return ChangeAssessment.assess(HeathCarter.rate(ia, V).rating(), ca, HeathCarter.rate(ib, V).rating(), cb, "sim");
    }

    /** A true change: the body after, from the body before. */
    interface Change {
        HeathCarterInput apply(HeathCarterInput before);
    }

    /** The share of pairs called beyond noise, with its Clopper-Pearson 95 % interval (Commons Math). */
    record Rate(int beyond, int pairs, ConfidenceInterval interval) {
        double share() {
            return (double) beyond / pairs;
        }

        String row(String what) {
            return String.format(Locale.ROOT, "| %s | %,d | %,d | %.2f %% | %.2f–%.2f %% |", what, pairs, beyond,
                    100 * share(), 100 * interval.getLowerBound(), 100 * interval.getUpperBound());
        }
    }

    static Rate rate(Change change, int pairs, long seed) {
        RandomGenerator r = new Well19937c(seed);
        ErrorProfile p = profile();
        int beyond = 0;
        for (int i = 0; i < pairs; i++) {
            HeathCarterInput before = body(r);
            if (pair(before, change.apply(before), p, r).verdict() == Verdict.BEYOND_NOISE) {
                beyond++;
            }
        }
        // Clopper-Pearson needs a success and a failure; with none, the exact upper bound is 1 − 0.025^(1/n)
        ConfidenceInterval ci = beyond == 0 ? new ConfidenceInterval(0, 1 - Math.pow(0.025, 1.0 / pairs), 0.95)
                : beyond == pairs ? new ConfidenceInterval(Math.pow(0.025, 1.0 / pairs), 1, 0.95)
                : IntervalUtils.getClopperPearsonInterval(pairs, beyond, 0.95);
        return new Rate(beyond, pairs, ci);
    }

    /** The body with one site changed by {@code delta}. */
    static Change plus(Site site, double delta) {
        return b -> {
            double[] v = new double[HeathCarterInput.SITES.size()];
            for (int i = 0; i < v.length; i++) {
                Site s = HeathCarterInput.SITES.get(i);
                v[i] = b.get(s) + (s == site ? delta : 0);
            }
            return new HeathCarterInput(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9]);
        };
    }

    /** Every skinfold scaled by {@code factor}. */
    static Change folds(double factor) {
        return b -> new HeathCarterInput(b.get(Site.STATURE), b.get(Site.BODY_MASS), b.get(Site.TRICEPS) * factor,
                b.get(Site.SUBSCAPULAR) * factor, b.get(Site.SUPRASPINALE) * factor, b.get(Site.MEDIAL_CALF) * factor,
                b.get(Site.HUMERUS), b.get(Site.FEMUR), b.get(Site.ARM_FLEXED), b.get(Site.CALF));
    }

    public static void main(String[] args) {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        System.out.println("| true change | pairs | called beyond noise | share | 95 % interval (Clopper-Pearson) |");
        System.out.println("|---|---|---|---|---|");
        System.out.println(rate(b -> b, n, 1).row("none (false positives; nominal 5 %)"));
        rounding = false;
        System.out.println(rate(b -> b, n, 1).row("none, readings not rounded to the instrument's step"));
        rounding = true;
        // +2.66 cm of flexed arm girth is +0.5 mesomorphy (0.188 per cm, Heath-Carter; derived)
        System.out.println(rate(plus(Site.ARM_FLEXED, 1.33), n / 4, 7).row("mesomorphy +0.25 (arm girth +1.33 cm)"));
        System.out.println(rate(plus(Site.ARM_FLEXED, 2.66), n / 4, 2).row("mesomorphy +0.5 (arm girth +2.66 cm)"));
        System.out.println(rate(plus(Site.ARM_FLEXED, 5.32), n / 4, 3).row("mesomorphy +1.0 (arm girth +5.32 cm)"));
        System.out.println(rate(folds(0.8), n / 4, 4).row("skinfolds −20 %"));
        System.out.println(rate(folds(0.9), n / 4, 5).row("skinfolds −10 %"));
        System.out.println(rate(folds(0.95), n / 4, 8).row("skinfolds −5 %"));
        System.out.println(rate(plus(Site.STATURE, 3.0), n / 4, 6).row("stature +3 cm, nothing else (growth)"));
    }
}
