package org.shapetrail.groups;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.inference.TTest;
import org.junit.jupiter.api.Test;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Rating;

class GroupTestsTest {
    @Test
    void oneSampleHotellingMatchesTheTextbookSweatExample() {
        // Johnson & Wichern, Applied Multivariate Statistical Analysis, Example 5.2 (sweat data, n = 20, p = 3):
        // x̄ = (4.640, 45.400, 9.965), S as below, μ₀ = (4, 50, 10): T² = 9.74 (numbers from memory)
        double[] mean = {4.640, 45.400, 9.965};
        double[][] s = {{2.879, 10.010, -1.810}, {10.010, 199.788, -5.640}, {-1.810, -5.640, 3.628}};
        Hotelling.Result r = Hotelling.oneSample(mean, s, 20, new double[] {4, 50, 10});
        assertEquals(9.74, r.t2(), 0.01);
        // F = (n − p)/(p(n − 1)) T² = 17/57 × 9.74 = 2.90 on (3, 17) (derived)
        assertEquals(17.0 / 57.0 * r.t2(), r.f(), 1e-9);
        assertEquals(3, r.df1());
        assertEquals(17, r.df2());
        // the book's 10 % critical value of T² is 8.18 (≈ 57/17 × F(3,17; 0.10) = 3.353 × 2.44), so p < 0.10
        assertTrue(r.pValue() < 0.10 && r.pValue() > 0.05, "p " + r.pValue());
    }

    static List<Rating> ratings(double[][] x) {
        List<Rating> out = new ArrayList<>();
        for (double[] r : x) {
            out.add(Rating.of(r[0], r[1], r[2]));
        }
        return out;
    }

    static final double[][] BEFORE = {{3.0, 4.0, 2.5}, {2.5, 4.5, 3.0}, {4.0, 3.5, 2.0}, {3.5, 4.0, 2.5},
        {2.0, 5.0, 3.5}, {3.0, 4.5, 2.0}};
    static final double[][] AFTER = {{2.6, 4.8, 2.4}, {2.3, 5.0, 3.1}, {3.4, 4.4, 1.8}, {3.4, 4.2, 2.6},
        {1.8, 5.9, 3.3}, {2.5, 5.1, 2.1}};

    @Test
    void pairedTestsPerComponentAgreeWithCommonsMath() {
        BlockResult r = GroupTests.block(ratings(BEFORE), ratings(AFTER), Collections.nCopies(6, Verdict.WITHIN_NOISE));
        TTest tt = new TTest();
        for (int j = 0; j < 3; j++) {
            double[] a = new double[6];
            double[] b = new double[6];
            for (int i = 0; i < 6; i++) {
                a[i] = AFTER[i][j];
                b[i] = BEFORE[i][j];
            }
            assertEquals(tt.pairedTTest(a, b), r.components().get(j).pValue(), 1e-12);
            assertEquals(tt.pairedT(a, b), r.components().get(j).t(), 1e-12);
        }
        // mesomorphy changes: 0.8, 0.5, 0.9, 0.2, 0.9, 0.6: mean 0.65 (by hand)
        assertEquals(0.65, r.components().get(1).meanDifference(), 1e-12);
        // SD of those changes = 0.27386; dz = 0.65 / 0.27386 = 2.3735 (by hand)
        assertEquals(0.65 / Math.sqrt(0.075), r.components().get(1).effectSize(), 1e-9);
        assertEquals(6, r.n());
        assertTrue(r.hotelling() != null && r.hotelling().pValue() < 0.05);
    }

    @Test
    void welchTestsAgreeWithCommonsMath() {
        GroupComparison c = GroupTests.compare(ratings(BEFORE), ratings(AFTER));
        TTest tt = new TTest();
        double[] a = new double[6];
        double[] b = new double[6];
        for (int i = 0; i < 6; i++) {
            a[i] = BEFORE[i][0];
            b[i] = AFTER[i][0];
        }
        assertEquals(tt.tTest(a, b), c.components().get(0).pValue(), 1e-12);
        assertEquals(tt.t(a, b), c.components().get(0).t(), 1e-12);
        assertTrue(c.hotelling() != null);
    }

    @Test
    void oneSampleHotellingHoldsItsFalsePositiveRateUnderNoChange() {
        // 2000 simulated blocks of 15 athletes with correlated normal changes and true mean 0; at α = 0.05
        // the rejections are Binomial(2000, 0.05): mean 100, SD 9.7; accept 100 ± 4 SD
        Well19937c rng = new Well19937c(21);
        int rejections = 0;
        for (int k = 0; k < 2000; k++) {
            double[][] d = new double[15][3];
            for (int i = 0; i < 15; i++) {
                double z1 = rng.nextGaussian();
                double z2 = rng.nextGaussian();
                double z3 = rng.nextGaussian();
                d[i] = new double[] {0.3 * z1, 0.2 * z1 + 0.3 * z2, -0.1 * z1 + 0.1 * z2 + 0.25 * z3};
            }
            if (Hotelling.oneSample(d, new double[3]).pValue() < 0.05) {
                rejections++;
            }
        }
        assertTrue(Math.abs(rejections - 100) <= 4 * Math.sqrt(2000 * 0.05 * 0.95), rejections + " rejections");
    }
}
