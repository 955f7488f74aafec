package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

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
        d.setTitle(tr(vm.isEdit() ? "form.title.edit" : "form.title.new"));
        TextField name = new TextField();
        name.setId("person-name");
        name.textProperty().bindBidirectional(vm.name);
        ComboBox<Sex> sex = new ComboBox<>();
        sex.getItems().setAll(Sex.values());
        sex.valueProperty().bindBidirectional(vm.sex);
        sex.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(Sex s) {
                return s == null ? "" : tr(s == Sex.FEMALE ? "person.female" : "person.male");
            }

            @Override
            public Sex fromString(String s) {
                return null;
            }
        });
        DatePicker birth = DatePickers.of(null, vm.locale());
        birth.valueProperty().bindBidirectional(vm.birth);
        TextField father = new TextField();
        father.textProperty().bindBidirectional(vm.father);
        TextField mother = new TextField();
        mother.textProperty().bindBidirectional(vm.mother);
        TextField predicted = new TextField();
        predicted.textProperty().bindBidirectional(vm.predicted);
        CheckBox cm = new CheckBox(tr("form.consent.measure"));
        cm.selectedProperty().bindBidirectional(vm.consentMeasurement);
        CheckBox cp = new CheckBox(tr("form.consent.photos"));
        cp.selectedProperty().bindBidirectional(vm.consentPhotographs);
        CheckBox cs = new CheckBox(tr("form.consent.share"));
        cs.selectedProperty().bindBidirectional(vm.consentSharing);
        ComboBox<Squad> squad = new ComboBox<>(vm.squads);
        squad.valueProperty().bindBidirectional(vm.squad);
        squad.setConverter(new StringConverter<>() {
            @Override
            public String toString(Squad s) {
                return s == null ? tr("form.noSquad") : s.name();
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
        g.addRow(r++, new Label(tr("form.name")), name);
        g.addRow(r++, new Label(tr("form.sex")), sex);
        g.addRow(r++, new Label(tr("form.birth")), birth);
        g.addRow(r++, new Label(tr("form.father")), father);
        g.addRow(r++, new Label(tr("form.mother")), mother);
        g.addRow(r++, new Label(tr("form.predicted")), predicted);
        javafx.scene.control.ComboBox<String> language = new javafx.scene.control.ComboBox<>(
                javafx.collections.FXCollections.observableArrayList(org.shapetrail.store.Person.LETTER_LANGUAGES));
        language.setId("letter-language");
        language.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(String code) {
                return code == null || code.isEmpty() ? tr("form.letters.default", Languages.nameOf(
                        org.shapetrail.i18n.Messages.languageOf(org.shapetrail.i18n.Messages.current())))
                        : Languages.nameOf(code);
            }

            @Override
            public String fromString(String s) {
                return s;
            }
        });
        language.valueProperty().bindBidirectional(vm.letterLanguage);
        g.addRow(r++, new Label(tr("form.letters")), language);
        if (!vm.isEdit()) {
            g.addRow(r++, new Label(tr("form.joins")), squad);
        }
        g.add(cm, 1, r++);
        g.add(cp, 1, r++);
        g.add(cs, 1, r++);
        g.add(new Label(tr("form.toPutRight")), 0, r++, 2, 1);
        g.add(problems, 0, r, 2, 1);
        d.getDialogPane().setContent(g);
        ButtonType ok = Buttons.cancelAndOk(d);
        d.getDialogPane().lookupButton(ok).disableProperty().bind(vm.canSave.not());
        Optional<ButtonType> b = d.showAndWait();
        if (Buttons.okIn(b)) {
            return vm.save();
        }
        return Optional.empty();
    }
}
