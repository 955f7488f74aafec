package org.shapetrail.noise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.shapetrail.somatotype.Distances;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.Rating;

/** The analytic propagation against the Monte Carlo path (Commons Math Well19937c, fixed seeds). */
class ErrorPropagationTest {
    static final EndomorphyVariant V = EndomorphyVariant.HEIGHT_CORRECTED;

    /** Typical SEs of final values (mean of two trials) at ISAK-target repeatability: TEM/√2 (derived). */
    static double[] typicalSe(HeathCarterInput in) {
        double r2 = Math.sqrt(2);
        return new double[] {0.3 / r2, 0.2 / r2, 0.05 * in.tricepsMm() / r2, 0.05 * in.subscapularMm() / r2,
            0.05 * in.supraspinaleMm() / r2, 0.05 * in.medialCalfMm() / r2, 0.01 * in.humerusBreadthCm() / r2,
            0.01 * in.femurBreadthCm() / r2, 0.01 * in.armFlexedGirthCm() / r2, 0.01 * in.calfGirthCm() / r2};
    }

    /** Realistic bodies: lean, average, stocky, very light; and stature/mass set to put HWR at the branches. */
    static List<HeathCarterInput> grid() {
        List<HeathCarterInput> g = new ArrayList<>();
        g.add(new HeathCarterInput(178, 72, 9, 10, 7, 8, 7.0, 9.8, 33, 37));
        g.add(new HeathCarterInput(165, 78, 18, 20, 15, 14, 7.2, 10, 34, 38));
        g.add(new HeathCarterInput(150, 38, 7, 6, 5, 7, 5.8, 8.4, 22, 28));
        g.add(new HeathCarterInput(190, 60, 4, 4, 4, 4, 5.0, 7.0, 22, 28));
        for (double hwr : new double[] {38.15, 38.25, 38.3, 38.4, 40.6, 40.75, 40.9}) {
            g.add(new HeathCarterInput(172, Math.pow(172 / hwr, 3), 10, 11, 8, 9, 6.9, 9.6, 32, 36));
        }
        return g;
    }

    @Test
    void analyticCovarianceAgreesWithMonteCarloOverRealisticBodiesIncludingTheHwrBranches() {
        // tolerance: each entry within 8 % of √(var_i·var_j) of the Monte Carlo estimate (its own sampling
        // error at 200,000 draws is about 0.3 %); a plain delta method, taking one side's slope, would miss
        // by far more at HWR 38.3 and 40.75
        int seed = 1;
        for (HeathCarterInput in : grid()) {
            double[] se = typicalSe(in);
            ComponentCovariance analytic = ErrorPropagation.covariance(in, se, V);
            ComponentCovariance mc = MonteCarloPropagation.covariance(in, se, V, 200_000, new Well19937c(seed++));
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    double scale = Math.sqrt(mc.get(i, i) * mc.get(j, j)) + 1e-6;
                    assertEquals(mc.get(i, j), analytic.get(i, j), 0.08 * scale,
                            "entry " + i + "," + j + " at HWR " + HeathCarter.hwr(in.statureCm(), in.massKg())
                                    + ": analytic " + analytic + " vs MC " + mc);
                }
            }
        }
    }

    @Test
    void sadNoiseThresholdAgreesWithTheMonteCarloQuantile() {
        // 95th percentile of SAD between two independent noisy ratings of the same body; within 6 %
        int seed = 100;
        for (HeathCarterInput in : grid()) {
            double[] se = typicalSe(in);
            ComponentCovariance c = ErrorPropagation.covariance(in, se, V);
            Rating r = HeathCarter.rate(in, V).rating();
            double threshold = ChangeAssessment.assess(r, c, r, c, "test").sadNoise95();
            Well19937c rng = new Well19937c(seed++);
            int n = 40_000;
            double[] sads = new double[n];
            for (int k = 0; k < n; k++) {
                Rating a = HeathCarter.rate(MonteCarloPropagation.perturb(in, se, rng), V).rating();
                Rating b = HeathCarter.rate(MonteCarloPropagation.perturb(in, se, rng), V).rating();
                sads[k] = Distances.sad(a, b);
            }
            Arrays.sort(sads);
            double q95 = sads[(int) (0.95 * n)];
            assertEquals(q95, threshold, 0.06 * q95, "HWR " + HeathCarter.hwr(in.statureCm(), in.massKg()));
        }
    }

    @Test
    void noErrorGivesNoCovariance() {
        ComponentCovariance c = ErrorPropagation.covariance(grid().get(0), new double[10], V);
        assertEquals(ComponentCovariance.ZERO, c);
    }

    @Test
    void plainDeltaMethodSlopeAwayFromKinks() {
        // only stature uncertain (SE 1 cm) on the lean body: d(meso)/dH = −0.131, so var(meso) = 0.131²
        // (derived from the Heath-Carter mesomorphy equation)
        double[] se = new double[10];
        se[0] = 1.0;
        ComponentCovariance c = ErrorPropagation.covariance(grid().get(0), se, V);
        assertEquals(0.131 * 0.131, c.get(1, 1), 1e-9);
        // d(ecto)/dH = 0.732 / ∛72 at HWR 42.79 (upper branch), far from the 40.75 boundary
        double slope = 0.732 / Math.cbrt(72);
        assertEquals(slope * slope, c.get(2, 2), 1e-6);
        assertTrue(c.get(1, 2) < 0, "meso falls and ecto rises with stature");
    }

    @Test
    void chartCovarianceIsASigmaATransposed() {
        // Σ = diag(1, 2, 3): var X = 1 + 3 = 4; var Y = 1 + 4·2 + 3 = 12; cov XY = 1 − 3 = −2 (derived)
        ComponentCovariance c = new ComponentCovariance(new double[][] {{1, 0, 0}, {0, 2, 0}, {0, 0, 3}});
        double[][] xy = c.chartCovariance();
        assertEquals(4, xy[0][0], 1e-12);
        assertEquals(12, xy[1][1], 1e-12);
        assertEquals(-2, xy[0][1], 1e-12);
        assertEquals(-2, xy[1][0], 1e-12);
    }
}
