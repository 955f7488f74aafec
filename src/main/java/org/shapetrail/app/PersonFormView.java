package org.shapetrail.app;

import java.util.Optional;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import javafx.util.StringConverter;
import org.shapetrail.measure.Sex;
import org.shapetrail.store.Person;
import org.shapetrail.store.Squad;

/** The dialog for adding or editing a person. */
final class PersonFormView {
    private PersonFormView() {
    }

    static Optional<Person> show(PersonFormViewModel vm, Window owner) {
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle(vm.isEdit() ? "Edit person" : "New person");
        TextField name = new TextField();
        name.setId("person-name");
        name.textProperty().bindBidirectional(vm.name);
        ComboBox<Sex> sex = new ComboBox<>();
        sex.getItems().setAll(Sex.values());
        sex.valueProperty().bindBidirectional(vm.sex);
        DatePicker birth = DatePickers.of(null, vm.locale());
        birth.valueProperty().bindBidirectional(vm.birth);
        TextField father = new TextField();
        father.textProperty().bindBidirectional(vm.father);
        TextField mother = new TextField();
        mother.textProperty().bindBidirectional(vm.mother);
        TextField predicted = new TextField();
        predicted.textProperty().bindBidirectional(vm.predicted);
        CheckBox cm = new CheckBox("Consent to be measured");
        cm.selectedProperty().bindBidirectional(vm.consentMeasurement);
        CheckBox cp = new CheckBox("Consent to photographs (off unless recorded)");
        cp.selectedProperty().bindBidirectional(vm.consentPhotographs);
        CheckBox cs = new CheckBox("Consent to share results with a parent");
        cs.selectedProperty().bindBidirectional(vm.consentSharing);
        ComboBox<Squad> squad = new ComboBox<>(vm.squads);
        squad.valueProperty().bindBidirectional(vm.squad);
        squad.setConverter(new StringConverter<>() {
            @Override
            public String toString(Squad s) {
                return s == null ? "no squad" : s.name();
            }

            @Override
            public Squad fromString(String s) {
                return null;
            }
        });
        ListView<String> problems = new ListView<>(vm.problems);
        problems.setPrefHeight(80);
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.setPadding(new Insets(10));
        int r = 0;
        g.addRow(r++, new Label("Name"), name);
        g.addRow(r++, new Label("Sex"), sex);
        g.addRow(r++, new Label("Date of birth"), birth);
        g.addRow(r++, new Label("Father's stature (cm, optional)"), father);
        g.addRow(r++, new Label("Mother's stature (cm, optional)"), mother);
        g.addRow(r++, new Label("Predicted adult stature (cm, optional)"), predicted);
        javafx.scene.control.ComboBox<String> language = new javafx.scene.control.ComboBox<>(
                javafx.collections.FXCollections.observableArrayList(org.shapetrail.store.Person.LETTER_LANGUAGES));
        language.setId("letter-language");
        language.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(String code) {
                return code == null || code.isEmpty() ? "as the academy writes (English)"
                        : org.shapetrail.i18n.Messages.get(java.util.Locale.forLanguageTag(code), "letter.language");
            }

            @Override
            public String fromString(String s) {
                return s;
            }
        });
        language.valueProperty().bindBidirectional(vm.letterLanguage);
        g.addRow(r++, new Label("Letters in"), language);
        if (!vm.isEdit()) {
            g.addRow(r++, new Label("Joins squad (from today)"), squad);
        }
        g.add(cm, 1, r++);
        g.add(cp, 1, r++);
        g.add(cs, 1, r++);
        g.add(new Label("To put right before saving:"), 0, r++, 2, 1);
        g.add(problems, 0, r, 2, 1);
        d.getDialogPane().setContent(g);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.CANCEL, ButtonType.OK);
        d.getDialogPane().lookupButton(ButtonType.OK).disableProperty().bind(vm.canSave.not());
        Optional<ButtonType> b = d.showAndWait();
        if (b.isPresent() && b.get() == ButtonType.OK) {
            return vm.save();
        }
        return Optional.empty();
    }
}
