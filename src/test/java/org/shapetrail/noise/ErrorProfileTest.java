package org.shapetrail.noise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.shapetrail.measure.RepeatOutcome;
import org.shapetrail.measure.RepeatRule;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;

class ErrorProfileTest {
    private static List<Tem.Subject> subjects(int people) {
        List<Tem.Subject> out = new ArrayList<>();
        for (int i = 0; i < people; i++) {
            out.add(new Tem.Subject(i, List.of(10.0 + i, 10.2 + i)));
        }
        return out;
    }

    @Test
    void fewerThanTwentyPeopleFallBackToTheDefaultAndSaySo() {
        ErrorProfile p = ErrorProfile.fromRepeats("Ada Quarrington",
                Map.of(Site.TRICEPS, subjects(19), Site.SUBSCAPULAR, subjects(20)), DefaultErrors.standard());
        assertTrue(p.at(Site.TRICEPS).fromDefaults());
        assertEquals(5.0, p.at(Site.TRICEPS).temRelativePercent());
        assertFalse(p.at(Site.SUBSCAPULAR).fromDefaults());
        // each subject differs by 0.2: TEM = √(20·0.04 / 40) = 0.141421 (derived)
        assertEquals(Math.sqrt(0.02), p.at(Site.SUBSCAPULAR).temAbsolute(), 1e-12);
        assertEquals(20, p.at(Site.SUBSCAPULAR).people());
        assertEquals("Ada Quarrington's own TEM", p.describe(List.of(Site.SUBSCAPULAR)));
        assertEquals("Ada Quarrington's own TEM, with defaults where repeats are too few",
                p.describe(List.of(Site.SUBSCAPULAR, Site.TRICEPS)));
    }

    @Test
    void theSiteValueErrorShrinksWithTheNumberOfTrials() {
        ErrorProfile p = ErrorProfile.defaultsFor("Ada Quarrington", DefaultErrors.standard());
        // default skinfold TEM 5 % of 10 mm = 0.5 mm per trial; mean of two: 0.5/√2 (derived)
        RepeatOutcome two = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 10.0, 10.0));
        RepeatOutcome three = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 10.0, 9.0, 11.0));
        RepeatOutcome one = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 10.0));
        assertEquals(0.5 / Math.sqrt(2),
                SiteUncertainty.of(Map.of(Site.TRICEPS, two), p, BiologicalVariation.none()).get(Site.TRICEPS), 1e-12);
        assertEquals(0.5 * Math.sqrt(0.4487),
                SiteUncertainty.of(Map.of(Site.TRICEPS, three), p, BiologicalVariation.none()).get(Site.TRICEPS),
                1e-12);
        assertEquals(0.5, SiteUncertainty.of(Map.of(Site.TRICEPS, one), p, BiologicalVariation.none())
                .get(Site.TRICEPS), 1e-12);
    }

    @Test
    void aValueReadFromAScaleIsNeverMoreCertainThanHalfAReadingStep() {
        // a measurer with a tiny breadth TEM (0.01 cm): two equal readings still leave half the 0.1 cm step
        // of the anthropometer (common practice: breadths read to 0.1 cm)
        java.util.Map<Site, SiteError> m = new java.util.EnumMap<>(Site.class);
        for (Site s : Site.values()) {
            m.put(s, new SiteError(s, 0.01, 0.1, 30, false));
        }
        ErrorProfile p = new ErrorProfile("Ada Quarrington", m);
        RepeatOutcome humerus = RepeatRule.apply(SiteTrials.of(Site.HUMERUS, 6.3, 6.3));
        assertEquals(0.05, SiteUncertainty.of(Map.of(Site.HUMERUS, humerus), p, BiologicalVariation.none())
                .get(Site.HUMERUS), 1e-12);
    }

    @Test
    void biologicalVariationAddsInQuadrature() {
        ErrorProfile p = ErrorProfile.defaultsFor("Ada Quarrington", DefaultErrors.standard());
        RepeatOutcome mass = RepeatRule.apply(SiteTrials.of(Site.BODY_MASS, 60.0, 60.0));
        // measurement 0.3 % × 60 = 0.18 kg per trial, /√2 for two; day-to-day 0.5 kg: √(0.0162 + 0.25) (derived)
        double se = SiteUncertainty.of(Map.of(Site.BODY_MASS, mass), p,
                new BiologicalVariation(Map.of(Site.BODY_MASS, 0.5))).get(Site.BODY_MASS);
        assertEquals(Math.sqrt(0.18 * 0.18 / 2 + 0.25), se, 1e-12);
    }

    @Test
    void medianOfThreeVarianceMatchesSimulation() {
        // Var(median of 3 N(0,1)) ≈ 0.4487 (order statistics, from memory): check by simulation, fixed seed
        java.util.Random rnd = new java.util.Random(5);
        int n = 200_000;
        double s = 0;
        double s2 = 0;
        for (int i = 0; i < n; i++) {
            double[] x = {rnd.nextGaussian(), rnd.nextGaussian(), rnd.nextGaussian()};
            java.util.Arrays.sort(x);
            s += x[1];
            s2 += x[1] * x[1];
        }
        double var = s2 / n - (s / n) * (s / n);
        // sampling SD of this estimate ≈ 0.4487·√(2/n)·~1.1 ≈ 0.0016; allow 4 SD
        assertEquals(SiteUncertainty.MEDIAN_OF_THREE_VARIANCE, var, 0.0065);
    }
}
