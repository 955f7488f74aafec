package org.shapetrail.app;

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
        stage.setTitle("Bring in a spreadsheet");
        GridPane cols = new GridPane();
        cols.setHgap(8);
        cols.setVgap(4);
        cols.addRow(0, new Label("Column in the file"), new Label("Shapetrail reads it as"));
        for (int i = 0; i < vm.headers().size(); i++) {
            ComboBox<ImportWizardViewModel.Choice> c = new ComboBox<>();
            c.getItems().setAll(ImportWizardViewModel.CHOICES);
            c.valueProperty().bindBidirectional(vm.mapping().get(i));
            c.setId("map-" + i);
            cols.addRow(i + 1, new Label(vm.headers().get(i)), c);
        }
        CheckBox create = new CheckBox("Add people and measurers who are not in the file yet");
        create.selectedProperty().bindBidirectional(vm.createMissingProperty());
        CheckBox month = new CheckBox("Dates are month first (03/04/2024 is 4 March)");
        month.selectedProperty().bindBidirectional(vm.monthFirstProperty());
        CheckBox comma = new CheckBox("Numbers use a decimal comma");
        comma.setSelected(vm.decimalsProperty().get() == DecimalStyle.COMMA);
        comma.selectedProperty().addListener((o, a, b) -> vm.decimalsProperty().set(b ? DecimalStyle.COMMA
                : DecimalStyle.POINT));
        Button check = new Button("Check the file (nothing is written)");
        check.setId("import-check");
        check.setOnAction(e -> vm.dryRun(runner));
        Button go = new Button("Import");
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
        VBox box = new VBox(10, new Label("1. What each column holds (suggested from its header; change any)"),
                new ScrollPane(cols), new Label("2. Options"), create, month, comma,
                new Label("3. Check, then import: the import is written whole or not at all"),
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
