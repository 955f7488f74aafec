package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javafx.scene.Node;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Label;
import javafx.scene.control.Labeled;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.text.Text;
import javafx.stage.Stage;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.shapetrail.store.Database;
import org.shapetrail.store.TrainingBlock;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * What a new user meets in the first hour, at the default window size: a people list with nothing cut
 * short, its change over a chosen period sorted largest first and kept over a reload, a juniors filter,
 * the training blocks made in the app, and a visit entry that names whose record it goes into.
 */
@Tag("gui")
@ExtendWith(ApplicationExtension.class)
class FirstHourGuiTest {
    static Path demo;
    Path file;
    Workbench workbench;
    Stage stage;

    @BeforeAll
    static void makeDemo() throws Exception {
        demo = Files.createTempDirectory("gui").resolve("demo.sqlite");
        DemoAcademy.generate(demo);
    }

    @Start
    void start(Stage stage) throws Exception {
        this.stage = stage;
        file = Files.createTempDirectory("first-hour").resolve("saltmarsh-bay.sqlite");
        Files.copy(demo, file, StandardCopyOption.REPLACE_EXISTING);
        workbench = ShapetrailApp.show(stage, file, new DirectTaskRunner(), Locale.UK, false);
    }

    @SuppressWarnings("unchecked")
    static TableView<PersonRow> people(FxRobot r) {
        return r.lookup("#people").queryAs(TableView.class);
    }

    /** Every text drawn inside {@code root} that the skin cut short (its ellipsis) although its control holds more. */
    static List<String> cut(Node root) {
        List<String> out = new ArrayList<>();
        for (Node n : root.lookupAll(".text")) {
            if (n instanceof Text t && t.getText() != null && t.getParent() instanceof Labeled l
                    && l.getText() != null && !t.getText().equals(l.getText())
                    && t.getText().endsWith(l.getEllipsisString())) {
                out.add(l.getText());
            }
        }
        return out;
    }

    /** The table's columns fit its width: nothing hidden behind a horizontal scroll. */
    static void fits(TableView<?> t) {
        double sum = t.getColumns().stream().mapToDouble(TableColumn::getWidth).sum();
        assertTrue(sum <= t.getWidth() + 0.5, "columns " + sum + " in a table " + t.getWidth() + " wide");
    }

    @Test
    void thePeopleListShowsEveryHeaderAndCellInFullAtTheDefaultSize(FxRobot robot) {
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(ShapetrailApp.defaultWidth(), stage.getScene().getWidth(), 0.5);
        assertEquals(1440, ShapetrailApp.defaultWidth(), 0.5); // the headless screen is 1600 wide (pom)
        TableView<PersonRow> t = people(robot);
        assertEquals(List.of(), cut(t));
        fits(t);
    }

    @Test
    void theChangeOverAPeriodSortsLargestFirstAndSurvivesAReload(FxRobot robot) {
        robot.interact(() -> {
            robot.lookup("#period-choice").queryAs(ComboBox.class).getSelectionModel().select(Period.Kind.BETWEEN);
            robot.lookup("#period-from").queryAs(DatePicker.class).setValue(LocalDate.of(2025, 9, 1));
            robot.lookup("#period-to").queryAs(DatePicker.class).setValue(LocalDate.of(2026, 4, 30));
        });
        WaitForAsyncUtils.waitForFxEvents();
        TableView<PersonRow> t = people(robot);
        TableColumn<PersonRow, ?> change = t.getColumns().get(4);
        assertEquals("Change\n1 Sept 2025 to 30 Apr 2026", ((Label) change.getGraphic()).getText());
        // the first click on the column puts the largest change first
        robot.clickOn(change.getGraphic());
        WaitForAsyncUtils.waitForFxEvents();
        List<Double> multiples = t.getItems().stream().map(PersonRow::multiple).filter(m -> !m.isNaN()).toList();
        assertTrue(multiples.size() > 40, "changes over the period " + multiples.size());
        for (int i = 1; i < multiples.size(); i++) {
            assertTrue(multiples.get(i - 1) >= multiples.get(i), "largest first at " + i + ": " + multiples);
        }
        PersonRow second = t.getItems().get(1);
        robot.interact(() -> t.getSelectionModel().select(second));
        robot.interact(() -> workbench.viewModel().reload());
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(second.id(), t.getSelectionModel().getSelectedItem().id(), "the selection is kept");
        List<Double> after = t.getItems().stream().map(PersonRow::multiple).filter(m -> !m.isNaN()).toList();
        assertEquals(multiples, after, "the order is kept");
        assertEquals(List.of(), cut(t));
    }

    @Test
    void theJuniorsFilterKeepsOnlyTheUnderEighteens(FxRobot robot) {
        robot.interact(() -> workbench.viewModel().ageBandProperty().set(AgeBand.JUNIORS));
        WaitForAsyncUtils.waitForFxEvents();
        List<PersonRow> rows = people(robot).getItems();
        assertFalse(rows.isEmpty());
        assertTrue(rows.stream().allMatch(r -> r.age() < 18), "juniors only");
    }

    @Test
    void aBlockIsMadeInTheAppAndItsPageListsEveryAthleteInFull(FxRobot robot) throws Exception {
        robot.interact(() -> workbench.pages().getSelectionModel().select(1));
        robot.interact(() -> ((javafx.scene.control.TabPane) robot.lookup("#squad-views").query()).getSelectionModel()
                .select(1));
        robot.interact(() -> robot.lookup("#block-squad-choice").queryAs(ComboBox.class).setValue("Rowing juniors"));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(DemoAcademy.JUNIOR_BLOCK_NAME, robot.lookup("#block-choice").queryAs(ComboBox.class).getValue());
        TableView<?> athletes = robot.lookup("#block-athletes").queryAs(TableView.class);
        assertTrue(athletes.getItems().size() >= 10, "athletes " + athletes.getItems().size());
        assertEquals(List.of(), cut(athletes));
        WorkbenchGuiTest.snapshot(stage.getScene().getRoot(), "workbench-block-junior.png");
        // a new block through the form: name and days typed, the defaults taken
        robot.clickOn("#new-block");
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#block-name").write("Rowing juniors spring block");
        robot.interact(() -> {
            robot.lookup("#block-start").queryAs(DatePicker.class).setValue(LocalDate.of(2026, 4, 20));
            robot.lookup("#block-end").queryAs(DatePicker.class).setValue(LocalDate.of(2026, 8, 1));
        });
        WaitForAsyncUtils.waitForFxEvents();
        WorkbenchGuiTest.snapshot(robot.lookup("#block-members").query().getScene().getRoot(), "block-form.png");
        robot.clickOn(robot.lookup(".button").match(n -> n instanceof javafx.scene.control.Button b
                && b.getText().equals("OK")).queryButton());
        WaitForAsyncUtils.waitForFxEvents();
        try (Database db = Database.open(file)) {
            TrainingBlock b = db.inTransaction(tx -> tx.blocks().all()).stream()
                    .filter(x -> x.name().equals("Rowing juniors spring block")).findFirst().orElseThrow();
            assertEquals(LocalDate.of(2026, 8, 1), b.endsOn());
        }
        assertEquals("Rowing juniors spring block", robot.lookup("#block-choice").queryAs(ComboBox.class).getValue());
    }

    @Test
    void theVisitEntryNamesThePersonAndStartsAtTheDate(FxRobot robot) throws Exception {
        robot.interact(() -> people(robot).getItems().stream().filter(r -> r.name().equals("Caspian Coldharbour"))
                .findFirst().ifPresent(r -> people(robot).getSelectionModel().select(r)));
        WaitForAsyncUtils.waitForFxEvents();
        VisitEntryView[] entry = new VisitEntryView[1];
        robot.interact(() -> {
            entry[0] = workbench.entryFor(null);
            entry[0].show();
        });
        WaitForAsyncUtils.waitForFxEvents();
        String who = robot.lookup("#visit-person").queryAs(Label.class).getText();
        assertTrue(who.startsWith("New visit for Caspian Coldharbour · ") && who.endsWith(" years · Football U16"), who);
        assertTrue(robot.lookup("#visit-date").queryAs(DatePicker.class).isFocused()
                || robot.lookup("#visit-date").queryAs(DatePicker.class).getEditor().isFocused(), "the date comes first");
        robot.interact(() -> robot.lookup("#stature-1").queryAs(TextField.class).setText("171.2"));
        WorkbenchGuiTest.snapshot(robot.lookup("#visit-entry").query(), "visit-entry-junior.png");
    }
}
