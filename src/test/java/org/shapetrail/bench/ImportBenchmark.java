package org.shapetrail.bench;

import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import org.shapetrail.exchange.ImportOptions;
import org.shapetrail.exchange.ImportPlan;
import org.shapetrail.exchange.Importer;
import org.shapetrail.history.Academy;
import org.shapetrail.store.Database;

/**
 * Harness for docs/performance.md: writes a long-layout CSV of 1,000,000 trial rows (50,000 visits of
 * 10 sites × 2 trials), or times the import of the CSV named as the first argument into a fresh file: the
 * one-pass import (read, match, check every value and write in one transaction), and with --two-steps also
 * the wizard's way (dry run, then commit of its plan). See bench/import-vs-sqlite3.sh.
 */
public final class ImportBenchmark {
    private ImportBenchmark() {
    }

    static final String[][] SITES = {{"body_mass", "60.1"}, {"stature", "170.2"}, {"triceps", "10.2"},
        {"subscapular", "9.0"}, {"supraspinale", "7.2"}, {"medial_calf", "8.2"}, {"arm_flexed", "30.1"},
        {"calf", "35.1"}, {"humerus", "6.8"}, {"femur", "9.5"}};

    public static void main(String[] args) throws Exception {
        if (args.length == 2 && args[0].equals("--write")) {
            write(Path.of(args[1]));
            return;
        }
        // into a fresh file, or with --server into a record on a server (an empty schema named in the URI)
        boolean server = args.length == 3 && args[0].equals("--server");
        Path csv = Path.of(args[server ? 2 : 0]);
        ImportOptions options = new ImportOptions(null, false, true);
        Path db = Files.createTempDirectory("import-bench").resolve("bench.sqlite");
        long t0 = System.nanoTime();
        try (Database d = server ? Database.open(args[1]) : Database.open(db)) {
            ImportPlan plan = Importer.importFile(d, csv, options, null);
            if (plan.written() == 0) {
                throw new IllegalStateException(plan.summary());
            }
            System.out.printf(Locale.ROOT, "one pass %s(read, check, write): %d visits in %.2f s%n",
                    server ? "into the server " : "", plan.written(), (System.nanoTime() - t0) / 1e9);
        }
        if (args.length > 1 && args[1].equals("--two-steps")) {
            Path db2 = db.resolveSibling("bench2.sqlite");
            long t1 = System.nanoTime();
            try (Database d = Database.open(db2)) {
                ImportPlan plan = Importer.dryRun(csv, Academy.load(d), options);
                long t2 = System.nanoTime();
                int visits = Importer.commit(d, plan);
                System.out.printf(Locale.ROOT, "dry run %.2f s, then commit of %d visits %.2f s%n", (t2 - t1) / 1e9,
                        visits, (System.nanoTime() - t2) / 1e9);
            }
        }
    }

    static void write(Path csv) throws Exception {
        try (Writer w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("name,birth_date,sex,date,time,measurer,site,trial,value\n");
            for (int v = 0; v < 50_000; v++) {
                String head = "Athlete " + (v % 1000) + ",2005-01-01,M," + LocalDate.of(2010, 1, 1).plusDays(v / 1000)
                        + ",09:00,Bench Measurer,";
                for (String[] s : SITES) {
                    w.write(head + s[0] + ",1," + s[1] + "\n");
                    w.write(head + s[0] + ",2," + s[1] + "\n");
                }
            }
        }
    }
}
