package org.shapetrail.noise;

import java.util.HashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Technical error of measurement from repeated trials (Ulijaszek &amp; Kerr 1999, Br J Nutr 82:165;
 * Perini et al. 2005, Rev Bras Med Esporte 11:81).
 *
 * <p>Each subject is one site measured on one occasion, with two or three trials. Two figures are
 * computed: the duplicate form √(Σd²/2n) from the first two trials of every subject, and the general form
 * √(Σᵢ Σⱼ (xᵢⱼ − x̄ᵢ)² / Σᵢ(kᵢ − 1)), which for k repeats on every subject equals
 * √(Σᵢ[Σⱼxᵢⱼ² − (Σⱼxᵢⱼ)²/k] / (n(k−1))). The duplicate form is the one Shapetrail propagates: a third
 * trial is only taken when the first two disagree, so including it would weight the worst pairs twice.
 */
public final class Tem {
    private Tem() {
    }

    /**
     * One subject's trials.
     *
     * @param personKey who was measured (several occasions of one person count as one person)
     * @param trials two or three values in the site's unit
     */
    public record Subject(long personKey, List<Double> trials) {
        public Subject {
            trials = List.copyOf(trials);
            if (trials.size() < 2) {
                throw new IllegalArgumentException("a TEM subject needs at least two trials");
            }
        }
    }

    /**
     * TEM of one site.
     *
     * @param subjects number of occasions (n)
     * @param people number of different people behind them
     * @param duplicateTem √(Σd²/2n) from the first two trials, in the site's unit
     * @param generalTem pooled within-subject SD over all trials, in the site's unit
     * @param mean grand mean of all trials
     * @param relativeTemPercent duplicate TEM / mean × 100
     * @param reliability R = 1 − TEM²/SD² with SD the between-subject SD of subject means; empty when
     *     fewer than two subjects or SD is zero
     */
    public record Estimate(int subjects, int people, double duplicateTem, double generalTem, double mean,
                           double relativeTemPercent, OptionalDouble reliability) {
    }

    /**
     * Estimates TEM from subjects with two or three trials each.
     *
     * @throws IllegalArgumentException when there is no subject
     */
    public static Estimate estimate(List<Subject> subjects) {
        if (subjects.isEmpty()) {
            throw new IllegalArgumentException("TEM needs at least one subject with repeated trials");
        }
        int n = subjects.size();
        double sumD2 = 0;
        double within = 0;
        int dof = 0;
        double grand = 0;
        int count = 0;
        double[] means = new double[n];
        Set<Long> people = new HashSet<>();
        for (int i = 0; i < n; i++) {
            Subject s = subjects.get(i);
            people.add(s.personKey());
            List<Double> t = s.trials();
            double d = t.get(0) - t.get(1);
            sumD2 += d * d;
            double m = 0;
            for (double x : t) {
                m += x;
            }
            m /= t.size();
            means[i] = m;
            for (double x : t) {
                within += (x - m) * (x - m);
                grand += x;
                count++;
            }
            dof += t.size() - 1;
        }
        double duplicate = Math.sqrt(sumD2 / (2.0 * n));
        double general = Math.sqrt(within / dof);
        double mean = grand / count;
        OptionalDouble r = OptionalDouble.empty();
        if (n >= 2) {
            double mm = 0;
            for (double m : means) {
                mm += m;
            }
            mm /= n;
            double ss = 0;
            for (double m : means) {
                ss += (m - mm) * (m - mm);
            }
            double sd2 = ss / (n - 1);
            if (sd2 > 0) {
                r = OptionalDouble.of(1 - duplicate * duplicate / sd2);
            }
        }
        return new Estimate(n, people.size(), duplicate, general, mean, duplicate / mean * 100, r);
    }

    /**
     * Inter-measurer TEM from paired final values of the same people on the same day, duplicate form
     * √(Σd²/2n).
     *
     * @param first values by one measurer
     * @param second values by the other, same order
     */
    public static double between(List<Double> first, List<Double> second) {
        if (first.size() != second.size() || first.isEmpty()) {
            throw new IllegalArgumentException("inter-measurer TEM needs paired values, at least one pair");
        }
        double s = 0;
        for (int i = 0; i < first.size(); i++) {
            double d = first.get(i) - second.get(i);
            s += d * d;
        }
        return Math.sqrt(s / (2.0 * first.size()));
    }
}
