package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.shapetrail.measure.Site;

/**
 * The verdicts are calibrated (VerdictCalibration; the full table is in docs/decisions/0002): with no
 * true change, the share of 10,000 pairs called beyond noise has a 95 % Clopper-Pearson interval that
 * holds the nominal 5 %; a half-unit rise of mesomorphy is found in nearly every pair.
 */
class VerdictCalibrationTest {
    @Test
    void noTrueChangeIsCalledBeyondNoiseInFivePercentOfTenThousandPairs() {
        VerdictCalibration.Rate r = VerdictCalibration.rate(b -> b, 10_000, 11);
        assertTrue(r.interval().getLowerBound() <= 0.05 && 0.05 <= r.interval().getUpperBound(),
                r.row("no change")); // nominal 5 %: the χ²(3) 95th percentile (statistics table)
    }

    @Test
    void halfAUnitOfMesomorphyIsFoundInNearlyEveryPair() {
        // +2.66 cm of flexed arm girth is +0.5 mesomorphy (0.188 per cm; Heath-Carter, derived)
        VerdictCalibration.Rate r = VerdictCalibration.rate(VerdictCalibration.plus(Site.ARM_FLEXED, 2.66), 2_000, 12);
        assertTrue(r.interval().getLowerBound() > 0.95, r.row("mesomorphy +0.5"));
    }
}
