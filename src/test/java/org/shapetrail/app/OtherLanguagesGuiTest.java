package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TabPane;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.shapetrail.i18n.Messages;
import org.shapetrail.measure.Site;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window as a new user with the system in Spanish sees it: every text in Spanish, decimal commas typed
 * and shown, the verdict in Spanish; then Portuguese chosen in the settings changes the open window at once
 * and keeps the page and the person.
 */
@Tag("gui")
@ExtendWith(ApplicationExtension.class)
class OtherLanguagesGuiTest {
    static final Locale SPAIN = Locale.forLanguageTag("es-ES");
    /** The JVM's default before the window changed it (the window speaks its language to JavaFX too). */
    static final Locale BEFORE = Locale.getDefault();
    static Path demo;
    Path file;
    Stage stage;

    @BeforeAll
    static void makeDemo() throws Exception {
        demo = Files.createTempDirectory("gui-es").resolve("demo.sqlite");
        DemoAcademy.generate(demo);
    }

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        file = Files.createTempDirectory("gui-es-test").resolve("saltmarsh-bay.sqlite");
        Files.copy(demo, file, StandardCopyOption.REPLACE_EXISTING);
        ShapetrailApp.show(stage, file, new DirectTaskRunner(), SPAIN, false);
    }

    @AfterEach
    void backToEnglish() {
        Messages.use(Locale.ROOT); // the other tests read English
        Locale.setDefault(BEFORE);
        ShapetrailApp.PREFS.remove(Languages.KEY);
    }

    Workbench workbench() {
        return ShapetrailApp.workbenchOf(stage);
    }

    void select(FxRobot robot, String name) {
        robot.interact(() -> {
            @SuppressWarnings("unchecked")
            TableView<PersonRow> t = robot.lookup("#people").queryAs(TableView.class);
            t.getItems().stream().filter(p -> p.name().equals(name)).findFirst()
                    .ifPresent(p -> t.getSelectionModel().select(p));
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void aVisitTypedWithDecimalCommasGetsItsVerdictInSpanish(FxRobot robot) throws Exception {
        TabPane pages = robot.lookup("#pages").queryAs(TabPane.class);
        // the bundle's Spanish words (messages_es.properties), not English ones
        assertEquals("Persona", pages.getTabs().get(0).getText());
        assertEquals("Ajustes", pages.getTabs().get(3).getText());
        assertTrue(robot.lookup("#caution").queryAs(Label.class).getText().startsWith("El somatotipo describe"));
        select(robot, "Freya Breakwater");
        Label latest = robot.lookup("#latest-change").queryAs(Label.class);
        // her latest change is beyond noise (WorkbenchGuiTest reads the same in English); the multiple has a comma
        assertTrue(latest.getText().contains("más allá del ruido: el cambio es "), latest.getText());
        assertTrue(latest.getText().matches(".*\\d,\\d\\d veces el límite del ruido.*"), latest.getText());
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "workbench-person-es.png");

        VisitEntryView[] entry = new VisitEntryView[1];
        robot.interact(() -> {
            entry[0] = workbench().entryFor(null);
            entry[0].show();
        });
        WaitForAsyncUtils.waitForFxEvents();
        // a stature typed in metres: the unit hint in Spanish, with the corrected value in decimal commas
        // (check.likelyUnit: 1,68 m × 100 = 168,0 cm)
        robot.clickOn("#stature-1").write("1,68").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Toma 1: Estatura 1,68 parece estar en metros; introduzca 168,0 cm. Estatura necesita una"
                + " segunda toma.", robot.lookup("#stature-message").queryAs(Label.class).getText());
        robot.doubleClickOn("#stature-1").eraseText(4);
        // the same complete visit as WorkbenchGuiTest's, typed the Spanish way
        String[][] values = {{"61,2", "61,2"}, {"168,4", "168,6"}, {"88,1", "88,3"}, {"10,2", "10,4"},
            {"8,8", "9,0"}, {"7,4", "7,6"}, {"9,0", "9,2"}, {"29,9", "30,0"}, {"34,6", "34,6"}, {"6,5", "6,5"},
            {"9,1", "9,1"}};
        robot.clickOn("#body_mass-1");
        for (String[] pair : values) {
            robot.write(pair[0]).type(KeyCode.ENTER).write(pair[1]).type(KeyCode.ENTER);
        }
        WaitForAsyncUtils.waitForFxEvents();
        String live = robot.lookup("#live-rating").queryAs(Label.class).getText();
        assertTrue(live.matches("Somatotipo \\d+,\\d-\\d+,\\d-\\d+,\\d — .+"), live);
        String verdict = robot.lookup("#live-verdict").queryAs(Label.class).getText();
        assertTrue(verdict.startsWith("Frente a la visita del "), verdict);
        assertTrue(verdict.contains(" veces el límite del ruido (1,00 es el límite; ETM propio de "), verdict);
        WorkbenchGuiTest.snapshot(robot.lookup("#visit-entry").query(), "visit-entry-es.png");
        robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(entry[0].saved().isPresent(), "saved");
        try (Database db = Database.open(file)) {
            var saved = db.inTransaction(tx -> tx.visits().find(entry[0].saved().get().id())).orElseThrow();
            // "61,2" typed twice is 61.2 kg stored (the decimal comma read as the decimal separator)
            assertEquals(61.2, saved.trials().stream().filter(t -> t.site() == Site.BODY_MASS).findFirst()
                    .orElseThrow().values().get(0), 1e-9);
        }
    }

    @Test
    void portugueseChosenInTheSettingsChangesTheOpenWindowAtOnce(FxRobot robot) throws Exception {
        select(robot, "Freya Breakwater");
        robot.interact(() -> workbench().pages().getSelectionModel().select(3));
        WaitForAsyncUtils.waitForFxEvents();
        @SuppressWarnings("unchecked")
        ComboBox<String> language = robot.lookup("#window-language").queryAs(ComboBox.class);
        robot.interact(() -> language.setValue("pt"));
        WaitForAsyncUtils.waitForFxEvents();
        TabPane pages = robot.lookup("#pages").queryAs(TabPane.class);
        assertEquals("Pessoa", pages.getTabs().get(0).getText());
        assertEquals(3, pages.getSelectionModel().getSelectedIndex(), "the settings page stays open");
        assertEquals("Idioma da janela", robot.lookup("#window-language").queryAs(ComboBox.class)
                .getParent().getChildrenUnmodifiable().stream().filter(n -> n instanceof Label).map(n -> ((Label) n)
                        .getText()).findFirst().orElse(""));
        assertEquals("pt", Messages.languageOf(Messages.current()));
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "settings-pt.png");
        robot.interact(() -> workbench().pages().getSelectionModel().select(0));
        WaitForAsyncUtils.waitForFxEvents();
        // the person chosen before is still the one shown, now in Portuguese
        assertEquals("Freya Breakwater", robot.lookup("#person-title").queryAs(Label.class).getText());
        String latest = robot.lookup("#latest-change").queryAs(Label.class).getText();
        assertTrue(latest.contains("além do ruído: a mudança é "), latest);
        assertTrue(robot.lookup("#caution").queryAs(Label.class).getText().startsWith("O somatótipo descreve"));
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "workbench-person-pt.png");
        WaitForAsyncUtils.asyncFx(() -> null).get(5, TimeUnit.SECONDS);
    }

    @Test
    void theSquadBlocksAndMeasurersPagesSpeakSpanishToo(FxRobot robot) throws Exception {
        robot.interact(() -> {
            workbench().pages().getSelectionModel().select(1);
            workbench().squadChoice().setValue("Senior squad");
        });
        WaitForAsyncUtils.waitForFxEvents();
        String squad = robot.lookup("#squad-summary").queryAs(Label.class).getText();
        // squad.summary's Spanish, with the mean rating and SAM in decimal commas
        assertTrue(squad.matches("\\d+ integrantes actuales, \\d+ con somatotipo\\. Somatotipo medio \\d,\\d-\\d,\\d-\\d,\\d;"
                + " SAM \\d,\\d\\d .*"), squad);
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "squad-es.png");
        robot.interact(() -> ((TabPane) robot.lookup("#squad-views").query()).getSelectionModel().select(1));
        WaitForAsyncUtils.waitForFxEvents();
        var l = workbench().viewModel().loadedProperty().get();
        var review = org.shapetrail.history.BlockReview.of(l.builder(), l.builder().academy().blocks().stream()
                .filter(x -> x.name().equals(DemoAcademy.BLOCK_NAME)).findFirst().orElseThrow(), 21);
        String block = robot.lookup("#block-summary").queryAs(Label.class).getText();
        // the same count WorkbenchGuiTest reads in English, in block.beyond's Spanish
        assertTrue(block.contains(review.result().beyondNoise() + " de " + review.result().n()
                + " cambiaron más allá del ruido de medición"), block);
        assertTrue(robot.lookup("#block-left-out").queryAs(Label.class).getText().startsWith("Fuera del análisis: "));
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "block-es.png");
        robot.interact(() -> workbench().pages().getSelectionModel().select(2));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#measurer-list").queryAs(Label.class).getText().startsWith("Evaluadores en este archivo: "));
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "measurers-es.png");
    }

    @Test
    void thePersonFormAndItsButtonsSpeakSpanishAndCancelWritesNothing(FxRobot robot) throws Exception {
        int before = robot.lookup("#people").queryAs(TableView.class).getItems().size();
        robot.clickOn("#new-person");
        WaitForAsyncUtils.waitForFxEvents();
        javafx.scene.Node name = robot.lookup("#person-name").query();
        javafx.scene.control.DialogPane pane = (javafx.scene.control.DialogPane) name.getScene().getRoot();
        // form.title.new and the dialog's own buttons (Buttons: button.ok, button.cancel) in Spanish
        assertEquals("Persona nueva", ((Stage) name.getScene().getWindow()).getTitle());
        java.util.List<String> buttons = pane.getButtonTypes().stream().map(b -> ((javafx.scene.control.Button)
                pane.lookupButton(b)).getText()).toList();
        assertEquals(java.util.List.of("Cancelar", "Aceptar"), buttons);
        assertTrue(pane.lookupAll(".label").stream().anyMatch(n -> "Fecha de nacimiento".equals(((Label) n).getText())));
        WorkbenchGuiTest.snapshot(pane, "person-form-es.png");
        robot.clickOn(robot.lookup(".button").match(n -> n instanceof javafx.scene.control.Button b
                && b.getText().equals("Cancelar")).queryButton());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, robot.lookup("#people").queryAs(TableView.class).getItems().size());
    }
}
