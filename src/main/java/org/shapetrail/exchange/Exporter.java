package org.shapetrail.exchange;

import java.io.IOException;
import java.io.Writer;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.shapetrail.history.Academy;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.RatingSummary;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;
import org.shapetrail.store.Visit;

/**
 * CSV export that opens cleanly in a spreadsheet: UTF-8 with a byte-order mark, comma-separated,
 * decimal point, ISO dates, text cells neutralised against formula injection ({@link CsvSafety}).
 */
public final class Exporter {
    private static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("HH:mm");
    static final List<Site> VISIT_SITES = List.of(Site.BODY_MASS, Site.STATURE, Site.SITTING_HEIGHT, Site.TRICEPS,
            Site.SUBSCAPULAR, Site.SUPRASPINALE, Site.MEDIAL_CALF, Site.ARM_FLEXED, Site.CALF, Site.HUMERUS, Site.FEMUR);

    private Exporter() {
    }

    private static CSVPrinter printer(Writer out) throws IOException {
        out.write('\uFEFF');
        return new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator("\r\n").get());
    }

    private static String n(double v, int decimals) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + decimals + "f", v) : "";
    }

    /** Every raw trial, one per row (the long layout Shapetrail also imports). */
    public static int trials(Academy a, Writer out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord("person_id", "name", "birth_date", "sex", "letter_language", "date", "time", "measurer", "context",
                "site", "trial", "value", "unit");
        Map<Long, Person> people = new HashMap<>();
        a.people().forEach(x -> people.put(x.id(), x));
        Map<Long, Measurer> measurers = new HashMap<>();
        a.measurers().forEach(x -> measurers.put(x.id(), x));
        int rows = 0;
        for (Visit v : a.visits()) {
            Person who = people.get(v.personId());
            for (SiteTrials t : v.trials()) {
                for (int i = 0; i < t.values().size(); i++) {
                    p.printRecord(who.id(), CsvSafety.text(who.displayName()), who.birthDate(), who.sex().code(),
                            who.letterLanguage(), v.measuredAt().toLocalDate(), v.measuredAt().format(TIME),
                            CsvSafety.text(measurers.get(v.measurerId()).name()), CsvSafety.text(v.context()),
                            t.site().code(), i + 1, t.values().get(i), t.site().unit().symbol());
                    rows++;
                }
            }
        }
        p.flush();
        return rows;
    }

    /**
     * One row per visit: trials and final values of the measured sites, the somatotype, chart coordinates,
     * category, and the change since the previous rated visit with its verdict.
     */
    public static int visits(HistoryBuilder b, Writer out) throws IOException {
        CSVPrinter p = printer(out);
        List<String> header = new ArrayList<>(List.of("person_id", "name", "date", "measurer", "context", "age"));
        for (Site s : VISIT_SITES) {
            String base = s.code() + "_" + s.unit().symbol();
            header.add(base + "_1");
            header.add(base + "_2");
            header.add(base + "_3");
            header.add(base);
        }
        header.addAll(List.of("endomorphy", "mesomorphy", "ectomorphy", "x", "y", "category", "change_sad",
                "change_noise_multiple", "change_d2", "change_verdict", "repeatability"));
        p.printRecord(header);
        int rows = 0;
        for (Person person : b.academy().people()) {
            PersonHistory h = b.history(person);
            for (VisitResult r : h.visits()) {
                List<Object> row = new ArrayList<>(List.of(person.id(), CsvSafety.text(person.displayName()),
                        r.visit().measuredAt().toLocalDate(), CsvSafety.text(r.measurer().name()),
                        CsvSafety.text(r.visit().context()), n(r.ageYears(), 2)));
                for (Site s : VISIT_SITES) {
                    List<Double> t = r.visit().trialsAt(s).map(SiteTrials::values).orElse(List.of());
                    for (int i = 0; i < 3; i++) {
                        row.add(i < t.size() ? t.get(i).toString() : "");
                    }
                    row.add(r.value(s).map(v -> n(v, 2)).orElse(""));
                }
                var change = h.changeInto(r.visit().id());
                if (r.somatotype() != null) {
                    Rating x = r.somatotype().rating();
                    row.addAll(List.of(n(x.endomorphy(), 4), n(x.mesomorphy(), 4), n(x.ectomorphy(), 4),
                            n(x.chartPoint().x(), 4), n(x.chartPoint().y(), 4), r.somatotype().category().displayName()));
                } else {
                    row.addAll(List.of("", "", "", "", "", ""));
                }
                row.add(change.map(c -> n(c.verdict().sad(), 4)).orElse(""));
                row.add(change.map(c -> c.verdict().multipleText(Locale.ROOT)).orElse(""));
                row.add(change.map(c -> n(c.verdict().d2(), 3)).orElse(""));
                row.add(change.map(c -> c.verdict().verdict().words()).orElse(""));
                row.add(change.map(c -> CsvSafety.text(c.verdict().basis())).orElse(""));
                p.printRecord(row);
                rows++;
            }
        }
        p.flush();
        return rows;
    }

    /** Per squad: current members, rated members, mean rating and SAM on {@code day}. */
    public static int squads(HistoryBuilder b, LocalDate day, Writer out) throws IOException {
        CSVPrinter p = printer(out);
        p.printRecord("squad", "members", "rated", "mean_endomorphy", "mean_mesomorphy", "mean_ectomorphy", "sam",
                "mean_x", "mean_y", "sdi");
        Academy a = b.academy();
        for (Squad s : a.squads()) {
            List<Rating> latest = new ArrayList<>();
            List<Long> members = a.membersOn(s.id(), day);
            for (long id : members) {
                var rated = b.history(a.person(id).orElseThrow()).rated();
                if (!rated.isEmpty()) {
                    latest.add(rated.get(rated.size() - 1).somatotype().rating());
                }
            }
            if (latest.isEmpty()) {
                p.printRecord(CsvSafety.text(s.name()), members.size(), 0, "", "", "", "", "", "", "");
                continue;
            }
            RatingSummary r = RatingSummary.of(latest);
            p.printRecord(CsvSafety.text(s.name()), members.size(), r.n(), n(r.meanRating().endomorphy(), 4),
                    n(r.meanRating().mesomorphy(), 4), n(r.meanRating().ectomorphy(), 4), n(r.sam(), 4),
                    n(r.meanPoint().x(), 4), n(r.meanPoint().y(), 4), n(r.sdi(), 4));
        }
        p.flush();
        return a.squads().size();
    }
}
