package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.nio.file.Path;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.StaffRole;
import java.text.Normalizer;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.shapetrail.growth.MaturityStatus;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.Database;
import org.shapetrail.store.Membership;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;

/**
 * The workbench's state: the open file, the people list with its filters, and the selection. The only
 * UI type (with the page view models) that reaches the store and the core.
 */
public final class WorkbenchViewModel {
    /** The filter's choice of "every squad". */
    public static String allSquads() {
        return tr("window.allSquads");
    }

    private final TaskRunner runner;
    private final ObjectProperty<Loaded> loaded = new SimpleObjectProperty<>();
    private final ObservableList<PersonRow> allRows = FXCollections.observableArrayList();
    private final ObservableList<PersonRow> rows = FXCollections.observableArrayList();
    private final ObservableList<String> squads = FXCollections.observableArrayList(allSquads());
    private final StringProperty search = new SimpleStringProperty("");
    private final StringProperty squad = new SimpleStringProperty(allSquads());
    private final ObjectProperty<AgeBand> ageBand = new SimpleObjectProperty<>(AgeBand.ALL);
    private final ObjectProperty<MaturityStatus> maturity = new SimpleObjectProperty<>();
    private final BooleanProperty rapidOnly = new SimpleBooleanProperty(false);
    private final ObjectProperty<Period> period = new SimpleObjectProperty<>(Period.LATEST);
    private final ObjectProperty<PersonRow> selected = new SimpleObjectProperty<>();
    private final StringProperty status = new SimpleStringProperty("");
    private final StringProperty error = new SimpleStringProperty("");
    private final StringProperty readOnlyNote = new SimpleStringProperty("");
    private org.shapetrail.store.FileClaim claim;
    private Path unclaimed;
    private AnalysisSettings settings = AnalysisSettings.standard();
    private final ObjectProperty<RecordSource.Server> passwordWanted = new SimpleObjectProperty<>();
    private AutoCloseable listening;
    private final javafx.beans.property.BooleanProperty hearingOthers = new SimpleBooleanProperty(false);
    private RecordSource listeningTo;

    public WorkbenchViewModel(TaskRunner runner) {
        this.runner = runner;
        search.addListener(o -> applyFilter());
        squad.addListener(o -> applyFilter());
        ageBand.addListener(o -> applyFilter());
        maturity.addListener(o -> applyFilter());
        rapidOnly.addListener(o -> applyFilter());
        period.addListener(o -> fillRows());
    }

    /** Opens a file in the background, replacing the current one when done. */
    public void open(Path file) {
        open(RecordSource.of(file));
    }

    /** Opens a file or a server's record in the background, replacing the current one when done. */
    public void open(RecordSource source) {
        error.set("");
        claimFor(source);
        status.set(tr("window.opening.named", source.title()));
        AnalysisSettings s = settings;
        passwordWanted.set(null);
        runner.run(tr("window.opening.task", source.title()), progress -> load(source, s, progress), this::show, t -> {
            if (source instanceof RecordSource.Server server && passwordRefused(t)) {
                passwordWanted.set(server); // the window asks for it (and for the address again)
            }
            status.set("");
            error.set(Errors.describe(t));
        });
    }

    private static boolean passwordRefused(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause()) {
            if (c instanceof org.shapetrail.store.PasswordRefusedException) {
                return true;
            }
        }
        return false;
    }

    /**
     * Starts a new, empty file (for an academy's own record, apart from the demo) and opens it; an
     * existing file is never overwritten.
     */
    public void createAndOpen(Path file) {
        error.set("");
        if (java.nio.file.Files.exists(file)) {
            error.set(tr("window.exists", file.getFileName()));
            return;
        }
        AnalysisSettings s = settings;
        runner.run(tr("window.creating", file.getFileName()), progress -> {
            try (Database db = Database.open(file)) {
                db.schemaVersion(); // created and brought to the current schema
            }
            return load(RecordSource.of(file), s, progress);
        }, this::show, t -> error.set(Errors.describe(t)));
    }

    /** Reads and computes a whole file (runs off the FX thread). */
    public static Loaded load(RecordSource source, AnalysisSettings s, TaskRunner.Progress progress)
            throws InterruptedException {
        Academy academy;
        java.util.Optional<StaffRole> role;
        String actor;
        try (Database db = source.open()) {
            academy = Academy.load(db);
            role = db.role();
            actor = db.actor();
        }
        HistoryBuilder b = HistoryBuilder.of(academy, s);
        Map<Long, PersonHistory> histories = new LinkedHashMap<>();
        int n = academy.people().size();
        int i = 0;
        for (Person p : academy.people()) {
            if (progress.isCancelled()) {
                throw new InterruptedException("cancelled");
            }
            histories.put(p.id(), b.history(p));
            progress.update(++i, n, tr("window.computing", i, n));
        }
        return new Loaded(source, b, histories, role, actor);
    }

    /** Recomputes everything with new settings (cancellable). */
    public void recompute(AnalysisSettings s) {
        settings = s;
        Loaded l = loaded.get();
        if (l != null) {
            runner.run(tr("window.recomputing"), progress -> load(l.source(), s, progress), this::show, t -> {
                status.set(t instanceof InterruptedException ? tr("window.recompute.cancelled") : "");
                if (!(t instanceof InterruptedException)) {
                    error.set(Errors.describe(t));
                }
            });
        }
    }

    /** Reloads the open file (after a save), keeping the selection. */
    public void reload() {
        Loaded l = loaded.get();
        if (l != null) {
            open(l.source());
        }
    }

    /**
     * Takes the file for this window, or, when another window has it, works on it read-only and says who
     * has it (FileClaim). Asked again on every open and reload, so the file becomes editable here once the
     * other window lets go.
     */
    void claimFor(RecordSource source) {
        if (source.file().isEmpty()) {
            releaseFile(); // a server keeps its own order among writers (row versions, the server's rules)
            return;
        }
        stopListening();
        claimFor(source.file().get());
    }

    void claimFor(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        if (claim != null && claim.database().equals(abs)) {
            return;
        }
        letGo();
        var got = org.shapetrail.store.FileClaim.claim(abs);
        if (got.isPresent()) {
            claim = got.get();
            readOnlyNote.set("");
        } else {
            unclaimed = abs;
            readOnlyNote.set(org.shapetrail.store.FileClaim.holder(abs)
                    .map(who -> tr("window.readOnly", abs.getFileName(), who))
                    .orElse(""));
        }
    }

    /** Gives up this window's claim on its file (it opens another, or closes). */
    public void letGo() {
        stopListening();
        releaseFile();
    }

    /** Gives up the claim on a file (the window now shows a server's record, or another file). */
    private void releaseFile() {
        if (claim != null) {
            claim.close();
            claim = null;
        }
        if (unclaimed != null) {
            org.shapetrail.store.FileClaim.release(unclaimed);
            unclaimed = null;
        }
        readOnlyNote.set("");
    }

    /**
     * The server whose connection failed for want of a (right) password: the window asks for one. Null
     * otherwise.
     */
    public ObjectProperty<RecordSource.Server> passwordWantedProperty() {
        return passwordWanted;
    }

    /**
     * For a record on a server: hears of saves made at other desks and reloads (keeping the selection),
     * so the open pages show them without a restart. Nothing for a file.
     */
    private void listenTo(Loaded l) {
        if (l.source().equals(listeningTo)) {
            return; // listening already, or being set up
        }
        stopListening();
        if (!(l.source() instanceof RecordSource.Server)) {
            return;
        }
        RecordSource source = l.source();
        listeningTo = source;
        // the listening connection is made off the FX thread (a server may be slow to answer)
        Thread setup = new Thread(() -> {
            AutoCloseable got;
            try (Database db = source.open()) {
                got = db.listenForChanges(table -> javafx.application.Platform.runLater(() -> heard(source, table)));
            } catch (RuntimeException e) {
                javafx.application.Platform.runLater(() -> error.set(tr("window.notListening", Errors.describe(e))));
                return;
            }
            javafx.application.Platform.runLater(() -> {
                if (source.equals(listeningTo) && listening == null) {
                    listening = got;
                    hearingOthers.set(true);
                } else {
                    closeQuietly(got); // the window moved on meanwhile
                }
            });
        }, "shapetrail-listen");
        setup.setDaemon(true);
        setup.start();
    }

    /** A change saved at another desk (a table's name), or the listening connection lost (""). */
    private void heard(RecordSource source, String table) {
        if (!source.equals(listeningTo)) {
            return;
        }
        if (table.isEmpty()) {
            hearingOthers.set(false);
            error.set(tr("window.connectionLost", source.title()));
        } else {
            status.set(tr("window.othersSaved"));
            reload();
        }
    }

    /** True while this window hears of changes saved at other desks (a server's record). */
    public javafx.beans.property.ReadOnlyBooleanProperty hearingOthersProperty() {
        return hearingOthers;
    }

    private static void closeQuietly(AutoCloseable c) {
        try {
            c.close();
        } catch (Exception ignored) {
            // the listener's connection is gone already
        }
    }

    private void stopListening() {
        if (listening != null) {
            closeQuietly(listening);
            listening = null;
        }
        listeningTo = null;
        hearingOthers.set(false);
    }

    /** Empty, or the sentence saying this window has the file read-only and why. */
    public StringProperty readOnlyNoteProperty() {
        return readOnlyNote;
    }

    void show(Loaded l) {
        claimFor(l.source());
        listenTo(l);
        loaded.set(l);
        Academy a = l.builder().academy();
        List<String> names = new ArrayList<>();
        names.add(allSquads());
        a.squads().forEach(s -> names.add(s.name()));
        squads.setAll(names);
        if (!names.contains(squad.get())) {
            squad.set(allSquads());
        }
        fillRows();
        status.set(tr("window.loadedStatus", l.source().title(), a.people().size(), a.visits().size()));
    }

    /** Every person's line for the period chosen, filtered; the selection is kept. */
    private void fillRows() {
        Loaded l = loaded.get();
        if (l == null) {
            return;
        }
        Long keep = selected.get() == null ? null : selected.get().id();
        Academy a = l.builder().academy();
        List<PersonRow> list = new ArrayList<>();
        for (Person p : a.people()) {
            list.add(row(a, l.histories().get(p.id()), l.builder(), period.get()));
        }
        allRows.setAll(list);
        applyFilter();
        if (keep != null) {
            rows.stream().filter(r -> r.id() == keep).findFirst().ifPresent(selected::set);
        }
        if (keep != null) {
            rows.stream().filter(r -> r.id() == keep).findFirst().ifPresent(selected::set);
        }
    }

    static PersonRow row(Academy a, PersonHistory h) {
        return row(a, h, null, Period.LATEST);
    }

    /**
     * A person's line for the period: the latest change, or the change from their first rated visit on or
     * after the period's first day to their last on or before its last day ({@code b} judges it).
     */
    static PersonRow row(Academy a, PersonHistory h, HistoryBuilder b, Period period) {
        Person p = h.person();
        String squadName = currentSquad(a, p.id());
        var last = h.latest();
        var rated = h.rated();
        var lastRated = rated.isEmpty() ? null : rated.get(rated.size() - 1);
        org.shapetrail.noise.ChangeVerdict change = null;
        LocalDate from = null;
        LocalDate to = null;
        if (period.kind() == Period.Kind.LATEST) {
            var c = h.latestChange();
            if (c.isPresent()) {
                change = c.get().verdict();
                from = c.get().from().visit().measuredAt().toLocalDate();
                to = c.get().to().visit().measuredAt().toLocalDate();
            }
        } else {
            var in = rated.stream().filter(r -> !r.visit().measuredAt().toLocalDate().isBefore(period.from())
                    && !r.visit().measuredAt().toLocalDate().isAfter(period.to())).toList();
            if (in.size() >= 2) {
                change = b.verdict(in.get(0), in.get(in.size() - 1));
                from = in.get(0).visit().measuredAt().toLocalDate();
                to = in.get(in.size() - 1).visit().measuredAt().toLocalDate();
            }
        }
        var g = h.growth();
        return new PersonRow(p.id(), p.displayName(), squadName, last.map(v -> v.ageYears()).orElse(Double.NaN),
                lastRated == null ? "" : lastRated.somatotype().rating().toDisplayString(org.shapetrail.i18n.Messages.current()),
                lastRated == null ? "" : lastRated.somatotype().category().displayName(), change, from, to,
                g.velocity().map(v -> v.perYear()).orElse(Double.NaN),
                g.velocity().map(v -> v.sePerYear()).orElse(Double.NaN),
                g.velocity().map(v -> v.shortInterval()).orElse(false), g.rapidGrowth(),
                g.maturityEstimate().map(m -> m.status()).orElse(null));
    }

    /** The squad a person belongs to now (the latest membership), or "". */
    static String currentSquad(Academy a, long personId) {
        Optional<Membership> m = a.memberships().stream().filter(x -> x.personId() == personId)
                .filter(x -> x.leftOn() == null || !x.leftOn().isBefore(LocalDate.now()))
                .reduce((x, y) -> y.joinedOn().isAfter(x.joinedOn()) ? y : x);
        return m.flatMap(x -> a.squad(x.squadId())).map(Squad::name).orElse("");
    }

    void applyFilter() {
        String q = fold(search.get());
        Loaded l = loaded.get();
        List<Long> inSquad = null;
        if (l != null && !allSquads().equals(squad.get())) {
            Academy a = l.builder().academy();
            inSquad = a.squads().stream().filter(s -> s.name().equals(squad.get())).findFirst()
                    .map(s -> a.membersOn(s.id(), LocalDate.now())).orElse(List.of());
        }
        List<PersonRow> out = new ArrayList<>();
        for (PersonRow r : allRows) {
            if (!q.isEmpty() && !fold(r.name()).contains(q)) {
                continue;
            }
            if (inSquad != null && !inSquad.contains(r.id())) {
                continue;
            }
            if (!ageBand.get().contains(r.age())) {
                continue;
            }
            if (maturity.get() != null && r.maturity() != maturity.get()) {
                continue;
            }
            if (rapidOnly.get() && !r.rapidGrowth()) {
                continue;
            }
            out.add(r);
        }
        rows.setAll(out);
    }

    /** Lower case without accents, so "zoe" finds "Zoë". */
    static String fold(String s) {
        return Normalizer.normalize(s == null ? "" : s.strip(), Normalizer.Form.NFD).replaceAll("\\p{M}", "")
                .toLowerCase(Locale.ROOT);
    }

    public Optional<PersonHistory> selectedHistory() {
        Loaded l = loaded.get();
        PersonRow r = selected.get();
        if (l == null || r == null) {
            return Optional.empty();
        }
        return Optional.ofNullable(l.histories().get(r.id()));
    }

    public ObjectProperty<Loaded> loadedProperty() {
        return loaded;
    }

    public ObservableList<PersonRow> rows() {
        return rows;
    }

    public ObservableList<String> squads() {
        return squads;
    }

    public StringProperty searchProperty() {
        return search;
    }

    public StringProperty squadProperty() {
        return squad;
    }

    public ObjectProperty<AgeBand> ageBandProperty() {
        return ageBand;
    }

    public ObjectProperty<MaturityStatus> maturityProperty() {
        return maturity;
    }

    /** The span the change column covers (the latest change by default). */
    public ObjectProperty<Period> periodProperty() {
        return period;
    }

    public BooleanProperty rapidOnlyProperty() {
        return rapidOnly;
    }

    public ObjectProperty<PersonRow> selectedProperty() {
        return selected;
    }

    public StringProperty statusProperty() {
        return status;
    }

    public StringProperty errorProperty() {
        return error;
    }

    public TaskRunner runner() {
        return runner;
    }

    public AnalysisSettings settings() {
        return settings;
    }
}
