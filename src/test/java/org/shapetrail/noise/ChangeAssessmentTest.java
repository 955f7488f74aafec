package org.shapetrail.noise;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.shapetrail.measure.RepeatRule;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.Rating;

class ChangeAssessmentTest {
    static final EndomorphyVariant V = EndomorphyVariant.HEIGHT_CORRECTED;

    @Test
    void chiSquaredThreeNinetyFifthPercentileIs7815() {
        // statistics table: χ²(3) at 0.95 = 7.815; Commons Math as reference library
        assertEquals(7.815, Verdict.BEYOND_D2, 5e-4);
        assertEquals(new ChiSquaredDistribution(3).inverseCumulativeProbability(0.95), Verdict.BEYOND_D2, 1e-9);
        assertEquals(new ChiSquaredDistribution(3).inverseCumulativeProbability(0.80), Verdict.BORDERLINE_D2, 1e-9);
    }

    @Test
    void closedFormSurvivalMatchesCommonsMath() {
        ChiSquaredDistribution chi3 = new ChiSquaredDistribution(3);
        for (double x : new double[] {0.1, 1, 2.5, 4.642, 7.815, 12, 25}) {
            assertEquals(1 - chi3.cumulativeProbability(x), ChangeAssessment.chiSquared3Survival(x), 1e-12);
        }
    }

    @Test
    void mahalanobisMatchesCommonsMathInverse() {
        double[][] s = {{0.09, 0.01, -0.02}, {0.01, 0.05, -0.01}, {-0.02, -0.01, 0.07}};
        double[] d = {0.4, -0.3, 0.25};
        RealMatrix inv = new LUDecomposition(new Array2DRowRealMatrix(s)).getSolver().getInverse();
        ArrayRealVector v = new ArrayRealVector(d);
        assertEquals(v.dotProduct(inv.operate(v)), ChangeAssessment.mahalanobisSquared(d, s), 1e-6);
    }

    @Test
    void verdictThresholds() {
        assertEquals(Verdict.BEYOND_NOISE, Verdict.of(7.9));
        assertEquals(Verdict.BORDERLINE, Verdict.of(7.8));
        assertEquals(Verdict.BORDERLINE, Verdict.of(4.7));
        assertEquals(Verdict.WITHIN_NOISE, Verdict.of(4.6));
    }

    // ---- calibration by simulation -------------------------------------------------------------

    static final HeathCarterInput TRUTH = new HeathCarterInput(172, 64, 9, 9.5, 7, 8, 6.8, 9.5, 30.5, 35.5);

    /** Single-trial SD per site at typical repeatability: skinfold 4 %, others 0.7 %, stature 0.2 cm, mass 0.1 kg. */
    static double sd(Site s, double v) {
        return switch (s.kind()) {
            case SKINFOLD -> 0.04 * v;
            case LENGTH -> 0.2;
            case MASS -> 0.1;
            default -> 0.007 * v;
        };
    }

    static ErrorProfile profileMatchingTheSimulation() {
        Map<Site, SiteError> m = new EnumMap<>(Site.class);
        for (Site s : Site.values()) {
            double value = HeathCarterInput.SITES.contains(s) ? TRUTH.get(s) : 100;
            double tem = sd(s, value);
            m.put(s, new SiteError(s, tem, tem / value * 100, 30, false));
        }
        return new ErrorProfile("Simulated measurer", m);
    }

    /** One visit measured with the ISAK procedure: two trials, a third when the rule asks. */
    static VisitEvaluation measure(HeathCarterInput truth, RandomGenerator rng) {
        List<SiteTrials> trials = new ArrayList<>();
        for (Site s : HeathCarterInput.SITES) {
            double t = truth.get(s);
            double a = t + sd(s, t) * rng.nextGaussian();
            double b = t + sd(s, t) * rng.nextGaussian();
            trials.add(RepeatRule.thirdTrialNeeded(s, a, b)
                    ? SiteTrials.of(s, a, b, t + sd(s, t) * rng.nextGaussian()) : SiteTrials.of(s, a, b));
        }
        return VisitCheck.evaluate(trials);
    }

    static ChangeVerdict pair(HeathCarterInput before, HeathCarterInput after, ErrorProfile p, RandomGenerator rng) {
        VisitEvaluation a = measure(before, rng);
        VisitEvaluation b = measure(after, rng);
        HeathCarterInput ia = HeathCarterInput.fromFinalValues(a.finalValues());
        HeathCarterInput ib = HeathCarterInput.fromFinalValues(b.finalValues());
        ComponentCovariance ca = ErrorPropagation.covariance(ia,
                SiteUncertainty.of(a.outcomes(), p, BiologicalVariation.none()), V);
        ComponentCovariance cb = ErrorPropagation.covariance(ib,
                SiteUncertainty.of(b.outcomes(), p, BiologicalVariation.none()), V);
        Rating ra = HeathCarter.rate(ia, V).rating();
        Rating rb = HeathCarter.rate(ib, V).rating();
        return ChangeAssessment.assess(ra, ca, rb, cb, "test");
    }

    @Test
    void noTrueChangeIsCalledBeyondNoiseInAboutFivePercentOfPairs() {
        // 4000 pairs over 4 seeds; under the nominal 5 % the count is Binomial(4000, 0.05): mean 200, SD 13.8;
        // accept 200 ± 4 SD. The repeat rule and the median of three make the noise slightly non-normal.
        ErrorProfile p = profileMatchingTheSimulation();
        int beyond = 0;
        int n = 0;
        for (int seed = 1; seed <= 4; seed++) {
            RandomGenerator rng = new Well19937c(seed);
            for (int k = 0; k < 1000; k++) {
                if (pair(TRUTH, TRUTH, p, rng).verdict() == Verdict.BEYOND_NOISE) {
                    beyond++;
                }
                n++;
            }
        }
        assertTrue(Math.abs(beyond - 0.05 * n) <= 4 * Math.sqrt(n * 0.05 * 0.95),
                beyond + " of " + n + " no-change pairs called beyond noise");
    }

    @Test
    void aTrueChangeOfOneUnitOfMesomorphyIsDetectedInMostPairs() {
        // +5.32 cm of flexed arm girth raises mesomorphy by 0.188 × 5.32 = 1.0 (Heath-Carter, derived)
        HeathCarterInput after = new HeathCarterInput(172, 64, 9, 9.5, 7, 8, 6.8, 9.5, 30.5 + 5.32, 35.5);
        assertEquals(1.0, HeathCarter.rate(after, V).rating().mesomorphy() - HeathCarter.rate(TRUTH, V).rating()
                .mesomorphy(), 1e-3);
        ErrorProfile p = profileMatchingTheSimulation();
        RandomGenerator rng = new Well19937c(77);
        int found = 0;
        for (int k = 0; k < 1000; k++) {
            if (pair(TRUTH, after, p, rng).verdict() == Verdict.BEYOND_NOISE) {
                found++;
            }
        }
        assertTrue(found > 800, found + " of 1000 one-unit changes detected");
    }
}
