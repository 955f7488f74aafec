package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import javafx.geometry.Insets;
import javafx.scene.Scene;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.shapetrail.measure.DecimalStyle;

/** The window of the import wizard: columns, options, check (dry run), import. */
final class ImportWizardView {
    private final Stage stage = new Stage();

    ImportWizardView(ImportWizardViewModel vm, TaskRunner runner, Window owner, Runnable afterImport) {
        stage.initOwner(owner);
        stage.setTitle(tr("import.title"));
        GridPane cols = new GridPane();
        cols.setHgap(8);
        cols.setVgap(4);
        cols.addRow(0, new Label(tr("import.col.file")), new Label(tr("import.col.reads")));
        for (int i = 0; i < vm.headers().size(); i++) {
            ComboBox<ImportWizardViewModel.Choice> c = new ComboBox<>();
            c.getItems().setAll(ImportWizardViewModel.CHOICES);
            c.valueProperty().bindBidirectional(vm.mapping().get(i));
            c.setId("map-" + i);
            cols.addRow(i + 1, new Label(vm.headers().get(i)), c);
        }
        CheckBox create = new CheckBox(tr("import.create"));
        create.selectedProperty().bindBidirectional(vm.createMissingProperty());
        CheckBox month = new CheckBox(tr("import.monthFirst"));
        month.selectedProperty().bindBidirectional(vm.monthFirstProperty());
        CheckBox comma = new CheckBox(tr("import.comma"));
        comma.setSelected(vm.decimalsProperty().get() == DecimalStyle.COMMA);
        comma.selectedProperty().addListener((o, a, b) -> vm.decimalsProperty().set(b ? DecimalStyle.COMMA
                : DecimalStyle.POINT));
        Button check = new Button(tr("import.check"));
        check.setId("import-check");
        check.setOnAction(e -> vm.dryRun(runner));
        Button go = new Button(tr("import.go"));
        go.setId("import-commit");
        go.disableProperty().bind(vm.canCommitProperty().not());
        go.setOnAction(e -> vm.commit(runner, afterImport));
        Label summary = new Label();
        summary.setId("import-summary");
        summary.setWrapText(true);
        summary.textProperty().bind(vm.summaryProperty());
        ListView<String> report = new ListView<>(vm.report());
        report.setId("import-report");
        report.setPrefHeight(220);
        VBox box = new VBox(10, new Label(tr("import.step1")),
                new ScrollPane(cols), new Label(tr("import.step2")), create, month, comma,
                new Label(tr("import.step3")),
                new HBox(8, check, go), summary, report);
        box.setPadding(new Insets(12));
        Scene scene = new Scene(box, 760, 780);
        if (owner != null) {
            scene.getStylesheets().addAll(owner.getScene().getStylesheets());
        }
        stage.setScene(scene);
    }

    void show() {
        stage.show();
    }
}
