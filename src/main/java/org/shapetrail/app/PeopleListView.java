package org.shapetrail.app;

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
        search.setPromptText("Find a person (Ctrl+F)");
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
                return m == null ? "Any maturity" : m.words();
            }

            @Override
            public MaturityStatus fromString(String s) {
                return null;
            }
        });
        maturity.valueProperty().bindBidirectional(vm.maturityProperty());
        CheckBox rapid = new CheckBox("Rapid growth only");
        rapid.setId("rapid-filter");
        rapid.selectedProperty().bindBidirectional(vm.rapidOnlyProperty());
        table = PeopleTable.create("people", ctx.locale, false);
        table.setItems(vm.rows());
        table.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.selectedProperty().set(b);
            }
        });
        Button newPerson = new Button("New person…");
        newPerson.setId("new-person");
        newPerson.setOnAction(e -> ctx.personForm(null));
        Label count = new Label();
        count.setId("people-count");
        vm.rows().addListener((ListChangeListener<PersonRow>) c -> count.setText(
                vm.rows().size() + " shown · click a column to sort (e.g. Growth for the fastest growing)"));
        HBox filters = new HBox(6, squad, age, maturity);
        root = new VBox(6, search, filters, new HBox(12, rapid, newPerson), table, count);
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
