package org.shapetrail.noise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.shapetrail.measure.SiteKind;

/**
 * Worked examples computed by hand from the published formulas (Ulijaszek &amp; Kerr 1999; Perini et al.
 * 2005); the data are made up for the check, not quoted from either paper.
 */
class TemTest {
    static final List<Tem.Subject> DUPLICATES = List.of(
            new Tem.Subject(1, List.of(10.0, 10.4)),
            new Tem.Subject(2, List.of(12.0, 11.6)),
            new Tem.Subject(3, List.of(8.0, 8.2)),
            new Tem.Subject(4, List.of(15.0, 15.6)));

    @Test
    void duplicateFormWorkedExample() {
        // d = −0.4, 0.4, −0.2, −0.6; Σd² = 0.72; TEM = √(0.72 / (2·4)) = 0.3 (by hand)
        Tem.Estimate e = Tem.estimate(DUPLICATES);
        assertEquals(0.3, e.duplicateTem(), 1e-12);
        // mean of the 8 trials = 90.8 / 8 = 11.35; relative TEM = 0.3 / 11.35 × 100 = 2.6432 %
        assertEquals(11.35, e.mean(), 1e-12);
        assertEquals(2.643171806167401, e.relativeTemPercent(), 1e-9);
        assertEquals(4, e.subjects());
        assertEquals(4, e.people());
    }

    @Test
    void generalFormEqualsDuplicateFormForTwoTrials() {
        // derived: for k = 2, Σ(x − x̄)² = d²/2, so √(Σ d²/2 / n) is the duplicate form
        Tem.Estimate e = Tem.estimate(DUPLICATES);
        assertEquals(e.duplicateTem(), e.generalTem(), 1e-12);
    }

    @Test
    void generalFormForThreeTrials() {
        // Σᵢ[Σⱼx² − (Σⱼx)²/3] = 0.186667 + 0.18 = 0.366667; / (n(k−1) = 4) → √0.0916667 = 0.302765 (by hand)
        Tem.Estimate e = Tem.estimate(List.of(new Tem.Subject(1, List.of(10.0, 10.6, 10.2)),
                new Tem.Subject(2, List.of(12.0, 12.3, 12.6))));
        assertEquals(0.3027650354097523, e.generalTem(), 1e-9);
    }

    @Test
    void reliabilityFromTheBetweenSubjectSd() {
        // subject means 10.2, 11.8, 8.1, 15.3: SD² = 27.69 / 3 = 9.23; R = 1 − 0.09 / 9.23 = 0.990249 (by hand)
        assertEquals(0.9902491874322861, Tem.estimate(DUPLICATES).reliability().orElseThrow(), 1e-12);
    }

    @Test
    void oneSubjectHasNoReliability() {
        assertTrue(Tem.estimate(List.of(new Tem.Subject(1, List.of(10.0, 10.4)))).reliability().isEmpty());
    }

    @Test
    void repeatedOccasionsOfOnePersonCountAsOnePerson() {
        Tem.Estimate e = Tem.estimate(List.of(new Tem.Subject(7, List.of(10.0, 10.4)),
                new Tem.Subject(7, List.of(11.0, 11.2)), new Tem.Subject(8, List.of(9.0, 9.0))));
        assertEquals(3, e.subjects());
        assertEquals(2, e.people());
    }

    @Test
    void interMeasurerTemFromPairedValues() {
        // d = 0.5, −0.3, 0.2: Σd² = 0.38; √(0.38 / 6) = 0.251661 (by hand)
        assertEquals(Math.sqrt(0.38 / 6), Tem.between(List.of(10.5, 12.0, 9.2), List.of(10.0, 12.3, 9.0)), 1e-12);
    }

    @Test
    void targetsForSkinfoldsAndOtherMeasures() {
        // skinfolds ≤ 5 % (entry ≤ 7.5 %), others ≤ 1 % (entry ≤ 1.5 %): common practice, from memory
        assertEquals(TemTargets.Standing.WITHIN_TARGET, TemTargets.standing(SiteKind.SKINFOLD, 5.0));
        assertEquals(TemTargets.Standing.ENTRY_LEVEL_ONLY, TemTargets.standing(SiteKind.SKINFOLD, 5.1));
        assertEquals(TemTargets.Standing.OUTSIDE, TemTargets.standing(SiteKind.SKINFOLD, 7.6));
        assertEquals(TemTargets.Standing.WITHIN_TARGET, TemTargets.standing(SiteKind.GIRTH, 1.0));
        assertEquals(TemTargets.Standing.ENTRY_LEVEL_ONLY, TemTargets.standing(SiteKind.BREADTH, 1.2));
        assertEquals(TemTargets.Standing.OUTSIDE, TemTargets.standing(SiteKind.LENGTH, 1.6));
    }
}
