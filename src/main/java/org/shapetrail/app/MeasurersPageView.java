package org.shapetrail.app;

import java.util.List;
import java.util.function.Function;
import javafx.beans.property.SimpleStringProperty;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.shapetrail.history.NoiseModel;
import org.shapetrail.noise.DefaultErrors;
import org.shapetrail.noise.TemTargets;
import org.shapetrail.store.Measurer;

/** The measurers: who measures in this file, and each one's TEM per site against the usual targets. */
final class MeasurersPageView {
    private final WorkbenchContext ctx;
    private final TableView<NoiseModel.TemRow> tem = new TableView<>();
    private final Label measurerList = new Label();
    private final VBox root;
    private boolean stale = true;

    MeasurersPageView(WorkbenchContext ctx) {
        this.ctx = ctx;
        tem.setId("tem-table");
        column("Measurer", r -> r.measurer().name(), 120);
        column("Site", r -> r.site().label(), 170);
        column("People", r -> Integer.toString(r.estimate().people()), 60);
        column("TEM", r -> Numbers.fmt(ctx.locale, r.estimate().duplicateTem(), 3) + " " + r.site().unit().symbol(), 80);
        column("Relative TEM", r -> Numbers.fmt(ctx.locale, r.estimate().relativeTemPercent(), 2) + " %", 90);
        column("Target", r -> "≤ " + Numbers.fmt(ctx.locale, TemTargets.target(r.site().kind()), 1) + " %", 60);
        column("Standing", r -> r.standing().words(), 200);
        column("Verdicts use", r -> r.usesDefault() ? "default TEM (too few people)" : "own TEM", 170);
        Label note = new Label("TEM from the first two trials of every site and visit (duplicate form). Targets:"
                + " skinfolds ≤ 5 % (≤ 7.5 % entry level), other measures ≤ 1 % (≤ 1.5 %); common practice."
                + " Below " + DefaultErrors.MIN_PEOPLE + " people a site uses the default TEM.");
        note.setWrapText(true);
        Button add = new Button("Add measurer…");
        add.setId("add-measurer");
        add.setOnAction(e -> ctx.askAndOrganise("Add measurer", "Name of the measurer (as visits will show it)",
                (file, name) -> Organising.addMeasurer(file, name, "")));
        measurerList.setId("measurer-list");
        measurerList.setWrapText(true);
        root = new VBox(8, new HBox(8, add, measurerList), note, tem);
        root.setPadding(new Insets(10));
        VBox.setVgrow(tem, Priority.ALWAYS);
    }

    private void column(String name, Function<NoiseModel.TemRow, String> f, double w) {
        TableColumn<NoiseModel.TemRow, String> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new SimpleStringProperty(f.apply(d.getValue())));
        c.setPrefWidth(w);
        tem.getColumns().add(c);
    }

    Parent root() {
        return root;
    }

    void invalidate() {
        stale = true;
    }

    void fill() {
        Loaded l = ctx.loaded();
        if (l == null || !stale) {
            return;
        }
        stale = false;
        tem.getItems().setAll(l.builder().noise().temReport());
        List<String> names = l.builder().academy().measurers().stream().map(Measurer::name).toList();
        measurerList.setText(names.isEmpty() ? "No measurers in this file yet: add one before the first visit."
                : "Measurers in this file: " + String.join(", ", names));
    }
}
