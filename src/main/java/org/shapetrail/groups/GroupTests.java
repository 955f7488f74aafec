package org.shapetrail.groups;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.apache.commons.math3.stat.inference.TTest;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Component;
import org.shapetrail.somatotype.Distances;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.RatingSummary;

/**
 * Group statistics on somatotype ratings: a block's paired before/after analysis and the comparison of
 * two independent groups. t-tests come from Commons Math.
 *
 * <p>For two groups the multivariate test is the two-sample Hotelling T² rather than a permutation test
 * on the SAD between means: it uses all three components with their correlation, has an exact F
 * reference under multivariate normality, and gives the same answer every time it is run; somatotype
 * components are close enough to normal in squads of ten or more for this to be the usual choice.
 */
public final class GroupTests {
    private static final Component[] COMPONENTS = Component.values();

    private GroupTests() {
    }

    /**
     * The block analysis of paired ratings.
     *
     * @param verdicts each athlete's own verdict (same order), for the count beyond noise
     * @throws IllegalArgumentException with fewer than two pairs
     */
    public static BlockResult block(List<Rating> before, List<Rating> after, List<Verdict> verdicts) {
        int n = before.size();
        if (n < 2 || after.size() != n) {
            throw new IllegalArgumentException("a block analysis needs at least two athletes with both visits");
        }
        double[][] b = rows(before);
        double[][] a = rows(after);
        double[][] d = new double[n][3];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < 3; j++) {
                d[i][j] = a[i][j] - b[i][j];
            }
        }
        TTest tt = new TTest();
        List<ComponentTest> tests = new ArrayList<>();
        double tcrit = new TDistribution(n - 1).inverseCumulativeProbability(0.975);
        for (int j = 0; j < 3; j++) {
            double[] dj = Stats.column(d, j);
            double mean = mean(dj);
            double sd = new StandardDeviation().evaluate(dj);
            double t = sd > 0 ? tt.pairedT(Stats.column(a, j), Stats.column(b, j)) : Double.NaN;
            double p = sd > 0 ? tt.pairedTTest(Stats.column(a, j), Stats.column(b, j)) : Double.NaN;
            double dz = sd > 0 ? mean / sd : Double.NaN;
            // approximate SE of dz: √(1/n + dz²/(2n)) (large-sample normal approximation)
            double se = Math.sqrt(1.0 / n + dz * dz / (2.0 * n));
            tests.add(new ComponentTest(COMPONENTS[j], mean, t, n - 1, p, dz, dz - tcrit * se, dz + tcrit * se));
        }
        Hotelling.Result h = null;
        if (n > 3) {
            try {
                h = Hotelling.oneSample(d, new double[3]);
            } catch (IllegalArgumentException e) {
                h = null;
            }
        }
        RatingSummary sb = RatingSummary.of(before);
        RatingSummary sa = RatingSummary.of(after);
        int beyond = (int) verdicts.stream().filter(v -> v == Verdict.BEYOND_NOISE).count();
        return new BlockResult(n, sb, sa, Distances.sad(sb.meanRating(), sa.meanRating()), tests, h, beyond);
    }

    /** Two independent groups (each at least two people). */
    public static GroupComparison compare(List<Rating> first, List<Rating> second) {
        if (first.size() < 2 || second.size() < 2) {
            throw new IllegalArgumentException("each group needs at least two rated people");
        }
        double[][] x = rows(first);
        double[][] y = rows(second);
        TTest tt = new TTest();
        List<ComponentTest> tests = new ArrayList<>();
        for (int j = 0; j < 3; j++) {
            double[] xj = Stats.column(x, j);
            double[] yj = Stats.column(y, j);
            double v1 = variance(xj);
            double v2 = variance(yj);
            double n1 = xj.length;
            double n2 = yj.length;
            double diff = mean(xj) - mean(yj);
            double t = tt.t(xj, yj);
            double p = tt.tTest(xj, yj);
            double df = Math.pow(v1 / n1 + v2 / n2, 2)
                    / (Math.pow(v1 / n1, 2) / (n1 - 1) + Math.pow(v2 / n2, 2) / (n2 - 1));
            double pooled = Math.sqrt(((n1 - 1) * v1 + (n2 - 1) * v2) / (n1 + n2 - 2));
            double dd = diff / pooled;
            // approximate SE of Cohen's d: √((n₁+n₂)/(n₁n₂) + d²/(2(n₁+n₂)))
            double se = Math.sqrt((n1 + n2) / (n1 * n2) + dd * dd / (2 * (n1 + n2)));
            double z = 1.959963984540054;
            tests.add(new ComponentTest(COMPONENTS[j], diff, t, df, p, dd, dd - z * se, dd + z * se));
        }
        Hotelling.Result h = null;
        try {
            h = Hotelling.twoSample(x, y);
        } catch (IllegalArgumentException e) {
            h = null;
        }
        RatingSummary s1 = RatingSummary.of(first);
        RatingSummary s2 = RatingSummary.of(second);
        return new GroupComparison(s1, s2, Distances.sad(s1.meanRating(), s2.meanRating()), tests, h);
    }

    private static double[][] rows(List<Rating> rs) {
        double[][] out = new double[rs.size()][];
        for (int i = 0; i < rs.size(); i++) {
            Rating r = rs.get(i);
            out[i] = new double[] {r.endomorphy(), r.mesomorphy(), r.ectomorphy()};
        }
        return out;
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    private static double variance(double[] x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return s / (x.length - 1);
    }
}
