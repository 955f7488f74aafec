package org.shapetrail.reliability;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.shapetrail.exchange.Exporter;
import org.shapetrail.history.Academy;
import org.shapetrail.reliability.KillTarget.Operation;
import org.shapetrail.store.ContentDigest;
import org.shapetrail.store.DataFolder;
import org.shapetrail.store.Database;

/**
 * Kills a writer with SIGKILL at a random moment of each writing operation (import, visit save, erase,
 * restore, migration) and checks what is left: {@code PRAGMA integrity_check} ok, only whole visits, and
 * the content exactly the state before the operation or the state after it. The test runs a few rounds;
 * {@code bench/kill-runs.sh} runs 100 and prints the table in docs/reliability.md.
 */
public final class KillRuns {
    /** What one run found. */
    public record Outcome(Operation op, long delayMs, boolean intact, String state, String problem) {
    }

    private final Path dir;
    private final Random rnd;
    private final Map<Operation, Prepared> prepared = new EnumMap<>(Operation.class);

    /** A prepared operation: how to make the file before it, its input, and the digests before and after. */
    private record Prepared(Path template, Path input, String before, String after, long durationMs) {
    }

    public KillRuns(Path dir, long seed) {
        this.dir = dir;
        this.rnd = new Random(seed);
    }

    static Path sample(Path target) throws Exception {
        try (InputStream in = DataFolder.class.getResourceAsStream(DataFolder.SAMPLE_RESOURCE)) {
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
        }
        return target;
    }

    /**
     * The content of a file as it is: its schema version, then the digest of its rows (read from a copy,
     * brought to the current schema so that files of both versions compare by their rows); a file caught
     * half-way between two schemas says so.
     */
    static String rawDigest(Path file) throws Exception {
        Path look = file.resolveSibling("look-" + file.getFileName());
        Files.deleteIfExists(look);
        int version;
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath());
             Statement s = c.createStatement()) {
            var rs = s.executeQuery("PRAGMA user_version");
            rs.next();
            version = rs.getInt(1);
            rs = s.executeQuery("SELECT count(*) FROM sqlite_master WHERE name = 'block_pick'");
            rs.next();
            boolean v5Table = rs.getInt(1) == 1;
            if (version < 5 == v5Table) {
                return "schema " + version + " with" + (v5Table ? "" : "out") + " the version-5 table: half migrated";
            }
            s.executeUpdate("VACUUM INTO '" + look.toString().replace("'", "''") + "'");
        }
        try (Database d = Database.open(look)) {
            return "schema " + version + " " + ContentDigest.of(d);
        } finally {
            try (var files = Files.list(look.getParent())) {
                for (Path p : files.filter(x -> x.getFileName().toString().startsWith(look.getFileName().toString()))
                        .toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private Prepared prepare(Operation op) throws Exception {
        Path template = dir.resolve(op + "-before.sqlite");
        Path input = null;
        switch (op) {
            case IMPORT -> {
                Database.open(template).close();
                Path src = sample(dir.resolve("import-source.sqlite"));
                input = dir.resolve("import.csv");
                try (Database d = Database.open(src); Writer w = Files.newBufferedWriter(input, StandardCharsets.UTF_8)) {
                    Exporter.trials(Academy.load(d), w);
                }
            }
            case VISIT_SAVE, ERASE -> sample(template);
            case RESTORE -> {
                input = sample(dir.resolve("restore-backup.sqlite"));
                sample(template);
                try (Database d = Database.open(template)) {
                    d.erasePerson(1);
                }
            }
            case MIGRATION -> {
                sample(template);
                try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + template.toAbsolutePath());
                     Statement s = c.createStatement()) {
                    // as schema 4 left a file: without what versions 5 to 9 add, and from before Flyway
                    s.executeUpdate("DROP TABLE flyway_schema_history");
                    s.executeUpdate("DROP TABLE audit_entry");
                    for (String column : List.of("row_version", "entered_by", "changed_by", "changed_at")) {
                        s.executeUpdate("ALTER TABLE visit DROP COLUMN " + column);
                    }
                    s.executeUpdate("DROP TABLE file_meta");
                    s.executeUpdate("ALTER TABLE person DROP COLUMN letter_language");
                    s.executeUpdate("DROP TABLE block_pick");
                    s.executeUpdate("ALTER TABLE training_block DROP COLUMN aim");
                    s.executeUpdate("PRAGMA user_version = 4");
                }
            }
            default -> throw new IllegalStateException();
        }
        String before = rawDigest(template);
        Path done = dir.resolve(op + "-after.sqlite");
        Files.copy(template, done, StandardCopyOption.REPLACE_EXISTING);
        Process p = start(op, done, input);
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        long ms = -1;
        for (String line; (line = out.readLine()) != null; ) {
            if (line.startsWith("done ")) {
                ms = Long.parseLong(line.substring(5));
            }
        }
        if (p.waitFor() != 0 || ms < 0) {
            throw new IllegalStateException(op + " did not complete in its calibration run");
        }
        return new Prepared(template, input, before, rawDigest(done), Math.max(1, ms));
    }

    private static Process start(Operation op, Path file, Path input) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), KillTarget.class.getName(), op.name(), file.toString()));
        if (input != null) {
            cmd.add(input.toString());
        }
        return new ProcessBuilder(cmd).redirectErrorStream(true).start();
    }

    /** One run: the file before, the writer started, killed after a random part of the operation's time. */
    public Outcome run(Operation op) throws Exception {
        Prepared pr = prepared.get(op);
        if (pr == null) {
            pr = prepare(op);
            prepared.put(op, pr);
        }
        Path f = dir.resolve(op + "-run.sqlite");
        try (var files = Files.list(dir)) {
            for (Path p : files.filter(x -> x.getFileName().toString().startsWith(f.getFileName().toString())).toList()) {
                Files.delete(p);
            }
        }
        Files.copy(pr.template(), f);
        long delay = (long) (rnd.nextDouble() * pr.durationMs() * 1.2);
        Process p = start(op, f, pr.input());
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        String first = out.readLine();
        if (!"ready".equals(first)) {
            p.destroyForcibly();
            return new Outcome(op, delay, false, "", "the writer did not start: " + first);
        }
        TimeUnit.MILLISECONDS.sleep(delay);
        p.destroyForcibly(); // SIGKILL on Linux: no shutdown hooks, no close
        p.waitFor(20, TimeUnit.SECONDS);
        String digest = rawDigest(f);
        String state = digest.equals(pr.before()) ? "before" : digest.equals(pr.after()) ? "after" : "";
        try (Database d = Database.open(f)) {
            String integrity = d.integrityCheck();
            List<Long> partial = d.inTransaction(tx -> tx.visits().incompleteVisits());
            boolean intact = integrity.equals("ok") && partial.isEmpty() && !state.isEmpty();
            return new Outcome(op, delay, intact, state, intact ? "" : "integrity " + integrity + ", incomplete visits "
                    + partial + ", content " + (state.isEmpty() ? "neither before nor after: " + digest : state));
        }
    }

    /** Runs {@code perOperation} kills of each operation and prints the table of docs/reliability.md. */
    public static void main(String[] args) throws Exception {
        int per = args.length > 0 ? Integer.parseInt(args[0]) : 20;
        Path dir = Files.createTempDirectory("kill-runs");
        KillRuns k = new KillRuns(dir, 20261203L);
        Map<Operation, int[]> counts = new EnumMap<>(Operation.class);
        for (int i = 0; i < per; i++) {
            for (Operation op : Operation.values()) {
                Outcome o = k.run(op);
                int[] c = counts.computeIfAbsent(op, x -> new int[3]);
                c[0] += o.intact() ? 1 : 0;
                c[1] += o.state().equals("before") ? 1 : 0;
                c[2]++;
                if (!o.intact()) {
                    System.out.println("NOT INTACT: " + o);
                }
            }
        }
        System.out.println("| operation | runs | intact | killed before it committed | killed after |");
        System.out.println("|---|---|---|---|---|");
        int intact = 0;
        int total = 0;
        for (var e : counts.entrySet()) {
            int[] c = e.getValue();
            System.out.printf("| %s | %d | %d | %d | %d |%n", e.getKey().name().toLowerCase().replace('_', ' '), c[2], c[0],
                    c[1], c[2] - c[1]);
            intact += c[0];
            total += c[2];
        }
        System.out.println("| all | " + total + " | " + intact + " | | |");
        System.out.println("durations (ms, calibration run): " + k.prepared.entrySet().stream()
                .map(e -> e.getKey() + " " + e.getValue().durationMs()).toList());
    }
}
