package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Optional;
import javafx.scene.control.ButtonBar.ButtonData;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;

/**
 * The dialogs' buttons in the window's language. JavaFX's own ButtonType.OK and CANCEL take their words
 * from the system's language once, when first used, so a language chosen in the settings would not reach
 * them; these are made with the bundle's words, and a choice is read by its role, not its identity.
 */
final class Buttons {
    private Buttons() {
    }

    static ButtonType ok() {
        return new ButtonType(tr("button.ok"), ButtonData.OK_DONE);
    }

    static ButtonType cancel() {
        return new ButtonType(tr("button.cancel"), ButtonData.CANCEL_CLOSE);
    }

    static ButtonType close() {
        return new ButtonType(tr("button.close"), ButtonData.CANCEL_CLOSE);
    }

    /** True when the dialog was closed with its OK button (not cancelled, not closed). */
    static boolean okIn(Optional<ButtonType> chosen) {
        return chosen.isPresent() && chosen.get().getButtonData() == ButtonData.OK_DONE;
    }

    /** Gives a dialog Cancel and OK in the window's language; returns the OK button's type. */
    static ButtonType cancelAndOk(Dialog<?> d) {
        ButtonType ok = ok();
        d.getDialogPane().getButtonTypes().setAll(cancel(), ok);
        return ok;
    }
}
