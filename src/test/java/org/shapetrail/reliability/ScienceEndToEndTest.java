package org.shapetrail.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.stat.inference.TTest;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.cli.ShapetrailCli;

/**
 * The science, end to end: every figure the command line prints for the sample academy is recomputed here
 * from the raw trials read straight from the file with plain SQL, by an independent route — the formulas
 * of DESIGN.md §3 written out in this test, a numerical Jacobian instead of the analytic one, and Commons
 * Math for the t and F distributions.
 */
class ScienceEndToEndTest {
    @TempDir
    static Path dir;
    static Path file;

    /** A visit as the file holds it. */
    record RawVisit(long id, long person, LocalDate day, long measurer, Map<String, double[]> trials) {
    }

    record RawPerson(long id, String name, String sex, LocalDate birth) {
    }

    static final Map<Long, RawPerson> PEOPLE = new LinkedHashMap<>();
    static final List<RawVisit> VISITS = new ArrayList<>();
    static final Map<Long, String> MEASURERS = new HashMap<>();

    @BeforeAll
    static void read() throws Exception {
        file = KillRuns.sample(dir.resolve("sample.sqlite"));
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            ResultSet rs = s.executeQuery("SELECT id, display_name, sex, birth_date FROM person ORDER BY id");
            while (rs.next()) {
                PEOPLE.put(rs.getLong(1), new RawPerson(rs.getLong(1), rs.getString(2), rs.getString(3),
                        LocalDate.parse(rs.getString(4))));
            }
            rs = s.executeQuery("SELECT id, name FROM measurer");
            while (rs.next()) {
                MEASURERS.put(rs.getLong(1), rs.getString(2));
            }
            Map<Long, RawVisit> byId = new LinkedHashMap<>();
            rs = s.executeQuery("SELECT id, person_id, measured_at, measurer_id FROM visit ORDER BY person_id, measured_at");
            while (rs.next()) {
                RawVisit v = new RawVisit(rs.getLong(1), rs.getLong(2), LocalDate.parse(rs.getString(3).substring(0, 10)),
                        rs.getLong(4), new TreeMap<>());
                byId.put(v.id(), v);
                VISITS.add(v);
            }
            rs = s.executeQuery("SELECT visit_id, site, trial_no, value FROM trial ORDER BY visit_id, site, trial_no");
            while (rs.next()) {
                Map<String, double[]> t = byId.get(rs.getLong(1)).trials();
                double[] old = t.getOrDefault(rs.getString(2), new double[0]);
                double[] now = Arrays.copyOf(old, old.length + 1);
                now[old.length] = rs.getDouble(4);
                t.put(rs.getString(2), now);
            }
        }
    }

    static List<CSVRecord> csv(String... args) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err)), err.toString());
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(out.toString().split("\n\n")[0])).getRecords();
    }

    /** ISAK rule (common practice): the mean of two trials, the median of three. */
    static double finalValue(double[] t) {
        if (t.length == 1) {
            return t[0];
        }
        if (t.length == 2) {
            return (t[0] + t[1]) / 2;
        }
        double[] s = t.clone();
        Arrays.sort(s);
        return s[1];
    }

    static final List<String> HC = List.of("stature", "body_mass", "triceps", "subscapular", "supraspinale",
            "medial_calf", "arm_flexed", "calf", "humerus", "femur");

    /** Heath-Carter anthropometric somatotype (Carter &amp; Heath 1990; DESIGN.md §3), written out here. */
    static double[] heathCarter(Map<String, Double> v) {
        double st = v.get("stature");
        double x = (v.get("triceps") + v.get("subscapular") + v.get("supraspinale")) * 170.18 / st;
        double endo = -0.7182 + 0.1451 * x - 0.00068 * x * x + 0.0000014 * x * x * x;
        double meso = 0.858 * v.get("humerus") + 0.601 * v.get("femur") + 0.188 * (v.get("arm_flexed")
                - v.get("triceps") / 10) + 0.161 * (v.get("calf") - v.get("medial_calf") / 10) - 0.131 * st + 4.5;
        double hwr = st / Math.cbrt(v.get("body_mass"));
        double ecto = hwr >= 40.75 ? 0.732 * hwr - 28.58 : hwr > 38.25 ? 0.463 * hwr - 17.63 : 0.1;
        return new double[] {Math.max(0.1, endo), Math.max(0.1, meso), Math.max(0.1, ecto)};
    }

    static Map<String, Double> finals(RawVisit v) {
        Map<String, Double> out = new HashMap<>();
        v.trials().forEach((site, t) -> out.put(site, finalValue(t)));
        return out;
    }

    static boolean rated(RawVisit v) {
        return v.trials().keySet().containsAll(HC);
    }

    /** Duplicate-form TEM √(Σd²/2n) and the grand mean of the trials (Ulijaszek &amp; Kerr 1999). */
    record TemFigure(double tem, double mean, int people, int occasions) {
        double relative() {
            return tem / mean * 100;
        }
    }

    static Map<String, TemFigure> temOf(long measurer) {
        Map<String, double[]> sums = new HashMap<>(); // Σd², Σx, count, n
        Map<String, Set<Long>> people = new HashMap<>();
        for (RawVisit v : VISITS) {
            if (v.measurer() != measurer) {
                continue;
            }
            v.trials().forEach((site, t) -> {
                if (t.length < 2) {
                    return;
                }
                double[] s = sums.computeIfAbsent(site, k -> new double[4]);
                s[0] += (t[0] - t[1]) * (t[0] - t[1]);
                for (double x : t) {
                    s[1] += x;
                    s[2]++;
                }
                s[3]++;
                people.computeIfAbsent(site, k -> new HashSet<>()).add(v.person());
            });
        }
        Map<String, TemFigure> out = new HashMap<>();
        sums.forEach((site, s) -> out.put(site, new TemFigure(Math.sqrt(s[0] / (2 * s[3])), s[1] / s[2],
                people.get(site).size(), (int) s[3])));
        return out;
    }

    @Test
    void temPerMeasurerAndSiteIsTheDuplicateFormulaOnTheRawTrials() throws Exception {
        int rows = 0;
        for (CSVRecord r : csv("tem", "--db", file.toString(), "--format", "csv")) {
            long m = MEASURERS.entrySet().stream().filter(e -> e.getValue().equals(r.get("measurer"))).findFirst()
                    .orElseThrow().getKey();
            TemFigure f = temOf(m).get(r.get("site"));
            assertEquals(f.tem(), Double.parseDouble(r.get("tem")), 0.0005 + 1e-9, r.toString());
            assertEquals(f.relative(), Double.parseDouble(r.get("relative_tem_percent")), 0.005 + 1e-9, r.toString());
            assertEquals(f.people(), Integer.parseInt(r.get("people")), r.toString());
            assertEquals(f.occasions(), Integer.parseInt(r.get("occasions")), r.toString());
            rows++;
        }
        assertTrue(rows >= 2 * HC.size(), "rows " + rows);
    }

    /** Per-site SE of a final value, by the rules of docs/decisions/0002-noise-model.md. */
    static double se(RawVisit v, String site, double value, Map<Long, Map<String, TemFigure>> tems) {
        TemFigure f = tems.get(v.measurer()).get(site);
        boolean skinfold = Set.of("triceps", "subscapular", "supraspinale", "medial_calf").contains(site);
        double single;
        if (f == null || f.people() < 20) {
            double defaultPercent = skinfold ? 5.0 : Set.of("stature", "body_mass", "sitting_height").contains(site)
                    ? 0.3 : 1.0;
            single = defaultPercent / 100 * value;
        } else {
            single = skinfold ? f.relative() / 100 * value : f.tem();
        }
        int k = v.trials().get(site).length;
        double factor = k == 1 ? 1 : k == 2 ? Math.sqrt(0.5) : Math.sqrt(0.4487);
        double measurement = Math.max(single * factor, (skinfold ? 0.2 : 0.1) / 2);
        double bio = site.equals("body_mass") ? 0.5 : 0;
        return Math.sqrt(measurement * measurement + bio * bio);
    }

    /** Component covariance J·diag(σ²)·Jᵀ with J by central differences (DESIGN.md §3, delta method). */
    static double[][] covariance(RawVisit v, Map<Long, Map<String, TemFigure>> tems) {
        Map<String, Double> x = finals(v);
        double[][] cov = new double[3][3];
        for (String site : HC) {
            double s = se(v, site, x.get(site), tems);
            double h = 1e-4 * x.get(site);
            Map<String, Double> up = new HashMap<>(x);
            Map<String, Double> down = new HashMap<>(x);
            up.put(site, x.get(site) + h);
            down.put(site, x.get(site) - h);
            double[] a = heathCarter(up);
            double[] b = heathCarter(down);
            double[] g = {(a[0] - b[0]) / (2 * h), (a[1] - b[1]) / (2 * h), (a[2] - b[2]) / (2 * h)};
            for (int i = 0; i < 3; i++) {
                for (int j = 0; j < 3; j++) {
                    cov[i][j] += g[i] * g[j] * s * s;
                }
            }
        }
        return cov;
    }

    /** True when a visit's rating sits within three SEs of a kink (the 0.1 floor or HWR 38.25/40.75). */
    static boolean nearAKink(RawVisit v, double[][] cov, Map<Long, Map<String, TemFigure>> tems) {
        Map<String, Double> x = finals(v);
        double[] r = heathCarter(x);
        double hwr = x.get("stature") / Math.cbrt(x.get("body_mass"));
        double hwrSe = hwr * Math.hypot(se(v, "stature", x.get("stature"), tems) / x.get("stature"),
                se(v, "body_mass", x.get("body_mass"), tems) / x.get("body_mass") / 3);
        for (int i = 0; i < 3; i++) {
            if (r[i] - 0.1 < 3 * Math.sqrt(cov[i][i]) + 1e-6) {
                return true;
            }
        }
        return Math.abs(hwr - 40.75) < 3 * hwrSe || Math.abs(hwr - 38.25) < 3 * hwrSe;
    }

    @Test
    void everyChangeTheCommandPrintsIsRecomputedFromTheTrials() throws Exception {
        Map<Long, Map<String, TemFigure>> tems = new HashMap<>();
        MEASURERS.keySet().forEach(m -> tems.put(m, temOf(m)));
        int checked = 0;
        int nearKinks = 0;
        for (RawPerson p : PEOPLE.values()) {
            List<RawVisit> rated = VISITS.stream().filter(v -> v.person() == p.id() && rated(v)).toList();
            List<CSVRecord> rows = csv("changes", String.valueOf(p.id()), "--db", file.toString(), "--format", "csv");
            for (int i = 1; i < rated.size(); i++) {
                RawVisit a = rated.get(i - 1);
                RawVisit b = rated.get(i);
                CSVRecord row = rows.get(i - 1);
                assertEquals(a.day().toString(), row.get("from"), p.name());
                double[] ra = heathCarter(finals(a));
                double[] rb = heathCarter(finals(b));
                double[] d = {rb[0] - ra[0], rb[1] - ra[1], rb[2] - ra[2]};
                double sad = Math.sqrt(d[0] * d[0] + d[1] * d[1] + d[2] * d[2]); // Ross & Wilson 1973
                assertEquals(sad, Double.parseDouble(row.get("sad")), 0.005 + 1e-9, p.name() + " " + row);
                double[][] ca = covariance(a, tems);
                double[][] cb = covariance(b, tems);
                double[][] s = new double[3][3];
                for (int r = 0; r < 3; r++) {
                    for (int c = 0; c < 3; c++) {
                        s[r][c] = ca[r][c] + cb[r][c];
                    }
                }
                RealMatrix inv = new LUDecomposition(new Array2DRowRealMatrix(s)).getSolver().getInverse();
                double d2 = new Array2DRowRealMatrix(d).transpose().multiply(inv).multiply(new Array2DRowRealMatrix(d))
                        .getEntry(0, 0);
                double multiple = Math.sqrt(d2 / 7.814727903251178); // χ²(3) 95th percentile, statistics table
                for (int c = 0; c < 3; c++) {
                    String k = new String[] {"endo", "meso", "ecto"}[c];
                    assertEquals(d[c], Double.parseDouble(row.get(k + "_change")), 0.005 + 1e-9, row.toString());
                }
                if (nearAKink(a, ca, tems) || nearAKink(b, cb, tems)) {
                    nearKinks++; // the tool treats kinks exactly; a numerical derivative there is not a fair check
                    continue;
                }
                assertEquals(multiple, Double.parseDouble(row.get("noise_multiple")), 0.02 * multiple + 0.011,
                        p.name() + " " + row);
                for (int c = 0; c < 3; c++) {
                    String k = new String[] {"endo", "meso", "ecto"}[c];
                    assertEquals(1.96 * Math.sqrt(s[c][c]), Double.parseDouble(row.get(k + "_mdc95")),
                            0.02 * Math.sqrt(s[c][c]) + 0.006, row.toString()); // Weir 2005
                }
                checked++;
            }
        }
        System.out.println("science: changes checked " + checked + ", near a kink " + nearKinks);
        assertTrue(checked > 200, "changes checked " + checked + ", near a kink " + nearKinks);
    }

    /** Decimal age as days over 365.25, within a day of the tool's exact count (independent route). */
    static double age(LocalDate birth, LocalDate day) {
        return ChronoUnit.DAYS.between(birth, day) / 365.25;
    }

    @Test
    void maturityOffsetAndStatureVelocityOfEveryJuniorAreThePublishedEquations() throws Exception {
        int juniors = 0;
        for (RawPerson p : PEOPLE.values()) {
            List<RawVisit> vs = VISITS.stream().filter(v -> v.person() == p.id() && v.trials().containsKey("stature"))
                    .toList();
            RawVisit last = vs.get(vs.size() - 1);
            double age = age(p.birth(), last.day());
            if (age >= 18) {
                continue;
            }
            CSVRecord r = csv("growth", "--person", String.valueOf(p.id()), "--db", file.toString(), "--format", "csv")
                    .get(0);
            Map<String, Double> x = finals(last);
            double st = x.get("stature");
            double sh = x.get("sitting_height");
            double mass = x.get("body_mass");
            double ll = st - sh;
            double wh = mass / st * 100;
            // Mirwald et al. 2002, Med Sci Sports Exerc 34:689
            double offset = p.sex().equals("M")
                    ? -9.236 + 0.0002708 * ll * sh - 0.001663 * age * ll + 0.007216 * age * sh + 0.02292 * wh
                    : -9.376 + 0.0001882 * ll * sh + 0.0022 * age * ll + 0.005841 * age * sh - 0.002658 * age * mass
                    + 0.07693 * wh;
            assertEquals(offset, Double.parseDouble(r.get("maturity_offset_years")), 0.015, p.name());
            assertEquals(age - offset, Double.parseDouble(r.get("estimated_age_at_phv")), 0.06, p.name());
            RawVisit earlier = null;
            for (int i = vs.size() - 2; i >= 0; i--) {
                if (ChronoUnit.DAYS.between(vs.get(i).day(), last.day()) >= 90) { // three months, common practice
                    earlier = vs.get(i);
                    break;
                }
            }
            if (earlier != null) {
                double days = ChronoUnit.DAYS.between(earlier.day(), last.day());
                double velocity = (st - finals(earlier).get("stature")) / (days / 365.25);
                assertEquals(velocity, Double.parseDouble(r.get("velocity_cm_per_year")), 0.05 + 1e-9, p.name());
                assertEquals(days / 365.25, Double.parseDouble(r.get("interval_years")), 0.005 + 1e-9, p.name());
            }
            juniors++;
        }
        // sample-db/README.md: 40 juniors aged 10–16 when a three-year record starts, so a few are 18 by its end
        assertTrue(juniors > 30 && juniors <= 40, "juniors checked " + juniors);
    }

    @Test
    void theBlocksPairedTestsAndHotellingAreRecomputed() throws Exception {
        long squad;
        LocalDate start;
        LocalDate end;
        String name;
        List<Long> members = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            ResultSet rs = s.executeQuery("SELECT name, squad_id, starts_on, ends_on FROM training_block ORDER BY"
                    + " starts_on DESC, id DESC LIMIT 1");
            rs.next();
            name = rs.getString(1);
            squad = rs.getLong(2);
            start = LocalDate.parse(rs.getString(3));
            end = LocalDate.parse(rs.getString(4));
            rs = s.executeQuery("SELECT DISTINCT person_id FROM membership WHERE squad_id = " + squad
                    + " AND joined_on <= '" + end + "' AND (left_on IS NULL OR left_on >= '" + start + "')");
            while (rs.next()) {
                members.add(rs.getLong(1));
            }
        }
        List<double[]> before = new ArrayList<>();
        List<double[]> after = new ArrayList<>();
        for (long id : members) {
            RawVisit b = nearest(id, start, -1);
            RawVisit a = nearest(id, end, 1);
            if (b != null && a != null && b.id() != a.id()) {
                before.add(heathCarter(finals(b)));
                after.add(heathCarter(finals(a)));
            }
        }
        int n = before.size();
        List<CSVRecord> tests = csvSection(2, "block-report", "--block", name, "--db", file.toString(), "--format", "csv");
        double[][] diffs = new double[n][3];
        for (int c = 0; c < 3; c++) {
            double[] x = new double[n];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = before.get(i)[c];
                y[i] = after.get(i)[c];
                diffs[i][c] = y[i] - x[i];
            }
            CSVRecord r = tests.get(c);
            assertEquals(new TTest().pairedTTest(y, x), Double.parseDouble(r.get("p")), 0.00006, r.toString());
            assertEquals(new TTest().pairedT(y, x), Double.parseDouble(r.get("t")), 0.006, r.toString());
        }
        // one-sample Hotelling T² on the changes: n·d̄ᵀS⁻¹d̄, F = (n−p)/(p(n−1))·T² on (p, n−p) (Hotelling 1931)
        double[] mean = new double[3];
        for (double[] d : diffs) {
            for (int c = 0; c < 3; c++) {
                mean[c] += d[c] / n;
            }
        }
        double[][] cov = new double[3][3];
        for (double[] d : diffs) {
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    cov[r][c] += (d[r] - mean[r]) * (d[c] - mean[c]) / (n - 1);
                }
            }
        }
        RealMatrix inv = new LUDecomposition(new Array2DRowRealMatrix(cov)).getSolver().getInverse();
        double t2 = n * new Array2DRowRealMatrix(mean).transpose().multiply(inv).multiply(new Array2DRowRealMatrix(mean))
                .getEntry(0, 0);
        double f = (n - 3.0) / (3.0 * (n - 1)) * t2;
        double p = 1 - new FDistribution(3, n - 3).cumulativeProbability(f);
        Map<String, String> summary = new HashMap<>();
        for (CSVRecord r : csvSection(3, "block-report", "--block", name, "--db", file.toString(), "--format", "csv")) {
            summary.put(r.get("measure"), r.get("value"));
        }
        assertEquals(String.valueOf(n), summary.get("athletes with both visits"));
        assertEquals(t2, Double.parseDouble(summary.get("Hotelling T2 (one-sample, on the changes)")), 0.006);
        assertEquals(p, Double.parseDouble(summary.get("p")), 0.00006);
    }

    /**
     * The rated visit nearest {@code day} within 21 days on one side of it (BlockReview's default: up to the
     * start, side −1, or from the end, side +1), or null.
     */
    static RawVisit nearest(long person, LocalDate day, int side) {
        RawVisit best = null;
        long bestDays = Long.MAX_VALUE;
        for (RawVisit v : VISITS) {
            long days = side * ChronoUnit.DAYS.between(day, v.day());
            if (v.person() == person && rated(v) && days >= 0 && days <= 21 && days < bestDays) {
                best = v;
                bestDays = days;
            }
        }
        return best;
    }

    /** The {@code index}-th CSV table (0-based) of a command printing several, separated by blank lines. */
    static List<CSVRecord> csvSection(int index, String... args) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, ShapetrailCli.execute(args, new PrintWriter(out), new PrintWriter(err)), err.toString());
        String[] parts = out.toString().split("\n\n");
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(parts[index])).getRecords();
    }
}
