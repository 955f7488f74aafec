package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.shapetrail.growth.MaturityStatus;

/** The people list on the left: search, filters, the sortable table and its count. */
final class PeopleListView {
    private final VBox root;
    private final TableView<PersonRow> table;

    PeopleListView(WorkbenchContext ctx) {
        WorkbenchViewModel vm = ctx.vm;
        TextField search = new TextField();
        search.setId("search");
        search.setPromptText(tr("people.search"));
        search.textProperty().bindBidirectional(vm.searchProperty());
        ComboBox<String> squad = new ComboBox<>(vm.squads());
        squad.setId("squad-filter");
        squad.valueProperty().bindBidirectional(vm.squadProperty());
        ComboBox<AgeBand> age = new ComboBox<>();
        age.setId("age-filter");
        age.getItems().setAll(AgeBand.values());
        age.valueProperty().bindBidirectional(vm.ageBandProperty());
        ComboBox<MaturityStatus> maturity = new ComboBox<>();
        maturity.setId("maturity-filter");
        maturity.getItems().add(null);
        maturity.getItems().addAll(MaturityStatus.values());
        maturity.setConverter(new StringConverter<>() {
            @Override
            public String toString(MaturityStatus m) {
                return m == null ? tr("people.anyMaturity") : m.words();
            }

            @Override
            public MaturityStatus fromString(String s) {
                return null;
            }
        });
        maturity.valueProperty().bindBidirectional(vm.maturityProperty());
        CheckBox rapid = new CheckBox(tr("people.rapidOnly"));
        rapid.setId("rapid-filter");
        rapid.selectedProperty().bindBidirectional(vm.rapidOnlyProperty());
        PeopleTable people = new PeopleTable("people", ctx.locale, false, vm.rows());
        table = people.table();
        table.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && ctx.live()) {
                vm.selectedProperty().set(b);
            }
        });
        // the selection survives a reload (after a save the rows are new objects for the same people)
        vm.selectedProperty().addListener((o, a, b) -> {
            if (b != null && ctx.live() && table.getSelectionModel().getSelectedItem() != b) {
                table.getSelectionModel().select(b);
            }
        });
        ComboBox<Period.Kind> period = new ComboBox<>();
        period.setId("period-choice");
        period.getItems().setAll(Period.Kind.values());
        period.setValue(Period.Kind.LATEST);
        period.setTooltip(new javafx.scene.control.Tooltip(tr("people.period.tip")));
        javafx.scene.control.DatePicker from = DatePickers.of(java.time.LocalDate.now().minusMonths(6), ctx.locale);
        from.setId("period-from");
        javafx.scene.control.DatePicker to = DatePickers.of(java.time.LocalDate.now(), ctx.locale);
        to.setId("period-to");
        from.setPrefWidth(130);
        to.setPrefWidth(130);
        Runnable apply = () -> {
            java.time.LocalDate today = java.time.LocalDate.now();
            Period.Kind k = period.getValue();
            from.setVisible(k == Period.Kind.SINCE || k == Period.Kind.BETWEEN);
            from.setManaged(from.isVisible());
            to.setVisible(k == Period.Kind.BETWEEN);
            to.setManaged(to.isVisible());
            Period p;
            try {
                p = switch (k) {
                    case LATEST -> Period.LATEST;
                    case SEASON -> Period.season(today);
                    case YEAR -> Period.lastYear(today);
                    case SINCE -> new Period(k, from.getValue(), today);
                    case BETWEEN -> new Period(k, from.getValue(), to.getValue());
                };
            } catch (RuntimeException e) {
                vm.errorProperty().set(tr("people.period.order"));
                return;
            }
            vm.errorProperty().set("");
            vm.periodProperty().set(p);
            people.setPeriod(p);
        };
        period.valueProperty().addListener((o, a, b) -> apply.run());
        from.valueProperty().addListener((o, a, b) -> apply.run());
        to.valueProperty().addListener((o, a, b) -> apply.run());
        apply.run();
        Button newPerson = new Button(tr("people.new"));
        newPerson.setId("new-person");
        newPerson.setOnAction(e -> ctx.personForm(null));
        Label count = new Label();
        count.setId("people-count");
        vm.rows().addListener((ListChangeListener<PersonRow>) c -> count.setText(
                tr("people.count", vm.rows().size())));
        count.setText(vm.rows().isEmpty() ? "" : tr("people.count", vm.rows().size()));
        if (vm.selectedProperty().get() != null) {
            table.getSelectionModel().select(vm.selectedProperty().get());
        }
        HBox filters = new HBox(6, squad, age, maturity);
        HBox periodLine = new HBox(6, new Label(tr("people.changeOver")), period, from, to);
        periodLine.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
        root = new VBox(6, search, filters, periodLine, new HBox(12, rapid, newPerson), table, count);
        root.setPadding(new Insets(8));
        VBox.setVgrow(table, Priority.ALWAYS);
    }

    Parent root() {
        return root;
    }

    TableView<PersonRow> table() {
        return table;
    }
}
