package org.shapetrail.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import org.shapetrail.app.TaskRunner;
import org.shapetrail.app.WorkbenchViewModel;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.store.Database;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.ServerAddress;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Harness for docs/performance.md: opening the sample academy as the window does (read everything,
 * compute every verdict and growth summary: what stands between the click and the people list), from a
 * file and from a server, in turn, and the medians of each. Arguments: a server URI whose schema is
 * empty or holds the sample academy (bench/open-from-server.sh makes one).
 */
public final class OpenBenchmark {
    private OpenBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path file = Files.createTempDirectory("open-bench").resolve("sample.sqlite");
        DemoAcademy.generate(file);
        try (Database d = Database.open(args[0])) {
            if (d.inTransaction(tx -> tx.people().all()).isEmpty()) {
                DemoAcademy.generateInto(d);
            }
        }
        RecordSource local = RecordSource.of(file);
        RecordSource server = new RecordSource.Server(ServerAddress.parse(args[0]), null);
        TaskRunner.Progress quiet = new TaskRunner.Progress() {
            @Override
            public void update(double done, double total, String message) {
            }

            @Override
            public boolean isCancelled() {
                return false;
            }
        };
        for (int warm = 0; warm < 5; warm++) { // the JIT and the server's caches warm up, as in a running app
            WorkbenchViewModel.load(local, AnalysisSettings.standard(), quiet);
            WorkbenchViewModel.load(server, AnalysisSettings.standard(), quiet);
        }
        List<Double> f = new ArrayList<>();
        List<Double> s = new ArrayList<>();
        for (int i = 0; i < 15; i++) {
            long t0 = System.nanoTime();
            WorkbenchViewModel.load(local, AnalysisSettings.standard(), quiet);
            long t1 = System.nanoTime();
            WorkbenchViewModel.load(server, AnalysisSettings.standard(), quiet);
            long t2 = System.nanoTime();
            f.add((t1 - t0) / 1e6);
            s.add((t2 - t1) / 1e6);
        }
        Collections.sort(f);
        Collections.sort(s);
        System.out.printf(Locale.ROOT, "open from the file: median %.0f ms (%.0f–%.0f); from the server: median %.0f ms"
                + " (%.0f–%.0f); difference of the medians %.0f ms%n", f.get(7), f.get(0), f.get(14), s.get(7), s.get(0),
                s.get(14), s.get(7) - f.get(7));
    }
}
