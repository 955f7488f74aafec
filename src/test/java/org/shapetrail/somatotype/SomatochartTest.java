package org.shapetrail.somatotype;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class SomatochartTest {
    private static final double TOL = 1e-12;

    @Test
    void cornerRatingsAndCentreLandOnTheirStandardCoordinates() {
        // Carter & Heath 1990: 7-1-1 → (−6, −6), 1-7-1 → (0, 12), 1-1-7 → (6, −6), 4-4-4 → (0, 0)
        assertEquals(new ChartPoint(-6, -6), Rating.of(7, 1, 1).chartPoint());
        assertEquals(new ChartPoint(0, 12), Rating.of(1, 7, 1).chartPoint());
        assertEquals(new ChartPoint(6, -6), Rating.of(1, 1, 7).chartPoint());
        assertEquals(new ChartPoint(0, 0), Rating.of(4, 4, 4).chartPoint());
    }

    @Test
    void addingTheSameAmountToAllComponentsLeavesThePointUnchanged() {
        // derived: X and Y are both unchanged by (+c, +c, +c)
        Random rnd = new Random(11);
        for (int i = 0; i < 1000; i++) {
            Rating r = randomRating(rnd);
            double c = rnd.nextDouble() * 3;
            Rating shifted = Rating.of(r.endomorphy() + c, r.mesomorphy() + c, r.ectomorphy() + c);
            assertEquals(r.chartPoint().x(), shifted.chartPoint().x(), 1e-9);
            assertEquals(r.chartPoint().y(), shifted.chartPoint().y(), 1e-9);
        }
    }

    @Test
    void sadIsSymmetricZeroOnlyForEqualRatingsAndObeysTheTriangleInequality() {
        Random rnd = new Random(12);
        for (int i = 0; i < 1000; i++) {
            Rating a = randomRating(rnd);
            Rating b = randomRating(rnd);
            Rating c = randomRating(rnd);
            assertEquals(Distances.sad(a, b), Distances.sad(b, a), TOL);
            assertEquals(0.0, Distances.sad(a, a), TOL);
            assertTrue(Distances.sad(a, b) > 0 || a.equals(b));
            assertTrue(Distances.sad(a, c) <= Distances.sad(a, b) + Distances.sad(b, c) + 1e-12);
        }
    }

    @Test
    void sadOfAKnownPair() {
        // 2-5-3 vs 3-3-1: √(1 + 4 + 4) = 3 (derived)
        assertEquals(3.0, Distances.sad(Rating.of(2, 5, 3), Rating.of(3, 3, 1)), TOL);
    }

    @Test
    void sddEqualsRootSixTimesTheSadOfTheRatingsProjectedOnTheChartPlane() {
        // derived: 3ΔX² + ΔY² = 4Σd² − 4Σdᵢdⱼ = 6·|d − mean(d)·(1,1,1)|²
        Random rnd = new Random(13);
        for (int i = 0; i < 1000; i++) {
            Rating a = randomRating(rnd);
            Rating b = randomRating(rnd);
            double d1 = a.endomorphy() - b.endomorphy();
            double d2 = a.mesomorphy() - b.mesomorphy();
            double d3 = a.ectomorphy() - b.ectomorphy();
            double m = (d1 + d2 + d3) / 3;
            double projected = Math.sqrt((d1 - m) * (d1 - m) + (d2 - m) * (d2 - m) + (d3 - m) * (d3 - m));
            assertEquals(Math.sqrt(6) * projected, Distances.sdd(a, b), 1e-9);
        }
    }

    @Test
    void summaryOfASetOfRatings() {
        // mean of 2-4-3 and 4-4-1 is 3-4-2; each lies at SAD √(1+0+1) = √2 from it, so SAM = √2;
        // points (1, 3) and (−3, 3), mean (−1, 3), SDD of each √(3·4) = √12, SDI = √12 (derived)
        RatingSummary s = RatingSummary.of(List.of(Rating.of(2, 4, 3), Rating.of(4, 4, 1)));
        assertEquals(Rating.of(3, 4, 2), s.meanRating());
        assertEquals(Math.sqrt(2), s.sam(), TOL);
        assertEquals(new ChartPoint(-1, 3), s.meanPoint());
        assertEquals(Math.sqrt(12), s.sdi(), TOL);
        assertEquals(2, s.n());
    }

    @Test
    void summaryOfOneRatingHasNoDispersion() {
        RatingSummary s = RatingSummary.of(List.of(Rating.of(2, 4, 3)));
        assertEquals(0.0, s.sam(), TOL);
        assertEquals(0.0, s.sdi(), TOL);
    }

    static Rating randomRating(Random rnd) {
        return Rating.of(0.1 + rnd.nextDouble() * 9, 0.1 + rnd.nextDouble() * 9, 0.1 + rnd.nextDouble() * 9);
    }
}
