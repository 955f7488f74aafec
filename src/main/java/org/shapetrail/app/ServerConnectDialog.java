package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Optional;
import java.util.prefs.Preferences;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.PasswordField;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.ServerAddress;
import org.shapetrail.store.StoreException;

/**
 * "Connect to a server…": the server's address (the last one is offered; it is remembered without the
 * password) and the password for this session, which is kept in memory only. The address is checked
 * before the dialog closes; the connection itself is made by the workbench, which says what went wrong.
 */
final class ServerConnectDialog {
    private static final Preferences PREFS = ShapetrailApp.PREFS;
    static final String LAST_SERVER = "lastServer";

    private ServerConnectDialog() {
    }

    /** The address last connected to, or an example of the form. */
    static String lastAddress() {
        return PREFS.get(LAST_SERVER, "");
    }

    /** Remembers an address (never a password). */
    static void remember(ServerAddress a) {
        PREFS.put(LAST_SERVER, a.toString());
    }

    /**
     * Asks; empty when cancelled.
     *
     * @param address the address to offer, or null for the last one
     * @param why a line above the fields (e.g. why a password is asked for now), or null
     */
    static Optional<RecordSource.Server> ask(Window owner, String address, String why) {
        Dialog<RecordSource.Server> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle(tr("server.title"));
        d.setHeaderText(why != null ? why
                : tr("server.header"));
        TextField where = new TextField(address != null ? address : lastAddress());
        where.setId("server-address");
        where.setPromptText("postgresql://ana@academy-server:5432/academy");
        where.setPrefColumnCount(36);
        PasswordField password = new PasswordField();
        password.setId("server-password");
        password.setPromptText(tr("server.password.prompt"));
        Label problem = new Label();
        problem.setId("server-problem");
        problem.setWrapText(true);
        problem.setMaxWidth(520);
        problem.getStyleClass().add("form-problem");
        problem.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE); // the whole message, over as many lines as it takes
        where.textProperty().addListener((o, a, b) -> problem.setText("")); // an old complaint goes once the address changes
        Label note = new Label(tr("server.note"));
        note.getStyleClass().add("hint");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(8);
        g.setPadding(new Insets(12));
        g.addRow(0, new Label(tr("server.address")), where);
        g.addRow(1, new Label(tr("server.password")), password);
        g.add(note, 1, 2);
        g.add(problem, 0, 3, 2, 1);
        d.getDialogPane().setContent(g);
        ButtonType connect = new ButtonType(tr("server.connect"), ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().addAll(connect, Buttons.cancel());
        if (owner != null && owner.getScene() != null) {
            d.getDialogPane().getStylesheets().addAll(owner.getScene().getStylesheets());
        }
        // a wrong address is said at once, and the dialog stays open with what was typed
        d.getDialogPane().lookupButton(connect).addEventFilter(javafx.event.ActionEvent.ACTION, e -> {
            try {
                ServerAddress.parse(where.getText());
                problem.setText("");
            } catch (StoreException bad) {
                problem.setText(bad.getMessage());
                e.consume();
            }
        });
        d.setResultConverter(b -> {
            if (b != connect) {
                return null;
            }
            char[] pw = password.getText().isEmpty() ? null : password.getText().toCharArray();
            return new RecordSource.Server(ServerAddress.parse(where.getText()), pw);
        });
        javafx.application.Platform.runLater(() -> (where.getText().isBlank() ? where : password).requestFocus());
        return d.showAndWait();
    }
}
