package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

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
        d.setHeaderText(tr("letters.header"));
        DatePicker from = DatePickers.of(LocalDate.now().minusYears(1), locale);
        from.setId("letters-from");
        DatePicker to = DatePickers.of(LocalDate.now(), locale);
        to.setId("letters-to");
        LetterSettings last = remembered(LocalDate.now().minusYears(1), LocalDate.now());
        TextField academy = new TextField(last.academy());
        academy.setId("letters-academy");
        academy.setPromptText(tr("letters.academy.prompt"));
        TextField sender = new TextField(last.sender());
        TextField role = new TextField(last.senderRole());
        TextField contact = new TextField(last.contact());
        CheckBox skinfolds = new CheckBox(tr("letters.skinfolds"));
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.setPadding(new Insets(10));
        g.addRow(0, new Label(tr("letters.from")), from);
        g.addRow(1, new Label(tr("letters.to")), to);
        g.addRow(2, new Label(tr("letters.academy")), academy);
        g.addRow(3, new Label(tr("letters.sender")), sender);
        g.addRow(4, new Label(tr("letters.role")), role);
        g.addRow(5, new Label(tr("letters.contact")), contact);
        g.add(skinfolds, 1, 6);
        d.getDialogPane().setContent(g);
        ButtonType ok = Buttons.cancelAndOk(d);
        d.setResultConverter(b -> b == ok && from.getValue() != null && to.getValue() != null
                && !to.getValue().isBefore(from.getValue())
                ? new LetterSettings(academy.getText(), sender.getText(), role.getText(), contact.getText(),
                from.getValue(), to.getValue(), skinfolds.isSelected()) : null);
        Optional<LetterSettings> chosen = d.showAndWait();
        chosen.ifPresent(LettersDialog::remember);
        return chosen;
    }

    /**
     * The letter settings last used on this computer for a period (the academy's name, who signs, the
     * contact); the first time, no academy name and the usual sender in the window's language.
     */
    static LetterSettings remembered(LocalDate from, LocalDate to) {
        var p = ShapetrailApp.PREFS;
        return new LetterSettings(p.get("letters.academy", ""), p.get("letters.sender", tr("preview.role")),
                p.get("letters.role", ""), p.get("letters.contact", tr("preview.contact")), from, to, false);
    }

    private static void remember(LetterSettings s) {
        var p = ShapetrailApp.PREFS;
        p.put("letters.academy", s.academy());
        p.put("letters.sender", s.sender());
        p.put("letters.role", s.senderRole());
        p.put("letters.contact", s.contact());
    }
}
