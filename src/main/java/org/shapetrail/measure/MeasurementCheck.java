package org.shapetrail.measure;

import static org.shapetrail.i18n.Messages.tr;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Checks entered values against plausible human ranges and recognises the usual unit mistakes: stature
 * in metres or inches, a skinfold in centimetres, a breadth or girth in millimetres, mass in pounds or
 * grams. Every message names the site, the value and the likely fix.
 */
public final class MeasurementCheck {
    private static final double CM_PER_INCH = 2.54;
    private static final double LB_PER_KG = 2.2046226218;
    /** Above this BMI (kg/m²) a mass is not plausible for the people this tool serves (common practice). */
    private static final double MAX_PLAUSIBLE_BMI = 60.0;
    private static final double MIN_PLAUSIBLE_BMI = 10.0;

    private MeasurementCheck() {
    }

    /**
     * The problem with one value of one site, if any. NaN and infinities are reported as not a number.
     *
     * @param value the value as entered, taken to be in the site's unit
     */
    public static Optional<Problem> check(Site site, double value) {
        if (Double.isFinite(value) && value > 0 && site.isPlausible(value)) {
            return Optional.empty(); // the common case, without building any message
        }
        String name = site.shown();
        String entered = Numbers.asEntered(value);
        String unit = site.unit().symbol();
        if (!Double.isFinite(value)) {
            return Optional.of(new Problem(site, ProblemKind.NOT_A_NUMBER,
                    tr("check.notNumber", name, unit)));
        }
        if (value <= 0) {
            return Optional.of(new Problem(site, ProblemKind.NOT_POSITIVE,
                    tr("check.notPositive", name, entered, unit)));
        }
        if (site.isPlausible(value)) {
            return Optional.empty();
        }
        Optional<Problem> hint = unitHint(site, value, name, entered);
        if (hint.isPresent()) {
            return hint;
        }
        return Optional.of(new Problem(site, ProblemKind.OUT_OF_RANGE,
                tr("check.outOfRange", name, entered, unit, Numbers.oneDecimal(site.minPlausible()),
                        Numbers.oneDecimal(site.maxPlausible()))));
    }

    private static Optional<Problem> unitHint(Site site, double value, String name, String entered) {
        switch (site.kind()) {
            case LENGTH -> {
                if (site.isPlausible(value * 100)) {
                    return suggestion(site, ProblemKind.LIKELY_METRES, name, entered, "unit.metres", value * 100);
                }
                if (site.isPlausible(value * CM_PER_INCH)) {
                    return suggestion(site, ProblemKind.LIKELY_INCHES, name, entered, "unit.inches", value * CM_PER_INCH);
                }
                if (site.isPlausible(value / 10)) {
                    return suggestion(site, ProblemKind.LIKELY_MILLIMETRES, name, entered, "unit.millimetres",
                            value / 10);
                }
            }
            case SKINFOLD -> {
                if (site.isPlausible(value * 10)) {
                    return suggestion(site, ProblemKind.LIKELY_CENTIMETRES, name, entered, "unit.centimetres",
                            value * 10);
                }
            }
            case GIRTH, BREADTH -> {
                if (site.isPlausible(value / 10)) {
                    return suggestion(site, ProblemKind.LIKELY_MILLIMETRES, name, entered, "unit.millimetres",
                            value / 10);
                }
            }
            case MASS -> {
                if (value > site.maxPlausible() && site.isPlausible(value / LB_PER_KG)) {
                    return suggestion(site, ProblemKind.LIKELY_POUNDS, name, entered, "unit.pounds", value / LB_PER_KG);
                }
                if (site.isPlausible(value / 1000)) {
                    return suggestion(site, ProblemKind.LIKELY_GRAMS, name, entered, "unit.grams", value / 1000);
                }
            }
        }
        return Optional.empty();
    }

    private static Optional<Problem> suggestion(Site site, ProblemKind kind, String name, String entered,
                                                String wrongUnit, double corrected) {
        return Optional.of(new Problem(site, kind, tr("check.likelyUnit", name, entered, tr(wrongUnit),
                Numbers.oneDecimal(corrected), site.unit().symbol())));
    }

    /**
     * Every problem of a set of final values: each value on its own, then the combinations (mass against
     * stature, sitting height against stature). Values with their own problem are left out of the
     * combination checks.
     */
    public static List<Problem> checkAll(Map<Site, Double> values) {
        List<Problem> problems = new ArrayList<>();
        for (Map.Entry<Site, Double> e : values.entrySet()) {
            check(e.getKey(), e.getValue()).ifPresent(problems::add);
        }
        problems.addAll(checkCombinations(values));
        return problems;
    }

    /**
     * The problems of combinations of values (mass against stature, sitting height against stature);
     * values that have a problem of their own are left out.
     */
    public static List<Problem> checkCombinations(Map<Site, Double> values) {
        List<Problem> problems = new ArrayList<>();
        Double stature = usable(values, Site.STATURE);
        Double mass = usable(values, Site.BODY_MASS);
        if (stature != null && mass != null) {
            double metres = stature / 100;
            double bmi = mass / (metres * metres);
            double bmiIfPounds = (mass / LB_PER_KG) / (metres * metres);
            if (bmi > MAX_PLAUSIBLE_BMI && bmiIfPounds >= MIN_PLAUSIBLE_BMI) {
                problems.add(new Problem(Site.BODY_MASS, ProblemKind.LIKELY_POUNDS,
                        tr("check.bmi.pounds", Numbers.asEntered(mass), Numbers.asEntered(stature),
                                Numbers.oneDecimal(bmi), Numbers.oneDecimal(mass / LB_PER_KG))));
            } else if (bmi < MIN_PLAUSIBLE_BMI) {
                problems.add(new Problem(Site.BODY_MASS, ProblemKind.INCONSISTENT,
                        tr("check.bmi.implausible", Numbers.asEntered(mass), Numbers.asEntered(stature),
                                Numbers.oneDecimal(bmi))));
            }
        }
        Double sitting = usable(values, Site.SITTING_HEIGHT);
        if (stature != null && sitting != null && sitting >= stature) {
            problems.add(new Problem(Site.SITTING_HEIGHT, ProblemKind.INCONSISTENT,
                    tr("check.sitting", Numbers.asEntered(sitting), Numbers.asEntered(stature))));
        }
        return problems;
    }

    private static Double usable(Map<Site, Double> values, Site site) {
        Double v = values.get(site);
        if (v == null || check(site, v).isPresent()) {
            return null;
        }
        return v;
    }
}
