package org.shapetrail.growth;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.shapetrail.measure.Sex;

/**
 * The published equations evaluated independently (Python, double precision) for one made-up junior:
 * age 13.0 y, stature 155.0 cm, sitting height 79.0 cm (leg length 76.0), mass 45.0 kg (W/H 29.032).
 */
class MaturityOffsetTest {
    @Test
    void mirwaldBoys() {
        // Mirwald et al. 2002: −9.236 + 0.0002708·76·79 − 0.001663·13·76 + 0.007216·13·79 + 0.02292·29.032
        assertEquals(-1.17690944516129, MaturityOffset.mirwald(Sex.MALE, 13.0, 155.0, 79.0, 45.0), 1e-12);
    }

    @Test
    void mirwaldGirls() {
        // Mirwald et al. 2002 girls' equation, same body: 0.6047814129
        assertEquals(0.6047814129032272, MaturityOffset.mirwald(Sex.FEMALE, 13.0, 155.0, 79.0, 45.0), 1e-12);
    }

    @Test
    void mooreBoysUseSittingHeightAndGirlsStature() {
        // Moore et al. 2015: −8.128741 + 0.0070346 × (13 × 79) = −0.9042068; girls −7.709133 + 0.0042232 × (13 × 155)
        assertEquals(-0.9042068, MaturityOffset.moore(Sex.MALE, 13.0, 155.0, 79.0), 1e-9);
        assertEquals(0.800615, MaturityOffset.moore(Sex.FEMALE, 13.0, 155.0, 79.0), 1e-9);
    }

    @Test
    void estimateCarriesStatusTimingAndTheStandardError() {
        MaturityEstimate e = MaturityOffset.estimate(MaturityMethod.MIRWALD_2002, Sex.MALE, 13.0, 155.0, 79.0, 45.0);
        // offset −1.18 < −1: pre-PHV (common practice); age at PHV 13 + 1.18 = 14.18, within 13.8 ± 1: on time
        assertEquals(MaturityStatus.PRE_PHV, e.status());
        assertEquals(14.17690944516129, e.ageAtPhv(), 1e-12);
        assertEquals(MaturityTiming.ON_TIME, e.timing());
        assertEquals(0.59, e.seeYears()); // Mirwald et al. 2002 SEE, boys
        assertEquals("pre-PHV, offset -1.2 y (± 0.59), estimated age at PHV 14.2 (Mirwald et al. 2002)", e.summary());
    }

    @Test
    void statusBands() {
        // below −1 pre, −1 to +1 circa, above +1 post (common practice)
        assertEquals(MaturityStatus.PRE_PHV, MaturityStatus.of(-1.01));
        assertEquals(MaturityStatus.CIRCA_PHV, MaturityStatus.of(-1.0));
        assertEquals(MaturityStatus.CIRCA_PHV, MaturityStatus.of(1.0));
        assertEquals(MaturityStatus.POST_PHV, MaturityStatus.of(1.01));
    }

    @Test
    void timingAgainstTheReferenceMeanPlusMinusOneYear() {
        assertEquals(MaturityTiming.EARLY, MaturityTiming.of(Sex.FEMALE, 10.7));
        assertEquals(MaturityTiming.ON_TIME, MaturityTiming.of(Sex.FEMALE, 10.8));
        assertEquals(MaturityTiming.LATE, MaturityTiming.of(Sex.MALE, 14.9));
    }

    @Test
    void midParentTargetHeight() {
        // Tanner et al. 1970: boys (180 + 166 + 13)/2 = 179.5; girls (180 + 166 − 13)/2 = 166.5
        assertEquals(179.5, TargetHeight.midParent(Sex.MALE, 180, 166));
        assertEquals(166.5, TargetHeight.midParent(Sex.FEMALE, 180, 166));
        assertEquals(90.0, TargetHeight.percentAttained(161.55, 179.5), 1e-9);
        assertEquals(TargetHeight.Band.FROM_90_TO_95, TargetHeight.Band.of(90.0));
        assertEquals(TargetHeight.Band.FROM_85_TO_90, TargetHeight.Band.of(89.9));
    }
}
