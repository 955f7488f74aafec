package org.shapetrail.docs;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import javafx.application.Application;
import javafx.application.Platform;
import javafx.embed.swing.SwingFXUtils;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.shapetrail.app.ShapetrailApp;
import org.shapetrail.app.Workbench;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Writes docs/screenshots/space-3d.png: the 3D view of a junior's ratings, in a real window. Needs a
 * display with 3D (headless tests have none); see DEVELOPERS.md for the xvfb-run line that gives one.
 */
public final class SpaceViewShot extends Application {
    /** Entry point on the class path (a plain class starts JavaFX, see BUILD-NOTES). */
    public static final class Main {
        private Main() {
        }

        public static void main(String[] args) {
            Application.launch(SpaceViewShot.class, args);
        }
    }

    @Override
    public void start(Stage stage) throws Exception {
        Path f = Files.createTempDirectory("shot").resolve("demo.sqlite");
        DemoAcademy.generate(f);
        Workbench w = ShapetrailApp.show(stage, f, new org.shapetrail.app.FxTaskRunner(), Locale.UK, false);
        w.viewModel().loadedProperty().addListener((o, a, l) -> Platform.runLater(() -> {
            w.viewModel().rows().stream().filter(r -> r.name().equals("Zeb Thistlewood")).findFirst()
                    .ifPresent(r -> w.viewModel().selectedProperty().set(r));
            w.personPane().views().getSelectionModel().select(2);
            w.personPane().space().orbit().drag(40, -20);
            new Thread(() -> {
                try {
                    Thread.sleep(1500);
                    Platform.runLater(() -> {
                        try {
                            var img = w.personPane().views().snapshot(null, null);
                            Path out = Path.of(System.getProperty("shapetrail.screenshots", "docs/screenshots"));
                            Files.createDirectories(out);
                            ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", out.resolve("space-3d.png").toFile());
                            System.out.println("3D supported: " + Platform.isSupported(
                                    javafx.application.ConditionalFeature.SCENE3D));
                        } catch (Exception e) {
                            e.printStackTrace();
                        }
                        Platform.exit();
                    });
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }).start();
        }));
    }
}
