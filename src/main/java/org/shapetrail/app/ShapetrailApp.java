package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.nio.file.Files;
import java.nio.file.Path;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.ServerAddress;
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
    /** The window's settings (size, the last record opened, the last server): never a measurement or a password. */
    /** The product's name, the same in every language. */
    static final String NAME = "Shapetrail"; // not words: a name
    static final Preferences PREFS = Preferences.userRoot().node("org/shapetrail/app");
    /** The start file read while the toolkit starts (see {@link #preload}), or null. */
    private static volatile java.util.concurrent.CompletableFuture<Loaded> preloaded;
    private static volatile RecordSource preloadedFile;

    /**
     * Starts reading and computing the start file on a background thread, so that the data is ready when
     * the window is (the JavaFX toolkit takes about a second to start).
     */
    static void preload(RecordSource file) {
        if (file instanceof RecordSource.Server) {
            return; // a server may need its password asked for first: the window connects
        }
        preloadedFile = file;
        preloaded = java.util.concurrent.CompletableFuture.supplyAsync(() -> {
            try {
                return WorkbenchViewModel.load(file, org.shapetrail.history.AnalysisSettings.standard(),
                        new TaskRunner.Progress() {
                            @Override
                            public void update(double done, double total, String message) {
                            }

                            @Override
                            public boolean isCancelled() {
                                return false;
                            }
                        });
            } catch (InterruptedException e) {
                throw new java.util.concurrent.CompletionException(e);
            }
        });
    }

    @Override
    public void start(Stage stage) {
        if (Boolean.getBoolean("shapetrail.startupProbe")) {
            probe("toolkit-started");
        }
        RecordSource start = chooseStart(getParameters() == null ? List.of() : getParameters().getRaw());
        Locale language = Languages.atStart();
        Languages.speak(language); // JavaFX's own words too, from the first control on
        show(stage, start, new FxTaskRunner(), language, true);
    }

    static void probe(String what) {
        if (Boolean.getBoolean("shapetrail.startupProbe")) {
            System.out.println(what + " after " // not words: read by bench/cold-start.sh
                    + java.lang.management.ManagementFactory.getRuntimeMXBean().getUptime() + " ms"); // not words
        }
    }

    /**
     * The file named by {@code --db FILE} or passed alone (a double click on an academy file), else the last
     * one opened, else the default (seeded with the demo).
     */
    /**
     * Where the window starts: the file or server named by {@code --db}, a file passed alone (a double click
     * on an academy file), else the last record opened (a server's address is remembered without its
     * password), else the default file (seeded with the demo).
     */
    static RecordSource chooseStart(List<String> args) {
        Path alone = org.shapetrail.cli.ShapetrailCli.academyFileArgument(args.toArray(String[]::new));
        if (alone != null) {
            return RecordSource.of(alone);
        }
        for (int i = 0; i + 1 < args.size(); i++) {
            if (args.get(i).equals("--db")) {
                String target = args.get(i + 1);
                return ServerAddress.isServer(target) ? new RecordSource.Server(ServerAddress.parse(target), null)
                        : RecordSource.of(Path.of(target));
            }
        }
        String last = PREFS.get("lastFile", null);
        if (last != null && ServerAddress.isServer(last)) {
            try {
                return new RecordSource.Server(ServerAddress.parse(last), null);
            } catch (RuntimeException unreadable) {
                // an address remembered by hand-edited settings: fall back to the default file
            }
        } else if (last != null && Files.isRegularFile(Path.of(last))) {
            return RecordSource.of(Path.of(last));
        }
        Path f = DataFolder.defaultFile();
        DataFolder.seedWithSample(f);
        return RecordSource.of(f);
    }

    /**
     * The window's first size: 1440 × 900 (the people list and the person page side by side without a cut
     * column), or the screen's usable area where that is smaller.
     */
    static double defaultWidth() {
        return Math.min(1440, screen().getWidth());
    }

    static double defaultHeight() {
        return Math.min(900, screen().getHeight());
    }

    /**
     * The screen's usable area. Asked only on the FX thread once the toolkit runs (never while the class
     * loads: the launcher touches this class on the main thread before the toolkit, and a Screen looked
     * at there can never be used again).
     */
    private static javafx.geometry.Rectangle2D screen() {
        return javafx.stage.Screen.getPrimary().getVisualBounds();
    }

    /** The workbench the window shows now (a new one after each change of language). */
    public static Workbench workbenchOf(Stage stage) {
        return (Workbench) stage.getProperties().get(Workbench.class);
    }

    /**
     * Makes a language chosen in the settings apply at once: the window's content is built again in it
     * around the same state (the open record, the selected person, the page, the filters), and the record's
     * results are computed again so that their sentences are in the new language too.
     */
    private static void speakOnChoice(Stage stage, Workbench workbench) {
        stage.getProperties().put(Workbench.class, workbench);
        workbench.onSpeak(locale -> {
            Workbench earlier = workbenchOf(stage);
            Languages.speak(locale);
            earlier.retire();
            Workbench now = new Workbench(earlier.viewModel(), locale);
            speakOnChoice(stage, now);
            now.continueFrom(earlier);
            stage.getScene().setRoot(now.root());
            earlier.viewModel().reload();
        });
    }

    /** Builds and shows the window on {@code file}; tests call this with their own runner and locale. */
    public static Workbench show(Stage stage, Path file, TaskRunner runner, Locale locale, boolean remember) {
        return show(stage, RecordSource.of(file), runner, locale, remember);
    }

    /** Builds and shows the window on a file or a server's record. */
    public static Workbench show(Stage stage, RecordSource file, TaskRunner runner, Locale locale, boolean remember) {
        WorkbenchViewModel vm = new WorkbenchViewModel(runner);
        if (stage.getUserData() instanceof WorkbenchViewModel before) {
            before.letGo(); // the window gets a new workbench: the old one's file is free again
        }
        stage.setUserData(vm);
        stage.addEventHandler(javafx.stage.WindowEvent.WINDOW_HIDDEN, e -> vm.letGo());
        org.shapetrail.i18n.Messages.use(locale);
        Workbench workbench = new Workbench(vm, locale);
        probe("workbench-built");
        speakOnChoice(stage, workbench);
        double width = defaultWidth();
        double height = defaultHeight();
        Scene scene = new Scene(workbench.root(), remember ? PREFS.getDouble("width", width) : width,
                remember ? PREFS.getDouble("height", height) : height);
        scene.getStylesheets().add(ShapetrailApp.class.getResource("shapetrail.css").toExternalForm());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.F, KeyCombination.SHORTCUT_DOWN),
                () -> scene.lookup("#search").requestFocus());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.N, KeyCombination.SHORTCUT_DOWN),
                () -> workbenchOf(stage).enterVisit());
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT1, KeyCombination.SHORTCUT_DOWN),
                () -> workbenchOf(stage).pages().getSelectionModel().select(0));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT2, KeyCombination.SHORTCUT_DOWN),
                () -> workbenchOf(stage).pages().getSelectionModel().select(1));
        scene.getAccelerators().put(new KeyCodeCombination(KeyCode.DIGIT3, KeyCombination.SHORTCUT_DOWN),
                () -> workbenchOf(stage).pages().getSelectionModel().select(2));
        stage.setTitle(NAME);
        stage.setScene(scene);
        if (remember) {
            stage.setOnCloseRequest(e -> {
                PREFS.putDouble("width", scene.getWidth());
                PREFS.putDouble("height", scene.getHeight());
            });
            vm.loadedProperty().addListener((o, a, b) -> {
                if (b != null) {
                    // a server's address is kept without its password; the password is asked again next time
                    PREFS.put("lastFile", b.source().remembered());
                }
            });
        }
        probe("scene-ready");
        stage.show();
        probe("stage-shown");
        if (Boolean.getBoolean("shapetrail.startupProbe")) {
            // for bench/cold-start.sh: report when the people list is on screen, then quit
            vm.loadedProperty().addListener((o, a, b) -> javafx.application.Platform.runLater(() -> {
                long now = System.currentTimeMillis();
                long ms = now - java.lang.management.ManagementFactory.getRuntimeMXBean().getStartTime();
                System.out.println("usable window with " + vm.rows().size() + " people after " + ms // not words
                        + " ms from JVM start, at " + now + " ms since 1970"); // not words: read by bench/cold-start.sh
                javafx.application.Platform.exit();
            }));
        }
        var pre = preloaded;
        if (pre != null && file.equals(preloadedFile)) {
            preloaded = null;
            vm.statusProperty().set(tr("window.opening.named", file.title()));
            pre.whenComplete((l, t) -> javafx.application.Platform.runLater(() -> {
                probe("preload-done");
                if (l != null) {
                    vm.show(l);
                } else {
                    vm.open(file);
                }
            }));
        } else {
            vm.open(file);
        }
        return workbench;
    }
}
