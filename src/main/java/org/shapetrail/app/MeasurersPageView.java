package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

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
        column(tr("measurers.col.measurer"), r -> r.measurer().name(), 120);
        column(tr("measurers.col.site"), r -> r.site().shown(), 220);
        column(tr("measurers.col.people"), r -> Integer.toString(r.estimate().people()), 80);
        column(tr("measurers.col.tem"), r -> Numbers.fmt(ctx.locale, r.estimate().duplicateTem(), 3) + " " + r.site().unit().symbol(), 80);
        column(tr("measurers.col.relative"), r -> Numbers.fmt(ctx.locale, r.estimate().relativeTemPercent(), 2) + " %", 110);
        column(tr("measurers.col.target"), r -> "≤ " + Numbers.fmt(ctx.locale, TemTargets.target(r.site().kind()), 1) + " %", 85);
        column(tr("measurers.col.standing"), r -> r.standing().shown(), 200);
        column(tr("measurers.col.uses"), r -> r.usesDefault() ? tr("measurers.default") : tr("measurers.own"), 170);
        Label note = new Label(tr("measurers.note", DefaultErrors.MIN_PEOPLE));
        note.setWrapText(true);
        Button add = new Button(tr("measurers.add"));
        add.setId("add-measurer");
        add.setOnAction(e -> ctx.askAndOrganise(tr("measurers.add.title"), tr("measurers.add.prompt"),
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
        measurerList.setText(names.isEmpty() ? tr("measurers.none")
                : tr("measurers.list", String.join(", ", names)));
    }
}
