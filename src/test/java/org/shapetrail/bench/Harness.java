package org.shapetrail.bench;

import java.util.Arrays;
import java.util.Locale;

/** Times a piece of work after warm-up and prints the median, minimum and maximum. */
final class Harness {
    private Harness() {
    }

    interface Work {
        void run() throws Exception;
    }

    static void time(String label, int warmups, int runs, Work work) throws Exception {
        for (int i = 0; i < warmups; i++) {
            work.run();
        }
        long[] ns = new long[runs];
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            work.run();
            ns[i] = System.nanoTime() - t0;
        }
        Arrays.sort(ns);
        System.out.printf(Locale.ROOT, "%s: median %.1f ms, min %.1f ms, max %.1f ms (%d runs after %d warm-up)%n",
                label, ns[runs / 2] / 1e6, ns[0] / 1e6, ns[runs - 1] / 1e6, runs, warmups);
    }
}
