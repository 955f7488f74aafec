package org.shapetrail.app;

import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Label;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;

/** The main window's content: a header, the working area and the standing caution. */
public final class Workbench {
    private final BorderPane root = new BorderPane();

    public Workbench() {
        Label title = new Label("Shapetrail");
        title.setId("app-title");
        title.getStyleClass().add("app-title");
        Label subtitle = new Label("Somatotype, growth and measurement noise, visit by visit.");
        subtitle.getStyleClass().add("app-subtitle");
        VBox header = new VBox(2, title, subtitle);
        header.getStyleClass().add("app-header");
        header.setPadding(new Insets(12, 16, 12, 16));
        root.setTop(header);
        Label caution = new Label(Cautions.SHAPE_NOT_WORTH);
        caution.setId("caution");
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.setPadding(new Insets(6, 16, 6, 16));
        root.setBottom(caution);
    }

    public Parent root() {
        return root;
    }
}
