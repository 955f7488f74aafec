package org.shapetrail.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.prefs.Preferences;
import javafx.application.Application;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.stage.Stage;
import org.shapetrail.store.DataFolder;

/** The JavaFX application: builds the workbench window, remembers its size and the last file. */
public final class ShapetrailApp extends Application {
    private static final Preferences PREFS = Preferences.userRoot().node("org/shapetrail/app");

    @Override
    public void start(Stage stage) {
        Path file = chooseStartFile(getParameters() == null ? List.of() : getParameters().getRaw());
        show(stage, file, new FxTaskRunner(), Locale.getDefault(Locale.Category.FORMAT), true);
    }

    /** The file named by {@code --db FILE}, else the last one opened, else the default (seeded with the demo). */
    static Path chooseStartFile(List<String> args) {
        for (int i = 0; i + 1 < args.size(); i++) {
            if (args.get(i).equals("--db")) {
                return Path.of(args.get(i + 1));
            }
        }
        String last = PREFS.get("lastFile", null);
        if (last != null && Files.isRegularFile(Path.of(last))) {
            return Path.of(last);
        }
        Path f = DataFolder.defaultFile();
        DataFolder.seedWithSample(f);
        return f;
    }

    /** Builds and shows the window on {@code file}; tests call this with their own runner and locale. */
    public static Workbench show(Stage stage, Path file, TaskRunner runner, Locale locale, boolean remember) {
        WorkbenchViewModel vm = new WorkbenchViewModel(runner);
        Workbench workbench = new Workbench(vm, locale);
        Scene scene = new Scene(workbench.root(), remember ? PREFS.getDouble("width", 1360) : 1360,
                remember ? PREFS.getDouble("height", 860) : 860);
        scene.getStylesheets().add(ShapetrailApp.class.getResource("shapetrail.css").toExternalForm());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.F, KeyCombination.SHORTCUT_DOWN),
                () -> scene.lookup("#search").requestFocus());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.N, KeyCombination.SHORTCUT_DOWN),
                () -> workbench.enterVisit(null));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT1, KeyCombination.SHORTCUT_DOWN),
                () -> workbench.pages().getSelectionModel().select(0));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT2, KeyCombination.SHORTCUT_DOWN),
                () -> workbench.pages().getSelectionModel().select(1));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT3, KeyCombination.SHORTCUT_DOWN),
                () -> workbench.pages().getSelectionModel().select(2));
        stage.setTitle("Shapetrail");
        stage.setScene(scene);
        if (remember) {
            stage.setOnCloseRequest(e -> {
                PREFS.putDouble("width", scene.getWidth());
                PREFS.putDouble("height", scene.getHeight());
            });
            vm.loadedProperty().addListener((o, a, b) -> {
                if (b != null) {
                    PREFS.put("lastFile", b.file().toAbsolutePath().toString());
                }
            });
        }
        stage.show();
        vm.open(file);
        return workbench;
    }
}
