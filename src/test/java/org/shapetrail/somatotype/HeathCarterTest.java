package org.shapetrail.somatotype;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Expected values are the published equations (Carter &amp; Heath 1990; Carter 2002 manual) evaluated
 * independently, step by step, with a desk calculator (Python, double precision); the steps are in the
 * comments.
 */
class HeathCarterTest {
    private static final double TOL = 1e-9;

    /** A lean young adult: 178.0 cm, 72.0 kg; skinfolds 9/10/7, calf 8 mm; humerus 7.0, femur 9.8,
     *  arm 33.0, calf 37.0 cm. */
    static final HeathCarterInput LEAN = new HeathCarterInput(178.0, 72.0, 9.0, 10.0, 7.0, 8.0, 7.0, 9.8, 33.0, 37.0);

    @Test
    void heightCorrectedEndomorphy() {
        // X = 26 × 170.18 / 178 = 24.857752808988767; endo = −0.7182 + 0.1451X − 0.00068X² + 0.0000014X³
        //   = 2.489986299471247 (Carter 2002, evaluated independently)
        Somatotype s = HeathCarter.rate(LEAN);
        assertEquals(24.857752808988767, s.endomorphyX(), TOL);
        assertEquals(2.489986299471247, s.rating().endomorphy(), TOL);
    }

    @Test
    void uncorrectedEndomorphyUsesTheRawSum() {
        // X = 26; endo = −0.7182 + 3.7726 − 0.45968 + 0.0246064 = 2.6193264 (Carter & Heath 1990, by hand)
        Somatotype s = HeathCarter.rate(LEAN, EndomorphyVariant.UNCORRECTED);
        assertEquals(26.0, s.endomorphyX(), TOL);
        assertEquals(2.6193264, s.rating().endomorphy(), TOL);
    }

    @Test
    void mesomorphyUsesSkinfoldCorrectedGirths() {
        // 0.858×7.0 + 0.601×9.8 + 0.188×(33.0 − 0.9) + 0.161×(37.0 − 0.8) − 0.131×178 + 4.5
        //   = 6.006 + 5.8898 + 6.0348 + 5.8282 − 23.318 + 4.5 = 4.9408 (Carter 2002, by hand)
        assertEquals(4.9408, HeathCarter.rate(LEAN).rating().mesomorphy(), TOL);
        assertEquals(32.1, HeathCarter.correctedArmGirthCm(LEAN), TOL);
        assertEquals(36.2, HeathCarter.correctedCalfGirthCm(LEAN), TOL);
    }

    @Test
    void ectomorphyUpperBranch() {
        // HWR = 178 / ∛72 = 42.786737252453115 ≥ 40.75; ecto = 0.732 × HWR − 28.58 = 2.739891668795682
        Somatotype s = HeathCarter.rate(LEAN);
        assertEquals(42.786737252453115, s.hwr(), TOL);
        assertEquals(2.739891668795682, s.rating().ectomorphy(), TOL);
    }

    @Test
    void ectomorphyMiddleBranchForAStockyBuild() {
        // 165.0 cm, 78.0 kg: HWR = 165 / ∛78 = 38.617641214072; 0.463 × HWR − 17.63 = 0.24996788211533882
        // endo: X = 53 × 170.18 / 165 = 54.66387878787879, endo = 5.410274478740418;
        // meso = 0.858×7.2 + 0.601×10 + 0.188×32.2 + 0.161×36.6 − 0.131×165 + 4.5 = 7.0188 (by hand)
        HeathCarterInput stocky = new HeathCarterInput(165.0, 78.0, 18.0, 20.0, 15.0, 14.0, 7.2, 10.0, 34.0, 38.0);
        Rating r = HeathCarter.rate(stocky).rating();
        assertEquals(new Rating(5.410274478740418, 7.0188, 0.24996788211533882).toDisplayString(),
                r.toDisplayString());
        assertEquals(5.410274478740418, r.endomorphy(), TOL);
        assertEquals(7.0188, r.mesomorphy(), TOL);
        assertEquals(0.24996788211533882, r.ectomorphy(), TOL);
    }

    @Test
    void ectomorphyAtTheBranchPoints() {
        // 0.732 × 40.75 − 28.58 = 1.249 (upper equation applies at 40.75, Carter 2002)
        assertEquals(1.249, HeathCarter.ectomorphyRaw(40.75), TOL);
        // just below: 0.463 × 40.7 − 17.63 = 1.2141
        assertEquals(1.2141, HeathCarter.ectomorphyRaw(40.7), TOL);
        // just above 40.75: 0.732 × 40.8 − 28.58 = 1.2856
        assertEquals(1.2856, HeathCarter.ectomorphyRaw(40.8), TOL);
        // at 38.25 and below: 0.1 (Carter 2002)
        assertEquals(0.1, HeathCarter.ectomorphyRaw(38.25), TOL);
        assertEquals(0.1, HeathCarter.ectomorphyRaw(38.2), TOL);
        // just above 38.25: 0.463 × 38.3 − 17.63 = 0.1029
        assertEquals(0.1029, HeathCarter.ectomorphyRaw(38.3), TOL);
    }

    @Test
    void hwrBelowTheLowBranchGivesTheFloorThroughAFullRating() {
        // 170 cm at 88.137 kg: HWR = 170 / ∛88.1366776 = 38.2 (derived: mass = (170/38.2)³)
        HeathCarterInput in = new HeathCarterInput(170.0, Math.pow(170.0 / 38.2, 3), 9, 10, 7, 8, 7, 9.8, 33, 37);
        Somatotype s = HeathCarter.rate(in);
        assertEquals(38.2, s.hwr(), 1e-9);
        assertEquals(0.1, s.rating().ectomorphy(), TOL);
    }

    @Test
    void componentsBelowOneTenthAreReportedAsOneTenth() {
        // a very lean, tall, light body: skinfold sum 12 mm at 190 cm; X = 12 × 170.18/190 = 10.748;
        // endo = 0.7645473545 > 0.1 (evaluated independently), so the floor is shown with
        // mesomorphy instead: small breadths and girths at 190 cm give a negative raw value (derived).
        HeathCarterInput in = new HeathCarterInput(190.0, 60.0, 4, 4, 4, 4, 5.0, 7.0, 22.0, 28.0);
        assertEquals(0.7645473545223285, HeathCarter.rate(in).rating().endomorphy(), 1e-9);
        // raw meso = 4.29 + 4.207 + 4.0608 + 4.4436 − 24.89 + 4.5 = −3.3886 (by hand)
        assertEquals(-3.3886, HeathCarter.mesomorphyRaw(in), 1e-9);
        assertEquals(0.1, HeathCarter.rate(in).rating().mesomorphy(), TOL);
    }
}
