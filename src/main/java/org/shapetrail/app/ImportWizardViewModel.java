package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.nio.file.Path;
import org.shapetrail.store.RecordSource;
import java.util.ArrayList;
import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.apache.commons.csv.CSVParser;
import org.shapetrail.exchange.Column;
import org.shapetrail.exchange.ColumnMapper;
import org.shapetrail.exchange.CsvInput;
import org.shapetrail.exchange.ImportOptions;
import org.shapetrail.exchange.ImportPlan;
import org.shapetrail.exchange.Importer;
import org.shapetrail.history.Academy;
import org.shapetrail.measure.DecimalStyle;
import org.shapetrail.measure.Site;
import org.shapetrail.store.Database;

/**
 * The import wizard: the file's columns with the suggested meaning of each (which the user may change),
 * the options, the dry run with its row-by-row report, and the commit, which is offered only when no row
 * is rejected.
 */
public final class ImportWizardViewModel {
    /** What a column can be set to, in words, and the column it makes. */
    public record Choice(Column.Role role, Site site, int trial) {
        /** The choice in the reader's language. */
        public String words() {
            if (role != Column.Role.SITE_VALUE) {
                return tr("import.role." + role.name());
            }
            return trial == 0 ? tr("import.final", site.shown()) : tr("import.trial", site.shown(), trial);
        }

        @Override
        public String toString() {
            return words();
        }

        Column column(String header) {
            return new Column(header, role, site, trial, role == Column.Role.SITE_VALUE
                    ? ColumnMapper.suggest(header).unit() : null);
        }
    }

    public static final List<Choice> CHOICES = choices();

    private final RecordSource database;
    private final Path file;
    private final List<String> headers;
    private final ObservableList<ObjectProperty<Choice>> mapping = FXCollections.observableArrayList();
    private final BooleanProperty createMissing = new SimpleBooleanProperty(false);
    private final BooleanProperty monthFirst = new SimpleBooleanProperty(false);
    private final ObjectProperty<DecimalStyle> decimals = new SimpleObjectProperty<>();
    private final ObjectProperty<ImportPlan> plan = new SimpleObjectProperty<>();
    private final StringProperty summary = new SimpleStringProperty("");
    private final ObservableList<String> report = FXCollections.observableArrayList();
    private final BooleanProperty canCommit = new SimpleBooleanProperty(false);

    public ImportWizardViewModel(RecordSource database, Path file) throws java.io.IOException {
        this.database = database;
        this.file = file;
        CsvInput.Format f = CsvInput.detect(file);
        decimals.set(f.decimals());
        try (CSVParser p = CsvInput.parser(file, f.delimiter())) {
            headers = new ArrayList<>(p.getHeaderNames());
        }
        for (String h : headers) {
            mapping.add(new SimpleObjectProperty<>(choiceFor(ColumnMapper.suggest(h))));
        }
        mapping.forEach(m -> m.addListener(o -> invalidate()));
        createMissing.addListener(o -> invalidate());
        monthFirst.addListener(o -> invalidate());
        decimals.addListener(o -> invalidate());
    }

    private static List<Choice> choices() {
        List<Choice> c = new ArrayList<>();
        for (Column.Role r : new Column.Role[] {Column.Role.IGNORED, Column.Role.PERSON_ID, Column.Role.NAME,
            Column.Role.BIRTH_DATE, Column.Role.SEX, Column.Role.LETTER_LANGUAGE, Column.Role.DATE, Column.Role.TIME, Column.Role.MEASURER,
            Column.Role.CONTEXT, Column.Role.SITE_NAME, Column.Role.TRIAL_NUMBER, Column.Role.VALUE, Column.Role.UNIT}) {
            c.add(new Choice(r, null, 0));
        }
        for (Site s : Site.values()) {
            for (int t = 0; t <= 3; t++) {
                c.add(new Choice(Column.Role.SITE_VALUE, s, t));
            }
        }
        return List.copyOf(c);
    }

    static Choice choiceFor(Column c) {
        return CHOICES.stream().filter(x -> x.role() == c.role() && x.site() == c.site() && x.trial() == c.trial())
                .findFirst().orElse(CHOICES.get(0));
    }

    private void invalidate() {
        plan.set(null);
        canCommit.set(false);
        summary.set(tr("import.changed"));
        report.clear();
    }

    /** The dry run in the background (a large file takes seconds); the report appears when it is done. */
    public void dryRun(TaskRunner runner) {
        List<Column> cols = currentColumns();
        ImportOptions o = new ImportOptions(decimals.get(), monthFirst.get(), createMissing.get());
        summary.set(tr("import.checking", file.getFileName()));
        runner.run(tr("import.checking.task"), () -> {
            try (Database db = database.open()) {
                return Importer.dryRun(file, Academy.load(db), o, cols);
            }
        }, this::showPlan, t -> summary.set(Errors.describe(t)));
    }

    /** Writes the checked import in the background, then calls {@code done}. */
    public void commit(TaskRunner runner, Runnable done) {
        ImportPlan p = plan.get();
        if (p == null || !canCommit.get()) {
            return;
        }
        canCommit.set(false);
        summary.set(tr("import.importing"));
        runner.run(tr("import.importing.task"), () -> {
            try (Database db = database.open()) {
                return Importer.commit(db, p);
            }
        }, n -> {
            summary.set(tr("import.done", n));
            done.run();
        }, t -> summary.set(Errors.describe(t)));
    }

    private List<Column> currentColumns() {
        List<Column> cols = new ArrayList<>();
        for (int i = 0; i < headers.size(); i++) {
            cols.add(mapping.get(i).get().column(headers.get(i)));
        }
        return cols;
    }

    /** The dry run with the current mapping and options, on the calling thread; nothing is written. */
    public void dryRun() {
        ImportPlan p;
        try (Database db = database.open()) {
            p = Importer.dryRun(file, Academy.load(db),
                    new ImportOptions(decimals.get(), monthFirst.get(), createMissing.get()), currentColumns());
        }
        showPlan(p);
    }

    private void showPlan(ImportPlan p) {
        plan.set(p);
        summary.set(p.summary());
        List<String> lines = new ArrayList<>();
        for (ImportPlan.Finding f : p.findings()) {
            lines.add(f.describe());
        }
        if (lines.isEmpty() && p.fileProblems().isEmpty()) {
            lines.add(tr("import.allGood"));
        }
        report.setAll(lines);
        canCommit.set(p.canCommit() && !p.visits().isEmpty());
    }

    public List<String> headers() {
        return headers;
    }

    public ObservableList<ObjectProperty<Choice>> mapping() {
        return mapping;
    }

    public BooleanProperty createMissingProperty() {
        return createMissing;
    }

    public BooleanProperty monthFirstProperty() {
        return monthFirst;
    }

    public ObjectProperty<DecimalStyle> decimalsProperty() {
        return decimals;
    }

    public StringProperty summaryProperty() {
        return summary;
    }

    public ObservableList<String> report() {
        return report;
    }

    public BooleanProperty canCommitProperty() {
        return canCommit;
    }
}
