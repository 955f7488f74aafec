package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.Label;
import javafx.stage.Stage;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

@Tag("gui")
@ExtendWith(ApplicationExtension.class)
class WorkbenchGuiTest {
    @Start
    void start(Stage stage) throws Exception {
        new ShapetrailApp().start(stage);
    }

    @Test
    void windowShowsTheTitleAndTheStandingCaution(FxRobot robot) {
        Label title = robot.lookup("#app-title").queryAs(Label.class);
        assertEquals("Shapetrail", title.getText());
        assertTrue(title.isVisible());
        Label caution = robot.lookup("#caution").queryAs(Label.class);
        assertTrue(caution.getText().startsWith("The somatotype describes present body shape."));
    }
}
