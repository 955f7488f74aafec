package org.shapetrail.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.ValueParser;
import org.shapetrail.somatotype.ChartPoint;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.SomatotypeRater;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code rate FILE.csv}: rates a CSV of final measurement values and writes the somatotypes as CSV to
 * standard output. Exit 0 when every row rated, 1 when any row was rejected, 2 when the file cannot be read.
 */
@Command(name = "rate", mixinStandardHelpOptions = true)
public final class RateCommand implements Callable<Integer> {
    /** Input column per site, as fixed by the command-line contract (docs/cli.md). */
    static final Map<String, Site> COLUMNS = columns();

    static final List<String> OUTPUT_HEADER = List.of("id", "endomorphy", "mesomorphy", "ectomorphy", "hwr",
            "x", "y", "category", "problems");

    @Parameters(index = "0", paramLabel = "FILE.csv", descriptionKey = "shapetrail.rate.file-csv")
    Path file;

    @Option(names = "--uncorrected-endomorphy")
    boolean uncorrected;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    private static Map<String, Site> columns() {
        Map<String, Site> m = new LinkedHashMap<>();
        m.put("stature_cm", Site.STATURE);
        m.put("mass_kg", Site.BODY_MASS);
        m.put("triceps_mm", Site.TRICEPS);
        m.put("subscapular_mm", Site.SUBSCAPULAR);
        m.put("supraspinale_mm", Site.SUPRASPINALE);
        m.put("medial_calf_mm", Site.MEDIAL_CALF);
        m.put("humerus_cm", Site.HUMERUS);
        m.put("femur_cm", Site.FEMUR);
        m.put("arm_flexed_cm", Site.ARM_FLEXED);
        m.put("calf_cm", Site.CALF);
        return m;
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        EndomorphyVariant variant = uncorrected ? EndomorphyVariant.UNCORRECTED : EndomorphyVariant.HEIGHT_CORRECTED;
        CSVFormat inFormat = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true)
                .setIgnoreEmptyLines(true).setTrim(true).get();
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8);
             CSVParser parser = CSVParser.parse(skipBom(reader), inFormat)) {
            Map<String, String> headerByKey = new LinkedHashMap<>();
            for (String h : parser.getHeaderNames()) {
                headerByKey.put(h.strip().toLowerCase(Locale.ROOT), h);
            }
            List<String> missing = new ArrayList<>();
            for (String col : COLUMNS.keySet()) {
                if (!headerByKey.containsKey(col)) {
                    missing.add(col);
                }
            }
            if (!missing.isEmpty()) {
                err.println(org.shapetrail.i18n.Messages.tr("cli.rate.columns", file, missing.size(),
                        String.join(", ", missing), String.join(", ", COLUMNS.keySet())));
                return 2;
            }
            String idHeader = headerByKey.get("id");
            boolean anyRejected = false;
            CSVPrinter printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get());
            printer.printRecord(OUTPUT_HEADER);
            for (CSVRecord rec : parser) {
                // the parser has just read the record's line ending, so this is the line the record ends on
                long line = parser.getCurrentLineNumber();
                String id = idHeader == null || !rec.isMapped(idHeader) || !rec.isSet(idHeader)
                        ? "" : rec.get(idHeader);
                List<Problem> problems = new ArrayList<>();
                List<SiteTrials> trials = new ArrayList<>();
                for (Map.Entry<String, Site> c : COLUMNS.entrySet()) {
                    String header = headerByKey.get(c.getKey());
                    String text = rec.isSet(header) ? rec.get(header) : "";
                    ValueParser.Parsed p = ValueParser.parse(c.getValue(), text, DecimalStyle.POINT);
                    if (p.ok()) {
                        trials.add(SiteTrials.of(c.getValue(), p.value()));
                    } else {
                        problems.add(p.problem());
                    }
                }
                SomatotypeRater.Outcome outcome = SomatotypeRater.rate(trials, variant);
                if (problems.isEmpty() && outcome.rated()) {
                    Rating r = outcome.somatotype().rating();
                    ChartPoint pt = r.chartPoint();
                    printer.printRecord(id, f(r.endomorphy()), f(r.mesomorphy()), f(r.ectomorphy()),
                            f(outcome.somatotype().hwr()), f(pt.x()), f(pt.y()),
                            outcome.somatotype().category().displayName(), "");
                } else {
                    anyRejected = true;
                    printer.printRecord(id, "", "", "", "", "", "", "", org.shapetrail.i18n.Messages.tr("reading.line", String.valueOf(line))
                            + joined(merge(problems, outcome.problems())));
                }
            }
            printer.flush();
            return anyRejected ? 1 : 0;
        } catch (NoSuchFileException e) {
            err.println(org.shapetrail.i18n.Messages.tr("cli.rate.noFile", file));
            return 2;
        } catch (MalformedInputException e) {
            err.println(org.shapetrail.i18n.Messages.tr("cli.rate.notUtf8", file));
            return 2;
        } catch (IOException | IllegalArgumentException | IllegalStateException e) {
            err.println(org.shapetrail.i18n.Messages.tr("cli.rate.other", file, e.getMessage()));
            return 2;
        }
    }


    /** Parse problems and the rater's, in measurement order; a site that failed to parse is not also "missing". */
    static List<Problem> merge(List<Problem> parse, List<Problem> rated) {
        List<Problem> all = new ArrayList<>(parse);
        for (Problem p : rated) {
            boolean alreadyNamed = parse.stream().anyMatch(q -> q.site() == p.site());
            if (!(alreadyNamed && p.kind() == org.shapetrail.measure.ProblemKind.MISSING)) {
                all.add(p);
            }
        }
        all.sort(java.util.Comparator.comparingInt(p -> p.site() == null ? Integer.MAX_VALUE : p.site().ordinal()));
        return all;
    }

    private static String joined(List<Problem> problems) {
        StringBuilder sb = new StringBuilder();
        for (Problem p : problems) {
            sb.append(sb.length() == 0 ? "" : " ").append(p.message());
        }
        return sb.toString();
    }

    private static Reader skipBom(Reader r) throws IOException {
        java.io.PushbackReader pr = new java.io.PushbackReader(r, 1);
        int c = pr.read();
        if (c != -1 && c != '\uFEFF') {
            pr.unread(c);
        }
        return pr;
    }

    private static String f(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }
}
