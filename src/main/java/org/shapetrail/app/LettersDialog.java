package org.shapetrail.app;

import java.time.LocalDate;
import java.util.Optional;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonType;
import javafx.scene.control.CheckBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import org.shapetrail.letters.LetterSettings;

/** Asks for the period and the sender of a batch of letters. */
final class LettersDialog {
    private LettersDialog() {
    }

    static Optional<LetterSettings> ask(Window owner, String title, java.util.Locale locale) {
        Dialog<LetterSettings> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle(title);
        d.setHeaderText("Progress letters: choose the period and who signs");
        DatePicker from = DatePickers.of(LocalDate.now().minusYears(1), locale);
        from.setId("letters-from");
        DatePicker to = DatePickers.of(LocalDate.now(), locale);
        to.setId("letters-to");
        TextField academy = new TextField("Saltmarsh Bay Sports Academy");
        TextField sender = new TextField("the academy physiotherapist");
        TextField role = new TextField("");
        TextField contact = new TextField("via the academy office");
        CheckBox skinfolds = new CheckBox("Also describe skinfold thickness for juniors under 16");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.setPadding(new Insets(10));
        g.addRow(0, new Label("From"), from);
        g.addRow(1, new Label("To"), to);
        g.addRow(2, new Label("Academy"), academy);
        g.addRow(3, new Label("Signed by"), sender);
        g.addRow(4, new Label("Role"), role);
        g.addRow(5, new Label("Contact"), contact);
        g.add(skinfolds, 1, 6);
        d.getDialogPane().setContent(g);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.CANCEL, ButtonType.OK);
        d.setResultConverter(b -> b == ButtonType.OK && from.getValue() != null && to.getValue() != null
                && !to.getValue().isBefore(from.getValue())
                ? new LetterSettings(academy.getText(), sender.getText(), role.getText(), contact.getText(),
                from.getValue(), to.getValue(), skinfolds.isSelected()) : null);
        return d.showAndWait();
    }
}
