package org.shapetrail.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.shapetrail.noise.ChangeAssessment;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.ErrorPropagation;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.Rating;

/**
 * Harness for docs/performance.md: verdicts for 100,000 visit pairs, each pair computing both ratings,
 * both covariances (analytic propagation) and the assessment. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=org.shapetrail.bench.VerdictBenchmark}.
 */
public final class VerdictBenchmark {
    private VerdictBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int pairs = 100_000;
        Random rnd = new Random(3);
        List<HeathCarterInput> a = new ArrayList<>();
        List<HeathCarterInput> b = new ArrayList<>();
        for (int i = 0; i < pairs; i++) {
            a.add(body(rnd));
            b.add(body(rnd));
        }
        double[] se = {0.1, 0.07, 0.2, 0.2, 0.18, 0.2, 0.03, 0.04, 0.1, 0.1};
        EndomorphyVariant v = EndomorphyVariant.HEIGHT_CORRECTED;
        final double[] sink = new double[1];
        Harness.time("verdicts for " + pairs + " visit pairs", 3, 9, () -> {
            double s = 0;
            for (int i = 0; i < pairs; i++) {
                Rating ra = HeathCarter.rate(a.get(i), v).rating();
                Rating rb = HeathCarter.rate(b.get(i), v).rating();
                ComponentCovariance ca = ErrorPropagation.covariance(a.get(i), se, v);
                ComponentCovariance cb = ErrorPropagation.covariance(b.get(i), se, v);
                s += ChangeAssessment.assess(ra, ca, rb, cb, "bench").d2();
            }
            sink[0] = s;
        });
        System.out.println("(checksum " + sink[0] + ")");
    }

    static HeathCarterInput body(Random rnd) {
        double st = 150 + rnd.nextDouble() * 40;
        return new HeathCarterInput(st, 40 + rnd.nextDouble() * 50, 5 + rnd.nextDouble() * 15, 6 + rnd.nextDouble() * 15,
                4 + rnd.nextDouble() * 15, 5 + rnd.nextDouble() * 12, 6 + rnd.nextDouble() * 1.5,
                8.5 + rnd.nextDouble() * 2, 26 + rnd.nextDouble() * 10, 32 + rnd.nextDouble() * 8);
    }
}
