package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.Modality;
import javafx.stage.Stage;
import javafx.stage.Window;
import javafx.util.StringConverter;
import org.controlsfx.control.decoration.Decorator;
import org.controlsfx.control.decoration.StyleClassDecoration;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.RatingMethod;
import org.shapetrail.store.Visit;

/**
 * The visit entry window. Keyboard only: type a value and press Enter (or Tab) to go to the next trial;
 * the third-trial field appears only where the ISAK rule asks for it; Ctrl+S saves, Escape closes.
 */
public final class VisitEntryView {
    private final VisitEntryViewModel vm;
    private final Stage stage = new Stage();
    private final List<TextField> order = new ArrayList<>();
    private Visit saved;
    private Runnable onReload;

    /** What "Close and reload the visits" does after a refused save (the workbench reloads the record). */
    public VisitEntryView onReload(Runnable r) {
        this.onReload = r;
        return this;
    }

    public VisitEntryView(VisitEntryViewModel vm, Window owner) {
        this.vm = vm;
        stage.initOwner(owner);
        stage.initModality(Modality.WINDOW_MODAL);
        stage.setTitle(tr(vm.isEdit() ? "entry.title.edit" : "entry.title.new", vm.heading()));
        Label who = new Label(tr(vm.isEdit() ? "entry.who.edit" : "entry.who.new", vm.heading()));
        who.setId("visit-person");
        who.getStyleClass().add("page-title");
        vm.dateProperty().addListener((o, a, b) -> who.setText(tr(vm.isEdit() ? "entry.who.edit"
                : "entry.who.new", vm.heading())));

        DatePicker date = DatePickers.of(null, vm.locale());
        date.setId("visit-date");
        date.valueProperty().bindBidirectional(vm.dateProperty());
        ComboBox<Measurer> measurer = new ComboBox<>(vm.measurers());
        measurer.setId("visit-measurer");
        measurer.valueProperty().bindBidirectional(vm.measurerProperty());
        measurer.setConverter(new StringConverter<>() {
            @Override
            public String toString(Measurer m) {
                return m == null ? "" : m.name() + (m.accreditation().isEmpty() ? "" : " (" + m.accreditation() + ")");
            }

            @Override
            public Measurer fromString(String s) {
                return null;
            }
        });
        TextField context = new TextField();
        context.setId("visit-context");
        context.setPromptText(tr("entry.context.prompt"));
        context.textProperty().bindBidirectional(vm.contextProperty());
        HBox head = new HBox(8, new Label(tr("entry.date")), date, new Label(tr("entry.measuredBy")), measurer,
                new Label(tr("entry.context")),
                context);
        head.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        javafx.scene.control.CheckBox confirm = new javafx.scene.control.CheckBox();
        confirm.setId("confirm-date");
        confirm.textProperty().bind(vm.dateQuestionProperty().concat(tr("entry.confirm")));
        confirm.selectedProperty().bindBidirectional(vm.dateConfirmedProperty());
        confirm.visibleProperty().bind(vm.dateQuestionProperty().isNotEmpty());
        confirm.managedProperty().bind(confirm.visibleProperty());
        confirm.getStyleClass().add("alert-line");
        confirm.setWrapText(true);
        // the date comes first: Enter on it moves on to who measured, then the context, then the first trial
        date.setOnAction(e -> measurer.requestFocus());
        measurer.setOnAction(e -> context.requestFocus());

        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(4);
        grid.getColumnConstraints().addAll(new ColumnConstraints(310), new ColumnConstraints(80),
                new ColumnConstraints(80), new ColumnConstraints(80), new ColumnConstraints(360));
        grid.addRow(0, header(tr("entry.site")), header(tr("entry.trial", 1)), header(tr("entry.trial", 2)),
                header(tr("entry.trial", 3)), header(""));
        int row = 1;
        for (VisitEntryViewModel.SiteFields f : vm.fields()) {
            Label name = new Label(f.site().shown() + " (" + f.site().unit().symbol() + ")");
            TextField t1 = trialField(f.site().code() + "-1", f.first());
            TextField t2 = trialField(f.site().code() + "-2", f.second());
            TextField t3 = trialField(f.site().code() + "-3", f.third());
            t3.visibleProperty().bind(f.thirdWanted());
            t3.managedProperty().bind(f.thirdWanted());
            Label msg = new Label();
            msg.setId(f.site().code() + "-message");
            msg.setWrapText(true);
            msg.getStyleClass().add("field-message");
            msg.textProperty().bind(f.message());
            f.message().addListener((o, a, b) -> decorate(List.of(t1, t2, t3), b));
            order.add(t1);
            order.add(t2);
            order.add(t3);
            grid.addRow(row++, name, t1, t2, t3, msg);
        }
        for (TextField t : order) {
            t.setOnAction(e -> next(t));
        }

        TextField endo = small("rater-endo", vm.raterEndoProperty());
        TextField meso = small("rater-meso", vm.raterMesoProperty());
        TextField ecto = small("rater-ecto", vm.raterEctoProperty());
        TextField rater = new TextField();
        rater.setId("rater-name");
        rater.setPromptText(tr("entry.raterPrompt"));
        rater.textProperty().bindBidirectional(vm.raterNameProperty());
        ComboBox<RatingMethod> method = new ComboBox<>();
        method.getItems().setAll(RatingMethod.values());
        method.valueProperty().bindBidirectional(vm.raterMethodProperty());
        method.setConverter(new StringConverter<>() {
            @Override
            public String toString(RatingMethod m) {
                return m == null ? "" : tr("rater.method." + m.name());
            }

            @Override
            public RatingMethod fromString(String s) {
                return null; // chosen from the list only
            }
        });
        Label raterCmp = new Label();
        raterCmp.setId("rater-comparison");
        raterCmp.textProperty().bind(vm.raterComparisonProperty());
        HBox raterBox = new HBox(6, new Label(tr("entry.rater")), endo, meso, ecto, rater, method, raterCmp);

        Label live = new Label();
        live.setId("live-rating");
        live.getStyleClass().add("live-rating");
        live.textProperty().bind(vm.liveRatingProperty());
        Label verdict = new Label();
        verdict.setId("live-verdict");
        verdict.setWrapText(true);
        verdict.textProperty().bind(vm.liveVerdictProperty());
        ListView<String> problems = new ListView<>(vm.problems());
        problems.setId("visit-problems");
        problems.setPrefHeight(90);
        problems.setFocusTraversable(false);

        Button save = new Button(tr("entry.save"));
        save.setId("save-visit");
        save.setDefaultButton(false);
        save.disableProperty().bind(vm.canSaveProperty().not());
        save.setOnAction(e -> save());
        Button cancel = new Button(tr("entry.close"));
        cancel.setOnAction(e -> stage.close());
        // after a save refused because someone else saved this visit meanwhile: close and show theirs
        Button reload = new Button(tr("entry.reload"));
        reload.setId("reload-after-conflict");
        reload.visibleProperty().bind(vm.reloadOfferedProperty());
        reload.managedProperty().bind(vm.reloadOfferedProperty());
        reload.setOnAction(e -> {
            stage.close();
            if (onReload != null) {
                onReload.run();
            }
        });
        Label hint = new Label(tr("entry.hint"));
        hint.getStyleClass().add("hint");
        HBox buttons = new HBox(8, save, cancel, reload, hint);

        context.setOnAction(e -> order.get(0).requestFocus());
        VBox body = new VBox(10, who, head, confirm, grid, raterBox, live, verdict, new Label(tr("form.toPutRight")),
                problems, buttons);
        body.setPadding(new Insets(12));
        ScrollPane scroll = new ScrollPane(body);
        scroll.setFitToWidth(true); // long verdict lines wrap instead of running off to the right
        BorderPane root = new BorderPane(scroll);
        root.setId("visit-entry");
        root.disableProperty().bind(vm.savingProperty()); // no second Save while one is being written
        Scene scene = new Scene(root, 980, 760);
        scene.getStylesheets().addAll(owner == null ? List.of() : owner.getScene().getStylesheets());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN), this::save);
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.ESCAPE), stage::close);
        stage.setScene(scene);
        // a new visit starts at its date, so it is looked at before anything is typed; an edit at its first trial
        stage.setOnShown(e -> (vm.isEdit() ? order.get(0) : date).requestFocus());
    }

    private static Label header(String s) {
        Label l = new Label(s);
        l.getStyleClass().add("grid-header");
        return l;
    }

    private static TextField small(String id, javafx.beans.property.StringProperty p) {
        TextField t = new TextField();
        t.setId(id);
        t.setPrefColumnCount(3);
        t.textProperty().bindBidirectional(p);
        return t;
    }

    private static TextField trialField(String id, javafx.beans.property.StringProperty p) {
        TextField t = new TextField();
        t.setId(id);
        t.setPrefColumnCount(5);
        t.textProperty().bindBidirectional(p);
        return t;
    }

    private static void decorate(List<TextField> fields, String message) {
        for (TextField t : fields) {
            Decorator.removeAllDecorations(t);
            t.getStyleClass().remove("invalid");
            if (message != null && !message.isBlank() && !t.getText().isBlank()) {
                t.getStyleClass().add("invalid");
                if (t.getScene() != null) {
                    Decorator.addDecoration(t, new StyleClassDecoration("decorated-invalid"));
                }
            }
        }
    }

    /** Moves to the next visible trial field after {@code t}; after the last one, to Save. */
    private void next(TextField t) {
        int i = order.indexOf(t);
        for (int j = i + 1; j < order.size(); j++) {
            if (order.get(j).isVisible()) {
                order.get(j).requestFocus();
                return;
            }
        }
        stage.getScene().lookup("#save-visit").requestFocus();
    }

    private void save() {
        Optional<Visit> v = vm.save();
        if (v.isPresent()) {
            saved = v.get();
            stage.close();
        }
    }

    /** Shows the window and waits; the saved visit, or empty when closed without saving. */
    public Optional<Visit> showAndWait() {
        stage.showAndWait();
        return Optional.ofNullable(saved);
    }

    /** Shows the window without waiting (tests). */
    public Stage show() {
        stage.show();
        stage.requestFocus();
        return stage;
    }

    public Optional<Visit> saved() {
        return Optional.ofNullable(saved);
    }
}
