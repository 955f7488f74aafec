package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import javafx.util.StringConverter;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.letters.LetterComposer;
import org.shapetrail.letters.LetterPreview;
import org.shapetrail.letters.LetterSettings;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;
import org.shapetrail.store.Visit;

/**
 * The person page and what it does: shows the selected person, enters, edits and deletes their visits
 * (with undo until the app closes), moves them to another squad, edits them and previews their letter.
 */
final class PersonPageView {
    /** The choice in "Move to squad" for someone who leaves: their memberships end on the chosen day. */
    private static final Squad LEAVES = new Squad(-1, tr("person.leaves"));

    private final WorkbenchContext ctx;
    private final PersonPane pane = new PersonPane();
    /** Earlier versions of visits changed in this session, newest first, for undo. */
    private final Deque<Runnable> undo = new ArrayDeque<>();
    javafx.stage.Stage lastPreview;

    PersonPageView(WorkbenchContext ctx) {
        this.ctx = ctx;
        pane.onNewVisit(() -> enterVisit(null));
        pane.onEditVisit(this::editVisit);
        pane.onDeleteVisit(this::deleteVisit);
        pane.onVisitHistory(this::visitHistory);
        pane.undo.setOnAction(e -> undoLast());
        pane.undo.setDisable(true);
        pane.editPerson.setOnAction(e -> ctx.vm.selectedHistory().ifPresent(h -> ctx.personForm(h.person())));
        pane.moveSquad.setOnAction(e -> ctx.vm.selectedHistory().ifPresent(h -> moveToSquad(h.person())));
        // the preview uses the letter settings last chosen for a squad's letters, over the past year
        pane.previewLetter.setOnAction(e -> previewLetter(LettersDialog.remembered(LocalDate.now().minusYears(1),
                LocalDate.now())));
    }

    PersonPane pane() {
        return pane;
    }

    /** Shows the selected person (nothing when none is selected). */
    void refresh() {
        Optional<PersonHistory> h = ctx.vm.selectedHistory();
        Loaded l = ctx.loaded();
        if (h.isEmpty() || l == null) {
            return;
        }
        pane.show(h.get(), WorkbenchViewModel.currentSquad(l.builder().academy(), h.get().person().id()), ctx.locale);
    }

    /** The entry window for a new visit (or an edit) of the selected person. */
    VisitEntryView entryFor(Visit editing) {
        return entryFor(editing, null);
    }

    /** The entry window for an edit of the visit as read with its stamp (the save is checked against it). */
    VisitEntryView entryFor(Visit editing, org.shapetrail.store.RowStamp seen) {
        PersonHistory h = ctx.vm.selectedHistory().orElseThrow();
        Loaded l = ctx.loaded();
        return new VisitEntryView(new VisitEntryViewModel(l.source(), l.builder(), h, ctx.locale, editing, seen),
                ctx.window()).onReload(ctx.vm::reload);
    }

    void enterVisit(Visit editing) {
        if (ctx.vm.selectedHistory().isEmpty()) {
            return;
        }
        entryFor(editing).showAndWait().ifPresent(v -> ctx.vm.reload());
    }

    private Optional<Visit> stored(VisitLine line) {
        return ctx.loaded().builder().academy().visits().stream().filter(v -> v.id() == line.visitId()).findFirst();
    }

    private void editVisit(VisitLine line) {
        stored(line).ifPresent(shown -> {
            RecordSource file = ctx.loaded().source();
            Optional<VisitSnapshot> before;
            try {
                before = OffFxThread.call(ctx.storing, () -> VisitSnapshot.read(file, shown.id()));
            } catch (RuntimeException e) {
                ctx.vm.errorProperty().set(tr("visit.cannotEdit", Errors.describe(e)));
                return;
            }
            if (before.isEmpty()) {
                ctx.vm.errorProperty().set(tr("visit.gone", line.date()));
                ctx.vm.reload();
                return;
            }
            // the form shows the visit as just read, and saves against that version (not the loaded page's)
            Optional<Visit> after = entryFor(before.get().visit(), before.get().stamp()).showAndWait();
            if (after.isPresent()) {
                pushUndo(tr("undo.edit", line.date()), () -> before.get().restoreEdited(file));
                ctx.vm.reload();
            }
        });
    }

    /**
     * The chosen visit's history: on a server, every line of the audit trail for it (who entered and
     * changed it and its trials, when, old and new values); on a file, which keeps no trail, its stamps.
     */
    private void visitHistory(VisitLine line) {
        RecordSource file = ctx.loaded().source();
        String text;
        try {
            text = OffFxThread.call(ctx.storing, () -> {
                try (Database db = file.open()) {
                    if (db.engine() == org.shapetrail.store.Engine.SQLITE) {
                        var stamp = db.inTransaction(tx -> tx.visits().stamp(line.visitId()));
                        return tr("history.file") + "\n\n"
                                + stamp.map(st -> st.changedBy().isEmpty() ? tr("history.unchanged")
                                        : tr("history.changed", st.changedBy(), st.changedAt().replace('T', ' ')
                                        .replace("Z", " UTC"), st.version() - 1)).orElse(tr("history.gone")); // not words: the time zone
                    }
                    return org.shapetrail.store.AuditEntry.asText(db.inTransaction(tx -> tx.trail().ofVisit(line.visitId())));
                }
            });
        } catch (RuntimeException e) {
            ctx.vm.errorProperty().set(tr("history.unreadable", Errors.describe(e)));
            return;
        }
        javafx.scene.control.TextArea area = new javafx.scene.control.TextArea(text);
        area.setId("visit-history-text");
        area.setEditable(false);
        area.setWrapText(false);
        area.setPrefSize(760, 420);
        area.setStyle("-fx-font-family: monospace;"); // not words: a style
        Alert a = new Alert(Alert.AlertType.INFORMATION, null, Buttons.close());
        a.setHeaderText(tr("history.header", line.date()));
        a.setTitle(tr("history.title"));
        a.getDialogPane().setContent(area);
        a.initOwner(ctx.window());
        a.getDialogPane().getStylesheets().addAll(ctx.window().getScene().getStylesheets());
        a.show();
    }

    private void deleteVisit(VisitLine line) {
        stored(line).ifPresent(v -> {
            Alert a = new Alert(Alert.AlertType.CONFIRMATION, tr("delete.ask", line.date()), Buttons.cancel(),
                    Buttons.ok());
            a.setHeaderText(tr("delete.title"));
            a.initOwner(ctx.window());
            if (!Buttons.okIn(a.showAndWait())) {
                return;
            }
            RecordSource file = ctx.loaded().source();
            Optional<VisitSnapshot> before;
            try {
                before = OffFxThread.call(ctx.storing, () -> {
                    Optional<VisitSnapshot> snap = VisitSnapshot.read(file, v.id());
                    try (Database db = file.open()) {
                        db.inTransaction(tx -> tx.visits().delete(v.id()));
                    }
                    return snap;
                });
            } catch (RuntimeException e) {
                ctx.vm.errorProperty().set(tr("delete.failed", Errors.describe(e)));
                return;
            }
            before.ifPresent(b -> pushUndo(tr("undo.delete", line.date()), () -> b.restoreDeleted(file)));
            ctx.vm.reload();
        });
    }

    private void pushUndo(String what, Runnable action) {
        undo.push(action);
        pane.undo.setText(tr("undo.what", what));
        pane.undo.setDisable(false);
    }

    private void undoLast() {
        Runnable r = undo.poll();
        if (r != null) {
            try {
                OffFxThread.call(ctx.storing, () -> {
                    r.run();
                    return null;
                });
            } catch (RuntimeException e) {
                undo.push(r); // still there to try again
                ctx.vm.errorProperty().set(tr("undo.failed", Errors.describe(e)));
            }
            ctx.vm.reload();
        }
        pane.undo.setText(tr("person.undo"));
        pane.undo.setDisable(undo.isEmpty());
    }

    private void moveToSquad(Person p) {
        Loaded l = ctx.loaded();
        if (l == null) {
            return;
        }
        Dialog<ButtonType> d = new Dialog<>();
        d.setTitle(tr("move.title"));
        d.setHeaderText(tr("move.header", p.displayName(), LEAVES.name()));
        d.initOwner(ctx.window());
        ComboBox<Squad> to = new ComboBox<>(FXCollections.observableArrayList(l.builder().academy().squads()));
        to.getItems().add(LEAVES);
        to.setId("move-to-squad");
        to.setConverter(new StringConverter<>() {
            @Override
            public String toString(Squad s) {
                return s == null ? "" : s.name();
            }

            @Override
            public Squad fromString(String s) {
                return null;
            }
        });
        DatePicker from = DatePickers.of(LocalDate.now(), ctx.locale);
        from.setId("move-from");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        g.addRow(0, new Label(tr("move.squad")), to);
        Label fromLabel = new Label(tr("move.from"));
        fromLabel.textProperty().bind(Bindings.when(to.valueProperty().isEqualTo(LEAVES)).then(tr("move.lastDay"))
                .otherwise(tr("move.from")));
        g.addRow(1, fromLabel, from);
        d.getDialogPane().setContent(g);
        Buttons.cancelAndOk(d);
        if (Buttons.okIn(d.showAndWait())) {
            ctx.organise(() -> to.getValue() == LEAVES ? Organising.leave(l.source(), p.id(), from.getValue())
                    : Organising.moveToSquad(l.source(), p.id(), to.getValue(), from.getValue()));
        }
    }

    /** Shows the pages of the selected person's letter for the period, as they will print. */
    void previewLetter(LetterSettings settings) {
        Optional<PersonHistory> h = ctx.vm.selectedHistory();
        if (h.isEmpty()) {
            return;
        }
        Loaded l = ctx.loaded();
        ctx.vm.runner().run(tr("preview.preparing"), () -> LetterPreview.pages(
                new LetterComposer(l.builder(), settings, ctx.locale).compose(h.get()), 80), pages -> {
                    javafx.scene.layout.VBox box = new javafx.scene.layout.VBox(10);
                    box.setId("letter-preview");
                    for (var img : pages) {
                        javafx.scene.image.ImageView v = new javafx.scene.image.ImageView(
                                javafx.embed.swing.SwingFXUtils.toFXImage(img, null));
                        v.setPreserveRatio(true);
                        v.setFitWidth(640);
                        box.getChildren().add(v);
                    }
                    javafx.stage.Stage s = new javafx.stage.Stage();
                    s.initOwner(ctx.window());
                    s.setTitle(tr("preview.title", h.get().person().displayName()));
                    s.setScene(new javafx.scene.Scene(new javafx.scene.control.ScrollPane(box), 680, 820));
                    s.show();
                    lastPreview = s;
                }, t -> ctx.vm.errorProperty().set(Errors.describe(t)));
    }
}
