package org.shapetrail.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

class RepeatRuleTest {
    // Tolerances 5 % (skinfolds) and 1 % (other measures): ISAK standards, common practice (DESIGN.md §3).

    @Test
    void skinfoldPairExactlyFivePercentApartNeedsNoThirdTrial() {
        // 9.75 and 10.25 differ by 0.5 mm on a mean of 10.0 mm: exactly 5 % (derived)
        RepeatOutcome o = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 9.75, 10.25));
        assertEquals(new RepeatOutcome(Site.TRICEPS, RepeatOutcome.Status.MEAN_OF_TWO, OptionalDouble.of(10.0), 5.0),
                o);
    }

    @Test
    void thirdTrialRequiredAboveFivePercent() {
        // 9.7 and 10.25: 0.55 / 9.975 = 5.51 % (derived)
        RepeatOutcome o = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 9.7, 10.25));
        assertEquals(RepeatOutcome.Status.THIRD_TRIAL_NEEDED, o.status());
        assertTrue(o.value().isEmpty());
        assertEquals(5.5138, o.differencePercent(), 1e-4);
    }

    @Test
    void girthPairExactlyOnePercentApartNeedsNoThirdTrial() {
        // 99.5 and 100.5 cm: 1.0 / 100.0 = exactly 1 % (derived)
        assertFalse(RepeatRule.thirdTrialNeeded(Site.WAIST, 99.5, 100.5));
        assertEquals(OptionalDouble.of(100.0), RepeatRule.apply(SiteTrials.of(Site.WAIST, 99.5, 100.5)).value());
    }

    @Test
    void thirdTrialRequiredAboveOnePercentForStature() {
        // 99.4 and 100.5: 1.1 / 99.95 = 1.10 % (derived)
        assertTrue(RepeatRule.thirdTrialNeeded(Site.STATURE, 99.4, 100.5));
    }

    @Test
    void fourPercentSkinfoldDifferenceIsFineButFourPercentStatureIsNot() {
        // the tolerance depends on the kind of site: 5 % skinfold, 1 % length (ISAK, common practice)
        assertFalse(RepeatRule.thirdTrialNeeded(Site.SUBSCAPULAR, 10.0, 10.4));
        assertTrue(RepeatRule.thirdTrialNeeded(Site.STATURE, 150.0, 156.0));
    }

    @Test
    void orderOfTrialsDoesNotChangeTheDecision() {
        assertEquals(RepeatRule.thirdTrialNeeded(Site.TRICEPS, 9.7, 10.25),
                RepeatRule.thirdTrialNeeded(Site.TRICEPS, 10.25, 9.7));
    }

    @Test
    void threeTrialsGiveTheMedian() {
        // median of 10.0, 11.0, 10.4 is 10.4 (ISAK: median of three)
        RepeatOutcome o = RepeatRule.apply(SiteTrials.of(Site.TRICEPS, 10.0, 11.0, 10.4));
        assertEquals(RepeatOutcome.Status.MEDIAN_OF_THREE, o.status());
        assertEquals(OptionalDouble.of(10.4), o.value());
    }

    @Test
    void singleTrialIsTakenAsAFinalValue() {
        RepeatOutcome o = RepeatRule.apply(SiteTrials.of(Site.STATURE, 171.2));
        assertEquals(RepeatOutcome.Status.SINGLE, o.status());
        assertEquals(OptionalDouble.of(171.2), o.value());
    }
}
