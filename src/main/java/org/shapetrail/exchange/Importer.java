package org.shapetrail.exchange;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.MalformedInputException;
import java.nio.file.Path;
import java.text.Normalizer;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.ValueParser;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.store.Database;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Person;
import org.shapetrail.store.Visit;

/**
 * Imports visits from CSV in two steps: a dry run that reads every row, matches people and measurers,
 * checks every value with the core and reports each row as imported, skipped or rejected; then, only when
 * nothing is rejected, a commit that writes all of it in one transaction.
 */
public final class Importer {
    private static final DateTimeFormatter DMY_DOT = DateTimeFormatter.ofPattern("d.M.uuuu");
    private static final DateTimeFormatter DMY = DateTimeFormatter.ofPattern("d/M/uuuu");
    private static final DateTimeFormatter MDY = DateTimeFormatter.ofPattern("M/d/uuuu");
    private static final DateTimeFormatter DMY_DASH = DateTimeFormatter.ofPattern("d-M-uuuu");

    private static final List<Column.Role> KEY_ROLES = List.of(Column.Role.PERSON_ID, Column.Role.NAME,
            Column.Role.BIRTH_DATE, Column.Role.SEX, Column.Role.DATE, Column.Role.TIME, Column.Role.MEASURER,
            Column.Role.CONTEXT);

    private Importer() {
    }

    /** The dry run with the suggested column mapping. */
    public static ImportPlan dryRun(Path file, Academy existing, ImportOptions options) {
        return dryRun(file, existing, options, null);
    }

    /**
     * The dry run.
     *
     * @param columns the mapping to use (one per header, in order), or null for the suggestion
     */
    public static ImportPlan dryRun(Path file, Academy existing, ImportOptions options, List<Column> columns) {
        CsvInput.Format format;
        try {
            format = CsvInput.detect(file);
        } catch (MalformedInputException e) {
            return failed(List.of(), "It is not UTF-8 text; save it from the spreadsheet as CSV UTF-8.");
        } catch (IOException e) {
            return failed(List.of(), "It cannot be read (" + e.getMessage() + ").");
        }
        DecimalStyle decimals = options.decimals() != null ? options.decimals() : format.decimals();
        try (CSVParser parser = CsvInput.parser(file, format.delimiter())) {
            List<String> headers = parser.getHeaderNames();
            if (headers.isEmpty()) {
                return failed(List.of(), "It is empty: there is no header row.");
            }
            List<Column> cols = columns != null ? columns : ColumnMapper.suggest(headers);
            if (cols.size() != headers.size()) {
                return failed(cols, "The mapping has " + cols.size() + " columns but the file has " + headers.size() + ".");
            }
            return new Reading(existing, options, decimals, cols).read(parser);
        } catch (MalformedInputException e) {
            return failed(List.of(), "It is not UTF-8 text; save it from the spreadsheet as CSV UTF-8.");
        } catch (IOException | UncheckedIOException | IllegalStateException | IllegalArgumentException e) {
            return failed(List.of(), "It is not a CSV file Shapetrail can read (" + e.getMessage() + ").");
        }
    }

    private static ImportPlan failed(List<Column> cols, String why) {
        return new ImportPlan(cols, false, List.of(), List.of(), List.of(), List.of(), List.of(why));
    }

    /**
     * Writes a plan that {@link ImportPlan#canCommit()} in one transaction.
     *
     * @return the number of visits written
     * @throws IllegalStateException when the plan has rejected rows or file problems
     */
    public static int commit(Database db, ImportPlan plan) {
        if (!plan.canCommit()) {
            throw new IllegalStateException("An import with rejected rows is never written: " + plan.summary());
        }
        return db.inTransaction(tx -> {
            Map<String, Long> measurers = new HashMap<>();
            for (String m : plan.newMeasurers()) {
                measurers.put(m, tx.measurers().insert(m, "").id());
            }
            List<Long> people = new ArrayList<>();
            for (Person p : plan.newPeople()) {
                people.add(tx.people().insert(p).id());
            }
            List<Visit> visits = new ArrayList<>(plan.visits().size());
            for (ImportPlan.PlannedVisit pv : plan.visits()) {
                long person = pv.personId() > 0 ? pv.personId() : people.get(pv.newPersonIndex());
                long measurer = pv.newMeasurer() != null ? measurers.get(pv.newMeasurer()) : pv.measurerId();
                Visit v = pv.visit();
                visits.add(new Visit(0, person, v.measuredAt(), measurer, v.context(), v.notes(), v.trials()));
            }
            tx.visits().insertAll(visits);
            return visits.size();
        });
    }

    private static final java.util.regex.Pattern MARKS = java.util.regex.Pattern.compile("\\p{M}");
    private static final java.util.regex.Pattern SPACES = java.util.regex.Pattern.compile("\\s+");

    static String fold(String s) {
        String n = Normalizer.normalize(s == null ? "" : s.strip(), Normalizer.Form.NFD);
        return SPACES.matcher(MARKS.matcher(n).replaceAll("").toLowerCase(Locale.ROOT)).replaceAll(" ");
    }

    /** One pass over the rows. */
    private static final class Reading {
        private final Academy existing;
        private final ImportOptions options;
        private final DecimalStyle decimals;
        private final List<Column> cols;
        private final boolean longLayout;
        private final Map<String, Person> peopleByKey = new HashMap<>();
        private final Map<Long, Person> peopleById = new HashMap<>();
        private final Map<String, Measurer> measurersByName = new HashMap<>();
        private final Set<String> existingVisits = new HashSet<>();
        private final List<Person> newPeople = new ArrayList<>();
        private final Map<String, Integer> newPeopleIndex = new HashMap<>();
        private final List<String> newMeasurers = new ArrayList<>();
        private final List<ImportPlan.RowReport> reports = new ArrayList<>();
        // a large file repeats the same names, dates and sites on every row: work each out once
        private final Map<String, String> folded = new HashMap<>();
        private final Map<String, Optional<Site>> sitesByText = new HashMap<>();
        private final Map<String, Object> datesByText = new HashMap<>();
        private final Map<String, String> newMeasurerByFold = new HashMap<>();
        private final Map<String, LocalTime> timesByText = new HashMap<>();
        private final Map<Column.Role, Integer> index = new java.util.EnumMap<>(Column.Role.class);

        /** A visit being gathered from rows. */
        private final class Pending {
            final long personId;
            final int newIndex;
            final Measurer measurer;
            final String newMeasurer;
            final LocalDateTime when;
            final String context;
            final Map<Site, Double[]> trials = new LinkedHashMap<>();
            final List<Long> lines = new ArrayList<>();
            final List<String> problems = new ArrayList<>();
            final long firstLine;

            Pending(long personId, int newIndex, Measurer m, String newMeasurer, LocalDateTime when, String context,
                    long line) {
                this.personId = personId;
                this.newIndex = newIndex;
                this.measurer = m;
                this.newMeasurer = newMeasurer;
                this.when = when;
                this.context = context;
                this.firstLine = line;
            }
        }

        Reading(Academy existing, ImportOptions options, DecimalStyle decimals, List<Column> cols) {
            this.existing = existing;
            this.options = options;
            this.decimals = decimals;
            this.cols = cols;
            this.longLayout = cols.stream().anyMatch(c -> c.role() == Column.Role.SITE_NAME);
            for (int i = cols.size() - 1; i >= 0; i--) {
                index.put(cols.get(i).role(), i);
            }
            for (Person p : existing.people()) {
                peopleById.put(p.id(), p);
                peopleByKey.put(fold(p.displayName()) + "|" + p.birthDate(), p);
            }
            for (Measurer m : existing.measurers()) {
                measurersByName.put(fold(m.name()), m);
            }
            for (Visit v : existing.visits()) {
                existingVisits.add(v.personId() + "|" + v.measuredAt() + "|" + v.measurerId());
            }
        }

        private Optional<Column> col(Column.Role r) {
            Integer i = index.get(r);
            return i == null ? Optional.empty() : Optional.of(cols.get(i));
        }

        private String cell(CSVRecord rec, Column.Role r) {
            Integer i = index.get(r);
            return i == null || i >= rec.size() ? "" : CsvSafety.untext(rec.get(i));
        }

        private String foldCached(String s) {
            return folded.computeIfAbsent(s, Importer::fold);
        }

        ImportPlan read(CSVParser parser) {
            List<String> fileProblems = new ArrayList<>();
            boolean who = col(Column.Role.PERSON_ID).isPresent()
                    || (col(Column.Role.NAME).isPresent() && col(Column.Role.BIRTH_DATE).isPresent());
            if (!who) {
                fileProblems.add("No column says who was measured: map a person id, or a name and a date of birth.");
            }
            if (col(Column.Role.DATE).isEmpty()) {
                fileProblems.add("No column holds the visit date.");
            }
            if (col(Column.Role.MEASURER).isEmpty()) {
                fileProblems.add("No column names the measurer.");
            }
            boolean anySite = cols.stream().anyMatch(c -> c.role() == Column.Role.SITE_VALUE);
            if (longLayout && (col(Column.Role.VALUE).isEmpty())) {
                fileProblems.add("A site column is mapped, but no value column.");
            }
            if (!longLayout && !anySite) {
                fileProblems.add("No column holds a measurement (e.g. \"stature\", \"triceps 1\").");
            }
            if (!fileProblems.isEmpty()) {
                return new ImportPlan(cols, longLayout, List.of(), List.of(), List.of(), List.of(), fileProblems);
            }
            Map<String, Pending> pending = new LinkedHashMap<>();
            Map<String, Pending> byRawKey = new HashMap<>();
            Map<String, Long> wideKeys = new HashMap<>();
            for (CSVRecord rec : parser) {
                long line = parser.getCurrentLineNumber();
                if (rec.size() != cols.size()) {
                    reports.add(new ImportPlan.RowReport(line, ImportPlan.Outcome.REJECTED, "the row has " + rec.size()
                            + " cells but the header has " + cols.size() + "; check the delimiter and the quotes"));
                    continue;
                }
                // rows of one visit repeat the same who/when/by-whom cells: place them once
                String rawKey = rawKey(rec);
                Pending same = byRawKey.get(rawKey);
                if (same != null && longLayout) {
                    same.lines.add(line);
                    values(rec, line, same);
                    continue;
                }
                List<String> why = new ArrayList<>(2);
                Pending head = head(rec, line, why);
                if (head == null) {
                    reports.add(new ImportPlan.RowReport(line, ImportPlan.Outcome.REJECTED, String.join("; ", why)));
                    continue;
                }
                String key = head.personId + "|" + head.newIndex + "|" + head.when + "|"
                        + (head.measurer != null ? head.measurer.id() : head.newMeasurer);
                if (head.personId > 0 && head.measurer != null
                        && existingVisits.contains(head.personId + "|" + head.when + "|" + head.measurer.id())) {
                    reports.add(new ImportPlan.RowReport(line, ImportPlan.Outcome.SKIPPED,
                            "this visit is already in the file"));
                    continue;
                }
                if (!longLayout) {
                    Long earlier = wideKeys.putIfAbsent(key, line);
                    if (earlier != null) {
                        reports.add(new ImportPlan.RowReport(line, ImportPlan.Outcome.REJECTED,
                                "the same visit as line " + earlier + " (person, date, time and measurer)"));
                        continue;
                    }
                }
                Pending p = pending.computeIfAbsent(key, k -> head);
                byRawKey.put(rawKey, p);
                p.lines.add(line);
                values(rec, line, p);
            }
            List<ImportPlan.PlannedVisit> visits = new ArrayList<>();
            for (Pending p : pending.values()) {
                List<SiteTrials> trials = new ArrayList<>();
                p.trials.forEach((site, vals) -> {
                    List<Double> v = new ArrayList<>();
                    for (Double d : vals) {
                        if (d != null) {
                            v.add(d);
                        }
                    }
                    if (!v.isEmpty()) {
                        trials.add(new SiteTrials(site, v));
                    }
                });
                VisitEvaluation ev = VisitCheck.evaluate(trials);
                for (Problem pr : ev.problems()) {
                    p.problems.add(pr.message());
                }
                if (trials.isEmpty() && p.problems.isEmpty()) {
                    p.problems.add("no measurement in the row");
                }
                boolean ok = p.problems.isEmpty();
                for (long l : p.lines) {
                    reports.add(new ImportPlan.RowReport(l, ok ? ImportPlan.Outcome.IMPORTED : ImportPlan.Outcome.REJECTED,
                            ok ? "" : String.join(" ", p.problems)));
                }
                if (ok) {
                    visits.add(new ImportPlan.PlannedVisit(p.personId, p.newIndex,
                            p.measurer == null ? 0 : p.measurer.id(), p.newMeasurer,
                            new Visit(0, Math.max(0, p.personId), p.when, p.measurer == null ? 0 : p.measurer.id(),
                                    p.context, "", trials)));
                }
            }
            reports.sort((a, b) -> Long.compare(a.line(), b.line()));
            if (reports.isEmpty()) {
                fileProblems.add("It has a header but no rows.");
            }
            return new ImportPlan(cols, longLayout, reports, visits, newPeople, newMeasurers, fileProblems);
        }

        /** The cells that say who, when and by whom, joined: equal keys mean the same visit. */
        private String rawKey(CSVRecord rec) {
            StringBuilder sb = new StringBuilder(64);
            for (Column.Role r : KEY_ROLES) {
                sb.append(cell(rec, r)).append('\u241f');
            }
            return sb.toString();
        }

        /** Who, when and by whom; null (with the reasons) when the row cannot be placed. */
        private Pending head(CSVRecord rec, long line, List<String> why) {
            long personId = 0;
            int newIndex = -1;
            String idText = cell(rec, Column.Role.PERSON_ID);
            String name = cell(rec, Column.Role.NAME).strip();
            String dobText = cell(rec, Column.Role.BIRTH_DATE);
            Person known = null;
            if (!idText.isBlank() && col(Column.Role.NAME).isEmpty()) {
                try {
                    known = peopleById.get(Long.parseLong(idText.strip()));
                    if (known == null) {
                        why.add("there is no person with id " + idText.strip() + " in the file");
                    }
                } catch (NumberFormatException e) {
                    why.add("person id \"" + idText + "\" is not a number");
                }
            } else {
                LocalDate dob = date(dobText, "date of birth", why);
                if (name.isEmpty()) {
                    why.add("the name is empty");
                }
                if (dob != null && !name.isEmpty()) {
                    String key = foldCached(name) + "|" + dob;
                    known = peopleByKey.get(key);
                    if (known == null) {
                        Integer idx = newPeopleIndex.get(key);
                        if (idx != null) {
                            newIndex = idx;
                        } else if (!options.createMissing()) {
                            why.add(name + " (born " + dob + ") is not in the file; allow new people to add them");
                        } else {
                            String sexText = cell(rec, Column.Role.SEX).strip();
                            try {
                                Sex sex = Sex.ofCode(sexText.isEmpty() ? "?" : sexText.substring(0, 1));
                                newPeople.add(Person.draft(CsvSafety.untext(name), sex, dob));
                                newIndex = newPeople.size() - 1;
                                newPeopleIndex.put(key, newIndex);
                            } catch (IllegalArgumentException e) {
                                why.add("a new person needs sex F or M, not \"" + sexText + "\"");
                            }
                        }
                    }
                }
            }
            if (known != null) {
                personId = known.id();
            }
            LocalDate day = date(cell(rec, Column.Role.DATE), "visit date", why);
            LocalTime time = LocalTime.of(9, 0);
            String timeText = cell(rec, Column.Role.TIME).strip();
            if (!timeText.isEmpty()) {
                LocalTime cachedTime = timesByText.get(timeText);
                if (cachedTime != null) {
                    time = cachedTime;
                } else {
                    try {
                        time = LocalTime.parse(timeText);
                        timesByText.put(timeText, time);
                    } catch (DateTimeParseException e) {
                        why.add("time \"" + timeText + "\" is not hh:mm");
                    }
                }
            }
            if (day != null && known != null && day.isBefore(known.birthDate())) {
                why.add("the visit date " + day + " is before the date of birth");
            }
            String mName = cell(rec, Column.Role.MEASURER).strip();
            Measurer m = measurersByName.get(foldCached(mName));
            String newM = null;
            if (mName.isEmpty()) {
                why.add("the measurer is empty");
            } else if (m == null) {
                if (!options.createMissing()) {
                    why.add("measurer " + mName + " is not in the file; allow new measurers to add them");
                } else {
                    String f = foldCached(mName);
                    newM = newMeasurerByFold.get(f);
                    if (newM == null) {
                        newMeasurers.add(mName);
                        newMeasurerByFold.put(f, mName);
                        newM = mName;
                    }
                }
            }
            if (!why.isEmpty()) {
                return null;
            }
            return new Pending(personId, newIndex, m, newM, LocalDateTime.of(day, time), cell(rec, Column.Role.CONTEXT),
                    line);
        }

        private void values(CSVRecord rec, long line, Pending p) {
            if (longLayout) {
                String siteText = cell(rec, Column.Role.SITE_NAME);
                Optional<Site> site = sitesByText.computeIfAbsent(siteText, ColumnMapper::siteNamed);
                if (site.isEmpty()) {
                    p.problems.add("line " + line + ": \"" + siteText + "\" is not a site Shapetrail knows");
                    return;
                }
                int trial = 1;
                String tt = cell(rec, Column.Role.TRIAL_NUMBER).strip();
                if (!tt.isEmpty()) {
                    try {
                        trial = Integer.parseInt(tt);
                    } catch (NumberFormatException e) {
                        trial = 0;
                    }
                    if (trial < 1 || trial > 3) {
                        p.problems.add("line " + line + ": trial \"" + tt + "\" must be 1, 2 or 3");
                        return;
                    }
                }
                InputUnit unit = null;
                String ut = cell(rec, Column.Role.UNIT).strip();
                if (!ut.isEmpty()) {
                    unit = InputUnit.parse(ut).filter(u -> u.fits(site.get())).orElse(null);
                    if (unit == null) {
                        p.problems.add("line " + line + ": unit \"" + ut + "\" does not fit " + site.get().label());
                        return;
                    }
                }
                put(p, site.get(), trial, cell(rec, Column.Role.VALUE), unit, line);
                return;
            }
            for (int i = 0; i < cols.size(); i++) {
                Column c = cols.get(i);
                if (c.role() == Column.Role.SITE_VALUE && !rec.get(i).isBlank()) {
                    put(p, c.site(), Math.max(1, c.trial()), rec.get(i), c.unit(), line);
                }
            }
        }

        private void put(Pending p, Site site, int trial, String text, InputUnit unit, long line) {
            ValueParser.Parsed v = ValueParser.parse(site, text, decimals);
            if (!v.ok()) {
                p.problems.add((longLayout ? "line " + line + ": " : "") + v.problem().message());
                return;
            }
            double value = unit == null ? v.value() : unit.toSiteUnit(v.value(), site);
            Double[] slots = p.trials.computeIfAbsent(site, s -> new Double[3]);
            if (slots[trial - 1] != null) {
                p.problems.add((longLayout ? "line " + line + ": " : "") + site.label() + " trial " + trial
                        + " appears twice for this visit");
                return;
            }
            slots[trial - 1] = value;
        }

        private LocalDate date(String text, String what, List<String> why) {
            Object cached = datesByText.get(text);
            if (cached instanceof LocalDate d) {
                return d;
            }
            LocalDate d = parseDate(text, what, why);
            if (d != null) {
                datesByText.put(text, d);
            }
            return d;
        }

        private LocalDate parseDate(String text, String what, List<String> why) {
            String t = text == null ? "" : text.strip();
            if (t.isEmpty()) {
                why.add("the " + what + " is empty");
                return null;
            }
            List<DateTimeFormatter> fs = options.monthFirst()
                    ? List.of(DateTimeFormatter.ISO_LOCAL_DATE, MDY, DMY_DOT)
                    : List.of(DateTimeFormatter.ISO_LOCAL_DATE, DMY, DMY_DOT, DMY_DASH);
            for (DateTimeFormatter f : fs) {
                try {
                    return LocalDate.parse(t.length() > 10 && t.charAt(10) == 'T' ? t.substring(0, 10) : t, f);
                } catch (DateTimeParseException e) {
                    // try the next format
                }
            }
            why.add("the " + what + " \"" + t + "\" is not a date (use 2024-03-05 or 05/03/2024)");
            return null;
        }
    }
}
