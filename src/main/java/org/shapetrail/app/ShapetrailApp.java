package org.shapetrail.app;

import javafx.application.Application;
import javafx.scene.Scene;
import javafx.stage.Stage;

/** The JavaFX application: builds the workbench window. */
public final class ShapetrailApp extends Application {
    @Override
    public void start(Stage stage) {
        Workbench workbench = new Workbench();
        Scene scene = new Scene(workbench.root(), 1200, 800);
        scene.getStylesheets().add(ShapetrailApp.class.getResource("shapetrail.css").toExternalForm());
        stage.setTitle("Shapetrail");
        stage.setScene(scene);
        stage.show();
    }
}
