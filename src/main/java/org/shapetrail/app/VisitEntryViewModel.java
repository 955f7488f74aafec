package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.history.VisitResult;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.ProblemKind;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.ValueParser;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;
import org.shapetrail.somatotype.Distances;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.SomatotypeRater;
import org.shapetrail.store.Database;
import org.shapetrail.store.InvalidVisitException;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Person;
import org.shapetrail.store.RatingMethod;
import org.shapetrail.store.Visit;
import org.shapetrail.store.VisitRating;

/**
 * The visit entry form: sites in measurement order with trials 1 and 2, a third trial only where the
 * ISAK rule asks for it, every problem collected as you type, the live somatotype and the verdict against
 * the previous visit; Save only when nothing is wrong, and then the visit is written whole.
 */
public final class VisitEntryViewModel {
    /** The sites of the form, in the order they are measured. */
    public static final List<Site> SITES = List.of(Site.BODY_MASS, Site.STATURE, Site.SITTING_HEIGHT, Site.TRICEPS,
            Site.SUBSCAPULAR, Site.SUPRASPINALE, Site.MEDIAL_CALF, Site.ARM_FLEXED, Site.CALF, Site.HUMERUS, Site.FEMUR);

    /** The text fields of one site and what the form says about it. */
    public static final class SiteFields {
        final Site site;
        final StringProperty first = new SimpleStringProperty("");
        final StringProperty second = new SimpleStringProperty("");
        final StringProperty third = new SimpleStringProperty("");
        final ReadOnlyBooleanWrapper thirdWanted = new ReadOnlyBooleanWrapper(false);
        final StringProperty message = new SimpleStringProperty("");

        SiteFields(Site site) {
            this.site = site;
        }

        public Site site() {
            return site;
        }

        public StringProperty first() {
            return first;
        }

        public StringProperty second() {
            return second;
        }

        public StringProperty third() {
            return third;
        }

        /** True when the first two trials differ by more than the tolerance (or a third was typed). */
        public javafx.beans.property.ReadOnlyBooleanProperty thirdWanted() {
            return thirdWanted.getReadOnlyProperty();
        }

        public StringProperty message() {
            return message;
        }
    }

    private final Person person;
    private final RecordSource file;
    private final HistoryBuilder builder;
    private final PersonHistory history;
    private final Locale locale;
    private final Visit editing;
    /** The edited visit as it was stored when the form opened: the save is refused if someone saved it since. */
    private final org.shapetrail.store.RowStamp seen;
    private final javafx.beans.property.BooleanProperty reloadOffered = new javafx.beans.property.SimpleBooleanProperty(false);
    private final List<SiteFields> fields = new ArrayList<>();
    private final ObjectProperty<LocalDate> date = new SimpleObjectProperty<>(LocalDate.now());
    private final ObjectProperty<Measurer> measurer = new SimpleObjectProperty<>();
    private final StringProperty context = new SimpleStringProperty("");
    private final StringProperty raterEndo = new SimpleStringProperty("");
    private final StringProperty raterMeso = new SimpleStringProperty("");
    private final StringProperty raterEcto = new SimpleStringProperty("");
    private final StringProperty raterName = new SimpleStringProperty("");
    private final ObjectProperty<RatingMethod> raterMethod = new SimpleObjectProperty<>(RatingMethod.IN_PERSON);
    private final StringProperty liveRating = new SimpleStringProperty("");
    private final StringProperty liveVerdict = new SimpleStringProperty("");
    private final StringProperty raterComparison = new SimpleStringProperty("");
    private final ObservableList<String> problems = FXCollections.observableArrayList();
    private final BooleanProperty canSave = new SimpleBooleanProperty(false);
    private final BooleanProperty saving = new SimpleBooleanProperty(false);
    private final ObservableList<Measurer> measurers = FXCollections.observableArrayList();
    /** Set by the person after reading why today's date needs a second look ({@link #dateQuestion()}). */
    private final BooleanProperty dateConfirmed = new SimpleBooleanProperty(false);
    private final StringProperty dateQuestion = new SimpleStringProperty("");
    /** Days since the last visit under which a new visit today must be confirmed (four weeks; the rule). */
    public static final int CONFIRM_WITHIN_DAYS = 28;

    /**
     * @param editing the visit being edited, or null for a new one
     */
    public VisitEntryViewModel(RecordSource file, HistoryBuilder builder, PersonHistory history, Locale locale, Visit editing) {
        this(file, builder, history, locale, editing, null);
    }

    /**
     * @param editing the visit being edited (as stored when {@code seen} was read), or null for a new one
     * @param seen the edited visit's row stamp read with it: the save is refused if someone saved it since;
     *     null to save without that check
     */
    public VisitEntryViewModel(RecordSource file, HistoryBuilder builder, PersonHistory history, Locale locale,
            Visit editing, org.shapetrail.store.RowStamp seen) {
        this.person = history.person();
        this.file = file;
        this.builder = builder;
        this.history = history;
        this.locale = locale;
        this.editing = editing;
        this.seen = seen;
        measurers.setAll(builder.academy().measurers());
        if (!measurers.isEmpty()) {
            measurer.set(measurers.get(0));
        }
        for (Site s : SITES) {
            SiteFields f = new SiteFields(s);
            fields.add(f);
            f.first.addListener(o -> evaluate());
            f.second.addListener(o -> evaluate());
            f.third.addListener(o -> evaluate());
        }
        date.addListener(o -> {
            dateConfirmed.set(false);
            evaluate();
        });
        dateConfirmed.addListener(o -> evaluate());
        measurer.addListener(o -> evaluate());
        context.addListener(o -> evaluate());
        for (StringProperty p : List.of(raterEndo, raterMeso, raterEcto, raterName)) {
            p.addListener(o -> evaluate());
        }
        if (editing != null) {
            date.set(editing.measuredAt().toLocalDate());
            context.set(editing.context());
            builder.academy().measurers().stream().filter(m -> m.id() == editing.measurerId()).findFirst()
                    .ifPresent(measurer::set);
            for (SiteTrials t : editing.trials()) {
                field(t.site()).ifPresent(f -> {
                    List<StringProperty> ps = List.of(f.first, f.second, f.third);
                    for (int i = 0; i < t.values().size(); i++) {
                        ps.get(i).set(Numbers.trial(locale, t.values().get(i)));
                    }
                });
            }
        }
        evaluate();
    }

    public Optional<SiteFields> field(Site s) {
        return fields.stream().filter(f -> f.site == s).findFirst();
    }

    /** Re-checks the whole form; called on every change. */
    void evaluate() {
        DecimalStyle style = DecimalStyle.of(locale);
        List<Problem> found = new ArrayList<>();
        List<SiteTrials> trials = new ArrayList<>();
        for (SiteFields f : fields) {
            f.message.set("");
            List<String> texts = new ArrayList<>();
            for (StringProperty p : List.of(f.first, f.second, f.third)) {
                texts.add(p.get() == null ? "" : p.get().strip());
            }
            boolean any = texts.stream().anyMatch(t -> !t.isEmpty());
            if (!any) {
                f.thirdWanted.set(false);
                continue;
            }
            List<Double> values = new ArrayList<>();
            boolean ok = true;
            for (int i = 0; i < 3; i++) {
                if (texts.get(i).isEmpty()) {
                    continue;
                }
                ValueParser.Parsed p = ValueParser.parse(f.site, texts.get(i), style);
                if (p.ok()) {
                    values.add(p.value());
                } else {
                    ok = false;
                    found.add(new Problem(f.site, p.problem().kind(), tr("check.trial", i + 1) + p.problem().message()));
                }
            }
            if (ok && texts.get(1).isEmpty()) {
                for (int i = 0; i < values.size(); i++) {
                    int trial = i + 1;
                    org.shapetrail.measure.MeasurementCheck.check(f.site, values.get(i)).ifPresent(p -> found.add(
                            new Problem(f.site, p.kind(), tr("check.trial", trial) + p.message())));
                }
                found.add(new Problem(f.site, ProblemKind.MISSING, tr("entry.secondTrial", f.site.shown())));
                ok = false;
            }
            if (ok) {
                trials.add(new SiteTrials(f.site, values));
            }
        }
        VisitEvaluation ev = VisitCheck.evaluate(trials);
        found.addAll(ev.problems());
        for (SiteFields f : fields) {
            boolean needs = ev.thirdTrialNeeded().contains(f.site) || !f.third.get().isBlank();
            f.thirdWanted.set(needs);
            String msg = String.join(" ", found.stream().filter(p -> p.site() == f.site).map(Problem::message).toList());
            f.message.set(msg);
        }
        if (trials.isEmpty() && found.isEmpty()) {
            found.add(new Problem(null, ProblemKind.MISSING, tr("entry.oneSite")));
        }
        if (measurer.get() == null) {
            found.add(new Problem(null, ProblemKind.MISSING, measurers.isEmpty()
                    ? tr("entry.noMeasurers") : tr("entry.chooseMeasurer")));
        }
        if (date.get() == null) {
            found.add(new Problem(null, ProblemKind.MISSING, tr("entry.enterDate")));
        } else {
            org.shapetrail.measure.VisitDate.check(person.birthDate(), date.get(), LocalDate.now()).ifPresent(found::add);
        }
        dateQuestion.set(dateQuestionNow());
        if (!dateQuestion.get().isEmpty() && !dateConfirmed.get()) {
            found.add(new Problem(null, ProblemKind.INCONSISTENT, tr("entry.confirmDate", dateQuestion.get())));
        }
        org.shapetrail.store.TextRules.problem(org.shapetrail.store.TextRules.Field.CONTEXT, context.get())
                .ifPresent(w -> found.add(new Problem(null, ProblemKind.UNUSABLE_TEXT,
                        Character.toUpperCase(w.charAt(0)) + w.substring(1) + ".")));
        Rating rater = raterRating(found);
        problems.setAll(found.stream().map(Problem::message).toList());
        canSave.set(found.isEmpty());
        live(trials, found, rater);
    }

    private Rating raterRating(List<Problem> found) {
        List<String> t = List.of(raterEndo.get().strip(), raterMeso.get().strip(), raterEcto.get().strip());
        if (t.stream().allMatch(String::isEmpty)) {
            return null;
        }
        double[] v = new double[3];
        String[] names = java.util.Arrays.stream(org.shapetrail.somatotype.Component.values())
                .map(org.shapetrail.somatotype.Component::shown).toArray(String[]::new);
        for (int i = 0; i < 3; i++) {
            try {
                v[i] = Double.parseDouble(t.get(i).replace(DecimalStyle.of(locale).separator(), '.'));
                if (!(v[i] >= 0.5 && v[i] <= 12)) {
                    throw new NumberFormatException();
                }
            } catch (NumberFormatException e) {
                found.add(new Problem(null, ProblemKind.NOT_A_NUMBER, tr("entry.rater.bad", names[i], t.get(i))));
                return null;
            }
        }
        if (raterName.get().isBlank()) {
            found.add(new Problem(null, ProblemKind.MISSING, tr("entry.rater.name")));
        }
        return Rating.of(v[0], v[1], v[2]);
    }

    private void live(List<SiteTrials> trials, List<Problem> found, Rating rater) {
        SomatotypeRater.Outcome o = SomatotypeRater.rate(trials, builder.settings().endomorphy());
        liveVerdict.set("");
        raterComparison.set("");
        if (!o.rated()) {
            long missing = o.problems().stream().filter(p -> p.kind() == ProblemKind.MISSING).count();
            liveRating.set(found.isEmpty() && missing > 0 ? tr("entry.notYet.sites", missing) : tr("entry.notYet"));
            return;
        }
        Rating r = o.somatotype().rating();
        liveRating.set(tr("entry.live", r.toDisplayString(locale), o.somatotype().category().shown()));
        if (rater != null) {
            raterComparison.set(tr("entry.raterSad", rater.toDisplayString(locale),
                    Numbers.fmt(locale, Distances.sad(r, rater), 2)));
        }
        if (measurer.get() == null || date.get() == null
                || found.stream().anyMatch(p -> p.kind() == ProblemKind.IMPOSSIBLE_DATE)) {
            return; // no verdict against a date that cannot be
        }
        Visit draft = draft(trials);
        VisitResult now = builder.result(person, draft);
        history.rated().stream()
                .filter(v -> v.visit().measuredAt().toLocalDate().isBefore(date.get()))
                .filter(v -> editing == null || v.visit().id() != editing.id())
                .reduce((a, b) -> b)
                .ifPresent(prev -> liveVerdict.set(tr("entry.against", prev.visit().measuredAt().toLocalDate()
                        .format(java.time.format.DateTimeFormatter.ofLocalizedDate(java.time.format.FormatStyle.MEDIUM)
                                .withLocale(locale)), PersonPage.words(builder.verdict(prev, now), locale))));
    }

    private Visit draft(List<SiteTrials> trials) {
        LocalTime time = editing != null ? editing.measuredAt().toLocalTime() : LocalTime.of(9, 0);
        return new Visit(editing == null ? 0 : editing.id(), person.id(), LocalDateTime.of(date.get(), time),
                measurer.get().id(), context.get(), editing == null ? "" : editing.notes(), trials);
    }

    /**
     * Saves the visit whole, or refuses with every reason and writes nothing.
     *
     * @return the saved visit, or empty when refused (the reasons are in {@link #problems()})
     */
    public Optional<Visit> save() {
        evaluate();
        if (!canSave.get()) {
            return Optional.empty();
        }
        List<SiteTrials> trials = new ArrayList<>();
        for (SiteFields f : fields) {
            List<Double> values = new ArrayList<>();
            for (StringProperty p : List.of(f.first, f.second, f.third)) {
                if (!p.get().isBlank()) {
                    values.add(ValueParser.parse(f.site, p.get(), DecimalStyle.of(locale)).value());
                }
            }
            if (!values.isEmpty()) {
                trials.add(new SiteTrials(f.site, values));
            }
        }
        Visit v = draft(trials);
        Rating rater = raterRating(new ArrayList<>());
        String raterWho = raterName.get().strip();
        RatingMethod method = raterMethod.get();
        try {
            Visit saved = OffFxThread.call(saving, () -> {
                try (Database db = file.open()) {
                    return db.inTransaction(tx -> {
                        Visit s;
                        if (editing == null) {
                            s = tx.visits().insert(v);
                        } else {
                            if (seen != null) {
                                tx.visits().update(v, seen);
                            } else {
                                tx.visits().update(v);
                            }
                            s = v;
                        }
                        if (rater != null) {
                            tx.visits().setRating(new VisitRating(s.id(), rater, raterWho, method));
                        }
                        return s;
                    });
                }
            });
            return Optional.of(saved);
        } catch (InvalidVisitException e) {
            problems.setAll(e.problems().stream().map(Problem::message).toList());
            canSave.set(false);
            return Optional.empty();
        } catch (org.shapetrail.store.EditConflictException e) {
            // someone else saved this visit since the form opened: nothing is overwritten; what was typed stays
            problems.setAll(List.of(e.getMessage()));
            reloadOffered.set(true);
            canSave.set(false);
            return Optional.empty();
        } catch (RuntimeException e) {
            problems.setAll(List.of(Errors.describe(e)));
            return Optional.empty();
        }
    }

    /** True once a save was refused because someone else saved the visit meanwhile: the view offers a reload. */
    public javafx.beans.property.ReadOnlyBooleanProperty reloadOfferedProperty() {
        return reloadOffered;
    }

    /** True while a save is being written (the view takes input away meanwhile). */
    /**
     * Why a new visit dated today needs a second look — the person already has a visit today, or was last
     * measured less than four weeks ago (so the visit may be going into the wrong record) — or "".
     */
    private String dateQuestionNow() {
        LocalDate d = date.get();
        if (editing != null || d == null || !d.equals(LocalDate.now())) {
            return "";
        }
        var before = history.visits().stream().map(v -> v.visit().measuredAt().toLocalDate()).filter(x -> !x.isAfter(d))
                .max(LocalDate::compareTo);
        if (before.isEmpty()) {
            return "";
        }
        long days = java.time.temporal.ChronoUnit.DAYS.between(before.get(), d);
        if (days == 0) {
            return tr("entry.sameDay", person.displayName());
        }
        if (days < CONFIRM_WITHIN_DAYS) {
            return tr("entry.recent", person.displayName(), days, before.get());
        }
        return "";
    }

    /** The question the date raises, or "" (shown with a tick box beside the date). */
    public StringProperty dateQuestionProperty() {
        return dateQuestion;
    }

    public BooleanProperty dateConfirmedProperty() {
        return dateConfirmed;
    }

    /** Who this visit is for, e.g. "Freya Breakwater · 22.5 years · Senior squad". */
    public String heading() {
        LocalDate d = date.get() == null ? LocalDate.now() : date.get();
        String age = d.isBefore(person.birthDate()) ? "" : tr("entry.heading.age", Numbers.fmt(locale,
                org.shapetrail.growth.DecimalAge.years(person.birthDate(), d), 1));
        String squad = WorkbenchViewModel.currentSquad(builder.academy(), person.id());
        return person.displayName() + age + " · " + (squad.isEmpty() ? tr("person.noSquad") : squad);
    }

    public BooleanProperty savingProperty() {
        return saving;
    }

    public List<SiteFields> fields() {
        return fields;
    }

    public ObjectProperty<LocalDate> dateProperty() {
        return date;
    }

    public ObjectProperty<Measurer> measurerProperty() {
        return measurer;
    }

    public ObservableList<Measurer> measurers() {
        return measurers;
    }

    public StringProperty contextProperty() {
        return context;
    }

    public StringProperty raterEndoProperty() {
        return raterEndo;
    }

    public StringProperty raterMesoProperty() {
        return raterMeso;
    }

    public StringProperty raterEctoProperty() {
        return raterEcto;
    }

    public StringProperty raterNameProperty() {
        return raterName;
    }

    public ObjectProperty<RatingMethod> raterMethodProperty() {
        return raterMethod;
    }

    public StringProperty liveRatingProperty() {
        return liveRating;
    }

    public StringProperty liveVerdictProperty() {
        return liveVerdict;
    }

    public StringProperty raterComparisonProperty() {
        return raterComparison;
    }

    public ObservableList<String> problems() {
        return problems;
    }

    public BooleanProperty canSaveProperty() {
        return canSave;
    }

    public Person person() {
        return person;
    }

    public Locale locale() {
        return locale;
    }

    public boolean isEdit() {
        return editing != null;
    }
}
