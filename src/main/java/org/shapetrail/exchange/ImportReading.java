package org.shapetrail.exchange;

import static org.shapetrail.i18n.Messages.tr;

import java.io.IOException;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.ValueParser;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitDate;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Person;
import org.shapetrail.store.TextRules;
import org.shapetrail.store.Visit;

/**
 * One pass over the rows of an import: places each row in its visit, parses and checks every value,
 * checks each visit with the core when the reading leaves it, and (when writing) hands everything to an
 * {@link ImportStream} as it goes. The outcome is an {@link ImportPlan}.
 */
final class ImportReading {
    private static final DateTimeFormatter DMY_DOT = DateTimeFormatter.ofPattern("d.M.uuuu");
    private static final DateTimeFormatter DMY = DateTimeFormatter.ofPattern("d/M/uuuu");
    private static final DateTimeFormatter MDY = DateTimeFormatter.ofPattern("M/d/uuuu");
    private static final DateTimeFormatter DMY_DASH = DateTimeFormatter.ofPattern("d-M-uuuu");

    private static final List<Column.Role> KEY_ROLES = List.of(Column.Role.PERSON_ID, Column.Role.NAME,
            Column.Role.BIRTH_DATE, Column.Role.SEX, Column.Role.LETTER_LANGUAGE, Column.Role.DATE, Column.Role.TIME, Column.Role.MEASURER,
            Column.Role.CONTEXT);

    private static final Site[] SITES = Site.values();
    private final ImportOptions options;
    private final DecimalStyle decimals;
    private final List<Column> cols;
    private final boolean longLayout;
    private final ImportStream stream;
    private final Map<String, Person> peopleByKey = new HashMap<>();
    private final Map<Long, Person> peopleById = new HashMap<>();
    private final Map<String, Measurer> measurersByName = new HashMap<>();
    private final Set<String> existingVisits = new HashSet<>();
    private final List<Person> newPeople = new ArrayList<>();
    private final Map<String, Integer> newPeopleIndex = new HashMap<>();
    private final List<String> newMeasurers = new ArrayList<>();
    private final RowLog log = new RowLog();
    private final LocalDate today = LocalDate.now();
    // a large file repeats the same names, dates and sites on every row: work each out once
    private final Map<String, String> folded = new HashMap<>();
    private final Map<String, Optional<Site>> sitesByText = new HashMap<>();
    private final List<byte[]> siteBytes = new ArrayList<>();
    private final List<Optional<Site>> sitesFound = new ArrayList<>();
    private final Map<String, Object> datesByText = new HashMap<>();
    private final Map<String, String> newMeasurerByFold = new HashMap<>();
    private final Map<String, LocalTime> timesByText = new HashMap<>();
    private final Map<Column.Role, Integer> index = new java.util.EnumMap<>(Column.Role.class);
    /** Columns of the cells that say who, when and by whom. */
    private final int[] keyColumns;
    private final int[] siteColumns;
    private final List<Pending> visits = new ArrayList<>();

    /** A visit's trials and every problem the core finds in them. */
    private record Checked(List<SiteTrials> trials, List<String> problems) {
    }

    /** What an early check leaves: only its problems (usually none); the trials are made again when needed. */
    private static final List<String> NO_PROBLEMS = List.of();

    /** Where each site's trials go in a visit's values: the sites of a file get slots as they appear. */
    private final int[] slotOfSite = new int[SITES.length];
    private int usedSites;
    private Pending current;

    private static double[] noValues(int sites) {
        double[] v = new double[Math.max(1, sites) * SiteTrials.MAX_TRIALS];
        java.util.Arrays.fill(v, Double.NaN);
        return v;
    }

    /** The reading moves to rows of {@code p}: the visit it leaves is checked now, while the writer works. */
    private void enter(Pending p) {
        if (p == current) {
            return;
        }
        if (current != null) {
            send(current);
            if (current.checked == null && !current.reopened && current.problems == null) {
                List<String> found = check(current).problems();
                current.checked = found.isEmpty() ? NO_PROBLEMS : found;
            }
        }
        if (p.checked != null) {
            p.checked = null;
            p.reopened = true;
        }
        current = p;
    }

    /**
     * The visits to be written, made on demand from the compact ones read: a million trials kept as
     * boxed numbers would keep the collector busy for the whole import.
     */
    private final class PlannedVisits extends java.util.AbstractList<ImportPlan.PlannedVisit>
            implements java.util.RandomAccess {
        private final List<Pending> ok;

        PlannedVisits(List<Pending> ok) {
            this.ok = ok;
        }

        @Override
        public ImportPlan.PlannedVisit get(int i) {
            Pending p = ok.get(i);
            long measurerId = p.measurer == null ? 0 : p.measurer.id();
            return new ImportPlan.PlannedVisit(p.personId, p.newIndex, measurerId, p.newMeasurer,
                    new Visit(0, Math.max(0, p.personId), p.when, measurerId, p.context, "",
                            trialsOf(p, new ArrayList<>(0))));
        }

        @Override
        public int size() {
            return ok.size();
        }
    }

    /** The sites in the order of their codes, which is the order of the trial table's key. */
    static {
        if (SITES.length * SiteTrials.MAX_TRIALS > Long.SIZE) {
            throw new ExceptionInInitializerError("Pending.sent holds one bit per site and trial");
        }
    }

    private static final Site[] SITES_BY_CODE = java.util.Arrays.stream(SITES)
            .sorted(java.util.Comparator.comparing(Site::code)).toArray(Site[]::new);

    /**
     * Hands the visit's values not yet written to the writer, in the order of the trial table's key, so
     * that SQLite appends them at the end of the table instead of splitting pages in its middle.
     */
    private void send(Pending p) {
        if (stream == null || stream.stopped()) {
            return;
        }
        if (!p.rowSent) {
            stream.visit(p.index, p.personId, p.newIndex, p.measurer == null ? 0 : p.measurer.id(), p.newMeasurer,
                    p.when, p.context, Long.bitCount(valuesMask(p)));
            p.rowSent = true;
        }
        for (Site site : SITES_BY_CODE) {
            int slot = slotOfSite[site.ordinal()] - 1;
            if (slot < 0 || (slot + 1) * SiteTrials.MAX_TRIALS > p.values.length) {
                continue;
            }
            for (int t = 0; t < SiteTrials.MAX_TRIALS; t++) {
                int at = slot * SiteTrials.MAX_TRIALS + t;
                if (!Double.isNaN(p.values[at]) && (p.sent & (1L << at)) == 0) {
                    stream.trial(p.index, site, t + 1, p.values[at]);
                    p.sent |= 1L << at;
                }
            }
        }
    }

    /** One bit per value the visit holds, as in {@link Pending#sent}. */
    private static long valuesMask(Pending p) {
        long m = 0;
        for (int at = 0; at < p.values.length; at++) {
            if (!Double.isNaN(p.values[at])) {
                m |= 1L << at;
            }
        }
        return m;
    }

    /** Who was measured, when and by whom, as one row says. */
    private static final class Head {
        final long personId;
        final int newIndex;
        final Measurer measurer;
        final String newMeasurer;
        final LocalDateTime when;
        final String context;

        Head(long personId, int newIndex, Measurer measurer, String newMeasurer, LocalDateTime when, String context) {
            this.personId = personId;
            this.newIndex = newIndex;
            this.measurer = measurer;
            this.newMeasurer = newMeasurer;
            this.when = when;
            this.context = context;
        }
    }

    /** A visit being gathered from rows; {@code index} is its place in the plan. */
    private final class Pending {
        final int index;
        final long personId;
        final int newIndex;
        final Measurer measurer;
        final String newMeasurer;
        final LocalDateTime when;
        final String context;
        /** Trial values by the file's site slot (slot × 3 + trial − 1); NaN where none was given. */
        double[] values = noValues(usedSites);
        /** Problems of its rows, found while reading: such a visit is rejected whatever comes later. */
        List<String> problems;
        /** The problems of its trials, found when the reading moved on to another visit; null until then. */
        List<String> checked;
        /** True when rows of it came after another visit's: it is checked once, at the end. */
        boolean reopened;
        /** The values already handed to the writer, one bit per place in {@link #values}. */
        long sent;
        /** True once the visit's row was handed to the writer. */
        boolean rowSent;

        Pending(int index, long personId, int newIndex, Measurer m, String newMeasurer, LocalDateTime when,
                String context) {
            this.index = index;
            this.personId = personId;
            this.newIndex = newIndex;
            this.measurer = m;
            this.newMeasurer = newMeasurer;
            this.when = when;
            this.context = context;
        }

        void problem(String why) {
            if (problems == null) {
                problems = new ArrayList<>(2);
            }
            problems.add(why);
            rejected();
        }
    }

    ImportReading(Academy existing, ImportOptions options, DecimalStyle decimals, List<Column> cols, ImportStream stream) {
        this.options = options;
        this.decimals = decimals;
        this.cols = cols;
        this.stream = stream;
        this.longLayout = cols.stream().anyMatch(c -> c.role() == Column.Role.SITE_NAME);
        for (int i = cols.size() - 1; i >= 0; i--) {
            index.put(cols.get(i).role(), i);
        }
        keyColumns = KEY_ROLES.stream().filter(index::containsKey).mapToInt(index::get).toArray();
        siteColumns = java.util.stream.IntStream.range(0, cols.size())
                .filter(i -> cols.get(i).role() == Column.Role.SITE_VALUE).toArray();
        for (Person p : existing.people()) {
            peopleById.put(p.id(), p);
            peopleByKey.put(Importer.fold(p.displayName()) + "|" + p.birthDate(), p);
        }
        for (Measurer m : existing.measurers()) {
            measurersByName.put(Importer.fold(m.name()), m);
        }
        for (Visit v : existing.visits()) {
            existingVisits.add(v.personId() + "|" + v.measuredAt() + "|" + v.measurerId());
        }
    }

    /** Something is rejected: the import will not be written, so streaming its trials can stop. */
    private void rejected() {
        if (stream != null) {
            stream.stop();
        }
    }

    private void ownRow(long line, ImportPlan.Outcome outcome, String reason) {
        log.ownRow(line, outcome, reason);
        if (outcome == ImportPlan.Outcome.REJECTED) {
            rejected();
        }
    }

    private Optional<Column> col(Column.Role r) {
        Integer i = index.get(r);
        return i == null ? Optional.empty() : Optional.of(cols.get(i));
    }

    private String cell(CsvRows rec, Column.Role r) {
        Integer i = index.get(r);
        return i == null || i >= rec.size() ? "" : CsvSafety.untext(rec.get(i));
    }

    private String foldCached(String s) {
        return folded.computeIfAbsent(s, Importer::fold);
    }

    ImportPlan read(CsvRows rec) throws IOException {
        List<String> fileProblems = new ArrayList<>();
        boolean who = col(Column.Role.PERSON_ID).isPresent()
                || (col(Column.Role.NAME).isPresent() && col(Column.Role.BIRTH_DATE).isPresent());
        if (!who) {
            fileProblems.add(tr("reading.noWho"));
        }
        if (col(Column.Role.DATE).isEmpty()) {
            fileProblems.add(tr("reading.noDate"));
        }
        if (col(Column.Role.MEASURER).isEmpty()) {
            fileProblems.add(tr("reading.noMeasurer"));
        }
        if (longLayout && (col(Column.Role.VALUE).isEmpty())) {
            fileProblems.add(tr("reading.noValueColumn"));
        }
        if (!longLayout && siteColumns.length == 0) {
            fileProblems.add(tr("reading.noMeasurement"));
        }
        if (!fileProblems.isEmpty()) {
            return ImportPlan.failed(cols, longLayout, fileProblems);
        }
        Map<String, Pending> pending = new HashMap<>();
        Map<String, Long> wideKeys = new HashMap<>();
        // the previous row's key cells and where that row went: rows of one visit usually follow each other
        Pending previous = null;
        ImportPlan.RowReport previousOwn = null;
        boolean havePrevious = false;
        while (rec.next()) {
            long line = rec.line();
            if (rec.size() != cols.size()) {
                ownRow(line, ImportPlan.Outcome.REJECTED, tr("reading.cells", rec.size(), cols.size()));
                havePrevious = false;
                continue;
            }
            if (longLayout && havePrevious && rec.sameAsRemembered(keyColumns)) {
                if (previous != null) {
                    log.visitRow(line, previous.index);
                    enter(previous);
                    values(rec, line, previous);
                } else {
                    ownRow(line, previousOwn.outcome(), previousOwn.reason());
                }
                continue;
            }
            rec.remember(keyColumns);
            havePrevious = true;
            previous = null;
            List<String> why = new ArrayList<>(2);
            Head head = head(rec, why);
            if (head == null) {
                previousOwn = new ImportPlan.RowReport(line, ImportPlan.Outcome.REJECTED, String.join("; ", why));
                ownRow(line, previousOwn.outcome(), previousOwn.reason());
                continue;
            }
            String key = head.personId + "|" + head.newIndex + "|" + head.when + "|"
                    + (head.measurer != null ? head.measurer.id() : head.newMeasurer);
            if (head.personId > 0 && head.measurer != null
                    && existingVisits.contains(head.personId + "|" + head.when + "|" + head.measurer.id())) {
                previousOwn = new ImportPlan.RowReport(line, ImportPlan.Outcome.SKIPPED,
                        tr("reading.already"));
                ownRow(line, previousOwn.outcome(), previousOwn.reason());
                continue;
            }
            if (!longLayout) {
                Long earlier = wideKeys.putIfAbsent(key, line);
                if (earlier != null) {
                    ownRow(line, ImportPlan.Outcome.REJECTED,
                            tr("reading.sameAs", String.valueOf(earlier)));
                    continue;
                }
            }
            Pending p = pending.get(key);
            if (p == null) {
                p = new Pending(visits.size(), head.personId, head.newIndex, head.measurer, head.newMeasurer,
                        head.when, head.context);
                pending.put(key, p);
                visits.add(p);
            }
            previous = p;
            log.visitRow(line, p.index);
            enter(p);
            values(rec, line, p);
        }
        if (stream != null) {
            for (Pending p : visits) {
                send(p); // the last visit, and those whose rows came apart
            }
        }
        return finish(fileProblems);
    }

    /** Checks each gathered visit with the core and gives every row its outcome. */
    private ImportPlan finish(List<String> fileProblems) {
        List<Pending> planned = new ArrayList<>(visits.size());
        String[] reasons = new String[visits.size()];
        for (Pending p : visits) {
            if (p.problems == null) {
                List<String> found = p.checked != null ? p.checked : check(p).problems();
                if (!found.isEmpty()) {
                    found.forEach(p::problem);
                } else {
                    planned.add(p);
                }
            }
            if (p.problems != null) {
                // each reason a sentence of its own, so several read apart
                reasons[p.index] = String.join(" ", p.problems.stream().map(w -> w.endsWith(".") ? w : w + ".")
                        .toList());
            }
        }
        if (log.size() == 0) {
            fileProblems.add(tr("reading.noRows"));
        }
        return new ImportPlan(cols, longLayout, log.resolve(reasons), new PlannedVisits(planned), newPeople, newMeasurers,
                fileProblems, 0);
    }

    /**
     * The visit's trials, checked by the core: when writing, by the store's bulk writer itself, so that
     * the writer need not check them again before the commit.
     */
    private Checked check(Pending p) {
        List<String> problems = new ArrayList<>(0);
        List<SiteTrials> trials = trialsOf(p, problems);
        if (problems.isEmpty()) {
            List<Problem> found = stream != null ? stream.check(p.index, trials)
                    : VisitCheck.evaluate(trials).problems();
            for (Problem pr : found) {
                problems.add(pr.message());
            }
            if (trials.isEmpty()) {
                problems.add(tr("reading.noValues"));
            }
        }
        return new Checked(trials, problems);
    }

    /** The visit's trials by site, in the order of the sites; a gap in a site's trial numbers goes to {@code problems}. */
    private List<SiteTrials> trialsOf(Pending p, List<String> problems) {
        List<SiteTrials> trials = new ArrayList<>();
        for (Site site : SITES) {
            int slot = slotOfSite[site.ordinal()] - 1;
            if (slot < 0 || (slot + 1) * SiteTrials.MAX_TRIALS > p.values.length) {
                continue;
            }
            int at = slot * SiteTrials.MAX_TRIALS;
            List<Double> vs = null;
            boolean gap = false;
            for (int t = 0; t < SiteTrials.MAX_TRIALS; t++) {
                double v = p.values[at + t];
                if (Double.isNaN(v)) {
                    continue;
                }
                if (vs == null) {
                    vs = new ArrayList<>(SiteTrials.MAX_TRIALS);
                }
                if (vs.size() != t && !gap) {
                    gap = true;
                    problems.add(tr("reading.trialGap", site.shown(), t + 1, vs.size() + 1));
                }
                vs.add(v);
            }
            if (vs != null) {
                trials.add(new SiteTrials(site, vs));
            }
        }
        return trials;
    }

    /** Who, when and by whom; null (with the reasons) when the row cannot be placed. */
    private Head head(CsvRows rec, List<String> why) {
        long personId = 0;
        int newIndex = -1;
        String idText = cell(rec, Column.Role.PERSON_ID).strip();
        String name = cell(rec, Column.Role.NAME).strip();
        String dobText = cell(rec, Column.Role.BIRTH_DATE);
        String sexText = cell(rec, Column.Role.SEX).strip();
        String language = cell(rec, Column.Role.LETTER_LANGUAGE).strip().toLowerCase(java.util.Locale.ROOT);
        if (!Person.LETTER_LANGUAGES.contains(language)) {
            why.add(tr("reading.language", language));
            language = "";
        }
        Person known = null;
        LocalDate birth = null;
        Person byId = null;
        boolean idGiven = !idText.isEmpty() && col(Column.Role.PERSON_ID).isPresent();
        if (idGiven) {
            try {
                byId = peopleById.get(Long.parseLong(idText));
            } catch (NumberFormatException e) {
                why.add(tr("reading.idNotNumber", idText));
            }
        }
        if (col(Column.Role.NAME).isEmpty()) {
            known = byId;
            if (idGiven && byId == null && why.isEmpty()) {
                why.add(tr("reading.noId", idText));
            } else if (!idGiven) {
                why.add(tr("reading.idEmpty"));
            }
        } else {
            LocalDate dob = date(dobText, tr("reading.what.birth"), why);
            if (name.isEmpty()) {
                why.add(tr("reading.nameEmpty"));
            }
            TextRules.problem(TextRules.Field.PERSON_NAME, name).ifPresent(why::add);
            if (dob != null && !name.isEmpty() && why.isEmpty()) {
                String key = foldCached(name) + "|" + dob;
                Person byName = peopleByKey.get(key);
                if (idGiven && byId == null && byName != null) {
                    why.add(tr("reading.idNotHere", idText, String.valueOf(byName.id()), byName.displayName()));
                } else if (byId != null && byName != byId) {
                    why.add(tr("reading.idOther", idText, byId.displayName(), byId.birthDate(), name, dob,
                            byName == null ? "" : tr("reading.whoIs", String.valueOf(byName.id()))));
                } else {
                    known = byName;
                }
                birth = dob;
                if (known == null && why.isEmpty()) {
                    Integer idx = newPeopleIndex.get(key);
                    if (idx != null) {
                        newIndex = idx;
                        String earlier = newPeople.get(idx).letterLanguage();
                        if (!language.isEmpty() && !language.equals(earlier)) {
                            why.add(tr("reading.languageRows", language, name, earlier.isEmpty()
                                    ? tr("reading.emptyWord") : earlier));
                        }
                    } else if (!options.createMissing()) {
                        why.add(tr("reading.newPerson", name, dob));
                    } else {
                        try {
                            Sex sex = Sex.ofCode(sexText.isEmpty() ? "?" : sexText.substring(0, 1));
                            if (sexText.length() > 1 && !sexText.equalsIgnoreCase("female")
                                    && !sexText.equalsIgnoreCase("male")) {
                                throw new IllegalArgumentException(sexText);
                            }
                            newPeople.add(Person.draft(name, sex, dob).withLetterLanguage(language));
                            if (stream != null) {
                                stream.person(newPeople.get(newPeople.size() - 1));
                            }
                            newIndex = newPeople.size() - 1;
                            newPeopleIndex.put(key, newIndex);
                        } catch (IllegalArgumentException e) {
                            why.add(tr("reading.newSex", sexText));
                        }
                    }
                }
            }
        }
        if (known != null) {
            personId = known.id();
            birth = known.birthDate();
            if (!language.isEmpty() && !language.equals(known.letterLanguage())) {
                why.add(tr("reading.languageFile", language, known.displayName(), known.letterLanguage().isEmpty()
                        ? tr("reading.academyLanguage") : known.letterLanguage()));
            }
            if (!sexText.isEmpty()) {
                Optional<Sex> sex = sexOf(sexText);
                if (sex.isEmpty()) {
                    why.add(tr("reading.sexWord", sexText, known.displayName()));
                } else if (sex.get() != known.sex()) {
                    why.add(tr("reading.sexFile", sex.get().code(), known.displayName(), known.sex().code()));
                }
            }
        }
        LocalDate day = date(cell(rec, Column.Role.DATE), tr("reading.what.visit"), why);
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
                    why.add(tr("reading.time", timeText));
                }
            }
        }
        if (day != null) {
            VisitDate.check(birth, day, today).ifPresent(p -> why.add(lower(p.message())));
        }
        String context = cell(rec, Column.Role.CONTEXT);
        TextRules.problem(TextRules.Field.CONTEXT, context).ifPresent(why::add);
        String mName = cell(rec, Column.Role.MEASURER).strip();
        Measurer m = measurersByName.get(foldCached(mName));
        String newM = null;
        if (mName.isEmpty()) {
            why.add(tr("reading.measurerEmpty"));
        } else if (m == null) {
            if (!options.createMissing()) {
                why.add(tr("reading.newMeasurer", mName));
            } else if (TextRules.problem(TextRules.Field.MEASURER_NAME, mName).isPresent()) {
                why.add(TextRules.problem(TextRules.Field.MEASURER_NAME, mName).get());
            } else {
                String f = foldCached(mName);
                newM = newMeasurerByFold.get(f);
                if (newM == null) {
                    newMeasurers.add(mName);
                    if (stream != null) {
                        stream.measurer(mName);
                    }
                    newMeasurerByFold.put(f, mName);
                    newM = mName;
                }
            }
        }
        if (!why.isEmpty()) {
            return null;
        }
        return new Head(personId, newIndex, m, newM, LocalDateTime.of(day, time), context);
    }

    /** F/M/female/male in any case; empty for anything else. */
    private static Optional<Sex> sexOf(String text) {
        String t = text.strip().toLowerCase(java.util.Locale.ROOT);
        return switch (t) {
            case "f", "female" -> Optional.of(Sex.FEMALE);
            case "m", "male" -> Optional.of(Sex.MALE);
            default -> Optional.empty();
        };
    }

    private static String lower(String sentence) {
        String s = sentence.endsWith(".") ? sentence.substring(0, sentence.length() - 1) : sentence;
        return Character.toLowerCase(s.charAt(0)) + s.substring(1);
    }

    private void values(CsvRows rec, long line, Pending p) {
        if (longLayout) {
            int siteColumn = index.get(Column.Role.SITE_NAME);
            Optional<Site> site = siteIn(rec, siteColumn);
            if (site.isEmpty()) {
                p.problem(tr("reading.line", String.valueOf(line)) + tr("reading.unknownSite",
                        cell(rec, Column.Role.SITE_NAME)));
                return;
            }
            int trial = 1;
            Integer trialColumn = index.get(Column.Role.TRIAL_NUMBER);
            int digit = trialColumn == null ? -1 : rec.digit(trialColumn);
            if (digit >= 1 && digit <= 3) {
                trial = digit;
            } else if (trialColumn != null && !cell(rec, Column.Role.TRIAL_NUMBER).isBlank()) {
                String tt = cell(rec, Column.Role.TRIAL_NUMBER).strip();
                try {
                    trial = Integer.parseInt(tt);
                } catch (NumberFormatException e) {
                    trial = 0;
                }
                if (trial < 1 || trial > 3) {
                    p.problem(tr("reading.line", String.valueOf(line)) + tr("reading.trialNumber", tt));
                    return;
                }
            }
            InputUnit unit = null;
            String ut = cell(rec, Column.Role.UNIT).strip();
            if (!ut.isEmpty()) {
                unit = InputUnit.parse(ut).filter(u -> u.fits(site.get())).orElse(null);
                if (unit == null) {
                    p.problem(tr("reading.line", String.valueOf(line)) + tr("reading.unit", ut, site.get().shown()));
                    return;
                }
            }
            put(p, site.get(), trial, rec, index.get(Column.Role.VALUE), unit, line);
            return;
        }
        for (int i : siteColumns) {
            Column c = cols.get(i);
            if (!rec.get(i).isBlank()) {
                put(p, c.site(), Math.max(1, c.trial()), rec, i, c.unit(), line);
            }
        }
    }

    /** The site a long-layout row names; the few site names of a file are matched by their bytes. */
    private Optional<Site> siteIn(CsvRows rec, int column) {
        for (int k = 0; k < siteBytes.size(); k++) {
            if (rec.sameBytes(column, siteBytes.get(k))) {
                return sitesFound.get(k);
            }
        }
        Optional<Site> site = sitesByText.computeIfAbsent(CsvSafety.untext(rec.get(column)), ColumnMapper::siteNamed);
        byte[] bytes = rec.bytes(column);
        if (bytes != null && siteBytes.size() < 64) {
            siteBytes.add(bytes);
            sitesFound.add(site);
        }
        return site;
    }

    /** Reads the value in {@code column} and keeps it as the visit's trial; a plain decimal is read from bytes. */
    private void put(Pending p, Site site, int trial, CsvRows rec, int column, InputUnit unit, long line) {
        double read = rec.plainDecimal(column, decimals.separator());
        if (Double.isNaN(read)) {
            ValueParser.Parsed v = ValueParser.parse(site, CsvSafety.untext(rec.get(column)), decimals);
            if (!v.ok()) {
                p.problem((longLayout ? tr("reading.line", String.valueOf(line)) : "") + v.problem().message());
                return;
            }
            read = v.value();
        }
        double value = unit == null ? read : unit.toSiteUnit(read, site);
        int slot = slotOfSite[site.ordinal()] - 1;
        if (slot < 0) {
            slot = usedSites++;
            slotOfSite[site.ordinal()] = slot + 1;
        }
        if (p.values.length < (slot + 1) * SiteTrials.MAX_TRIALS) {
            double[] more = noValues(usedSites);
            System.arraycopy(p.values, 0, more, 0, p.values.length);
            p.values = more;
        }
        int at = slot * SiteTrials.MAX_TRIALS + trial - 1;
        if (!Double.isNaN(p.values[at])) {
            p.problem((longLayout ? tr("reading.line", String.valueOf(line)) : "") + tr("reading.twice", site.shown(),
                    trial));
            return;
        }
        p.values[at] = value;
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
            why.add(tr("reading.dateEmpty", what));
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
        why.add(tr("reading.notDate", what, t));
        return null;
    }
}
