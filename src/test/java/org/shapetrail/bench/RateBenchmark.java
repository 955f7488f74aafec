package org.shapetrail.bench;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Random;
import org.shapetrail.cli.ShapetrailCli;

/**
 * Harness for docs/performance.md: times {@code rate} on a 10,000-row CSV in-process (parse, check,
 * rate, write), after warm-up. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=org.shapetrail.bench.RateBenchmark}.
 */
public final class RateBenchmark {
    private RateBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int rows = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        Path f = Files.createTempFile("rate-bench", ".csv");
        Random rnd = new Random(1);
        StringBuilder sb = new StringBuilder("id,stature_cm,mass_kg,triceps_mm,subscapular_mm,supraspinale_mm,"
                + "medial_calf_mm,humerus_cm,femur_cm,arm_flexed_cm,calf_cm\n");
        for (int i = 0; i < rows; i++) {
            double st = 150 + rnd.nextDouble() * 40;
            sb.append(String.format(Locale.ROOT, "P%d,%.1f,%.1f,%.1f,%.1f,%.1f,%.1f,%.2f,%.2f,%.1f,%.1f%n", i, st,
                    40 + rnd.nextDouble() * 50, 5 + rnd.nextDouble() * 15, 6 + rnd.nextDouble() * 15,
                    4 + rnd.nextDouble() * 15, 5 + rnd.nextDouble() * 12, 6 + rnd.nextDouble() * 1.5,
                    8.5 + rnd.nextDouble() * 2, 26 + rnd.nextDouble() * 10, 32 + rnd.nextDouble() * 8));
        }
        Files.writeString(f, sb);
        long[] ns = new long[15];
        for (int i = 0; i < 5 + ns.length; i++) {
            StringWriter out = new StringWriter();
            long t0 = System.nanoTime();
            int code = ShapetrailCli.execute(new String[] {"rate", f.toString()}, new PrintWriter(out),
                    new PrintWriter(new StringWriter()));
            long t = System.nanoTime() - t0;
            if (code != 0) {
                throw new IllegalStateException("rate exited " + code);
            }
            if (i >= 5) {
                ns[i - 5] = t;
            }
        }
        Arrays.sort(ns);
        System.out.printf(Locale.ROOT, "rate %d rows: median %.1f ms, min %.1f ms, max %.1f ms (%d runs after 5 warm-up)%n",
                rows, ns[ns.length / 2] / 1e6, ns[0] / 1e6, ns[ns.length - 1] / 1e6, ns.length);
        Files.delete(f);
    }
}
