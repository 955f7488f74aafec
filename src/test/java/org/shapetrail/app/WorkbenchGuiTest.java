package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;
import org.shapetrail.docs.Screenshots;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/** The workbench as a person uses it, headless (TestFX with Monocle), on a fresh copy of the demo file. */
@Tag("gui")
@ExtendWith(ApplicationExtension.class)
class WorkbenchGuiTest {
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
        // the sample academy under its own name, as the screenshots show it
        file = Files.createTempDirectory("gui-test").resolve("saltmarsh-bay.sqlite");
        Files.copy(demo, file, StandardCopyOption.REPLACE_EXISTING);
        workbench = ShapetrailApp.show(stage, file, new DirectTaskRunner(), Locale.UK, false);
    }

    static void snapshot(Node n, String name) throws Exception {
        var img = WaitForAsyncUtils.asyncFx(() -> n.snapshot(null, null)).get(10, TimeUnit.SECONDS);
        ImageIO.write(SwingFXUtils.fromFXImage(img, null), "png", Screenshots.folder().resolve(name).toFile());
    }

    @SuppressWarnings("unchecked")
    static TableView<PersonRow> people(FxRobot r) {
        return r.lookup("#people").queryAs(TableView.class);
    }

    void select(FxRobot robot, String name) {
        robot.interact(() -> {
            TableView<PersonRow> t = people(robot);
            t.getItems().stream().filter(p -> p.name().equals(name)).findFirst()
                    .ifPresent(p -> t.getSelectionModel().select(p));
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void opensTheDemoAcademyWithEveryoneListedAndTheCaution(FxRobot robot) throws Exception {
        assertEquals("Shapetrail", robot.lookup("#app-title").queryAs(Label.class).getText());
        assertEquals(60, /* the demo academy: 40 juniors + 20 seniors */ people(robot).getItems().size());
        assertTrue(robot.lookup("#caution").queryAs(Label.class).getText()
                .startsWith("The somatotype describes present body shape."));
        select(robot, "Freya Breakwater");
        Label latest = robot.lookup("#latest-change").queryAs(Label.class);
        assertTrue(latest.getText().contains("beyond noise"), latest.getText());
        // the screenshot shows a junior in the growth spurt: what the person page is most often opened for
        select(robot, "Caspian Coldharbour");
        snapshot(stage.getScene().getRoot(), "workbench-person.png");
        robot.clickOn("#dark-theme");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(stage.getScene().getRoot().getStyleClass().contains("dark"));
        snapshot(stage.getScene().getRoot(), "workbench-dark.png");
    }

    @Test
    void aSecondWindowOnTheSameFileIsReadOnlyAndSaysWhoHasIt(FxRobot robot) throws Exception {
        Label first = robot.lookup("#read-only-note").queryAs(Label.class);
        assertFalse(first.isVisible(), "the first window on a file edits it");
        Stage second = WaitForAsyncUtils.asyncFx(() -> {
            Stage s = new Stage();
            ShapetrailApp.show(s, file, new DirectTaskRunner(), Locale.UK, false);
            return s;
        }).get(20, TimeUnit.SECONDS);
        try {
            WaitForAsyncUtils.waitForFxEvents();
            Label note = (Label) second.getScene().getRoot().lookup("#read-only-note");
            assertTrue(note.isVisible());
            // FileClaim's holder text: the app, this user, this machine, since when
            String expected = "Read-only: saltmarsh-bay.sqlite is open for editing in Shapetrail ("
                    + System.getProperty("user.name") + " on ";
            assertTrue(note.getText().startsWith(expected), note.getText());
            snapshot(second.getScene().getRoot(), "workbench-read-only.png");
        } finally {
            robot.interact(second::close);
        }
        // the second window gone, the first still has the file for editing
        assertFalse(first.isVisible());
    }

    @Test
    void typingInTheSearchFieldFiltersThePeople(FxRobot robot) {
        robot.clickOn("#search").write("zoe");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, people(robot).getItems().size());
        assertEquals("Zoë Greyling", people(robot).getItems().get(0).name());
    }

    @Test
    void aSaveWhileAnotherProgramHoldsTheFileKeepsTheWindowAnswering(FxRobot robot) throws Exception {
        select(robot, "Freya Breakwater");
        VisitEntryView[] entry = new VisitEntryView[1];
        robot.interact(() -> {
            entry[0] = workbench.entryFor(null);
            entry[0].show();
        });
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("#body_mass-1");
        for (String[] pair : new String[][] {{"61.2", "61.2"}, {"168.4", "168.6"}}) {
            robot.write(pair[0]).type(KeyCode.ENTER).write(pair[1]).type(KeyCode.ENTER);
        }
        WaitForAsyncUtils.waitForFxEvents();
        // another program takes the write lock, as a second Shapetrail or a sync tool might
        try (java.sql.Connection other = java.sql.DriverManager.getConnection("jdbc:sqlite:" + file)) {
            other.createStatement().execute("BEGIN IMMEDIATE");
            robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
            long t0 = System.nanoTime();
            // the FX thread still runs events while the save waits for the file
            assertEquals(Integer.valueOf(7), WaitForAsyncUtils.asyncFx(() -> 7).get(2, TimeUnit.SECONDS));
            assertTrue(System.nanoTime() - t0 < 2_000_000_000L);
            assertTrue(robot.lookup("#visit-entry").query().isDisabled(), "no second save meanwhile");
            assertFalse(entry[0].saved().isPresent(), "not written while the other program holds the file");
            other.createStatement().execute("ROLLBACK");
        }
        for (int i = 0; i < 100 && entry[0].saved().isEmpty(); i++) {
            Thread.sleep(50);
            WaitForAsyncUtils.waitForFxEvents();
        }
        assertTrue(entry[0].saved().isPresent(), "saved once the file was free");
        try (Database db = Database.open(file)) {
            assertTrue(db.inTransaction(tx -> tx.visits().find(entry[0].saved().get().id())).isPresent());
        }
    }

    void page(FxRobot robot, int index) {
        robot.interact(() -> workbench.pages().getSelectionModel().select(index));
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Clicks {@code button}, types {@code name} into the dialog that asks for it and confirms. */
    static void answer(FxRobot robot, String button, String name) {
        robot.clickOn(button);
        WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn(robot.lookup(".dialog-pane .text-field").queryAs(TextField.class)).write(name).type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Opens "Move to squad" and fills it in: the squad {@code pick} chooses from the list, and the day. */
    static void fillMove(FxRobot robot, java.util.function.Function<List<org.shapetrail.store.Squad>,
            org.shapetrail.store.Squad> pick, java.time.LocalDate day) {
        robot.clickOn("#move-squad");
        WaitForAsyncUtils.waitForFxEvents();
        robot.interact(() -> {
            @SuppressWarnings("unchecked")
            javafx.scene.control.ComboBox<org.shapetrail.store.Squad> to = robot.lookup("#move-to-squad")
                    .queryAs(javafx.scene.control.ComboBox.class);
            to.setValue(pick.apply(to.getItems()));
            robot.lookup("#move-from").queryAs(javafx.scene.control.DatePicker.class).setValue(day);
        });
    }

    List<org.shapetrail.store.Membership> membershipsOf(String name) {
        try (Database db = Database.open(file)) {
            long id = db.inTransaction(tx -> tx.people().all()).stream()
                    .filter(p -> p.displayName().equals(name)).findFirst().orElseThrow().id();
            return db.inTransaction(tx -> tx.squads().membershipsOf(id));
        }
    }

    @Test
    void aMeasurerAndASquadAreAddedAndAJuniorMovesSquadInTheApp(FxRobot robot) throws Exception {
        page(robot, 2);
        answer(robot, "#add-measurer", "Nell Sandpiper");
        page(robot, 1);
        answer(robot, "#new-squad", "Under-16 development");
        page(robot, 2);
        String listed = robot.lookup("#measurer-list").queryAs(Label.class).getText();
        assertTrue(listed.contains("Nell Sandpiper"), listed);
        page(robot, 0);
        select(robot, "Freya Breakwater");
        fillMove(robot, squads -> squads.stream().filter(q -> q.name().equals("Under-16 development")).findFirst()
                .orElseThrow(), java.time.LocalDate.of(2026, 10, 1));
        robot.clickOn("OK");
        WaitForAsyncUtils.waitForFxEvents();
        long u16;
        try (Database db = Database.open(file)) {
            assertTrue(db.inTransaction(tx -> tx.measurers().all()).stream().anyMatch(m -> m.name().equals("Nell Sandpiper")));
            u16 = db.inTransaction(tx -> tx.squads().all()).stream()
                    .filter(q -> q.name().equals("Under-16 development")).findFirst().orElseThrow().id();
        }
        var ms = membershipsOf("Freya Breakwater");
        assertTrue(ms.stream().anyMatch(m -> m.squadId() == u16 && m.joinedOn().equals(java.time.LocalDate.of(2026, 10, 1))
                && m.leftOn() == null), ms.toString());
        assertTrue(ms.stream().filter(m -> m.squadId() != u16).allMatch(m -> m.leftOn() != null), ms.toString());
        // and she leaves at the end of the season: the last choice in the list
        fillMove(robot, squads -> squads.get(squads.size() - 1), java.time.LocalDate.of(2027, 6, 30));
        assertTrue(robot.lookup("Last day").tryQuery().isPresent(), "the date is asked for as the last day");
        robot.clickOn("OK");
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(membershipsOf("Freya Breakwater").stream()
                .allMatch(m -> m.leftOn() != null && !m.leftOn().isAfter(java.time.LocalDate.of(2027, 6, 30))));
    }

    @Test
    void aCompleteVisitEnteredByKeyboardAloneIsSavedShownAndStored(FxRobot robot) throws Exception {
        select(robot, "Freya Breakwater");
        int before = robot.lookup("#visits").queryAs(TableView.class).getItems().size();
        VisitEntryView[] entry = new VisitEntryView[1];
        robot.interact(() -> {
            entry[0] = workbench.entryFor(null);
            entry[0].show();
        });
        WaitForAsyncUtils.waitForFxEvents();
        String[][] values = {{"61.2", "61.2"}, {"168.4", "168.6"}, {"88.1", "88.3"}, {"10.2", "10.4"},
            {"8.8", "9.0"}, {"7.4", "7.6"}, {"9.0", "9.2"}, {"29.9", "30.0"}, {"34.6", "34.6"}, {"6.5", "6.5"},
            {"9.1", "9.1"}};
        robot.clickOn("#body_mass-1");
        for (String[] pair : values) {
            robot.write(pair[0]).type(KeyCode.ENTER).write(pair[1]).type(KeyCode.ENTER);
        }
        WaitForAsyncUtils.waitForFxEvents();
        Label live = robot.lookup("#live-rating").queryAs(Label.class);
        assertTrue(live.getText().startsWith("Somatotype "), live.getText());
        snapshot(robot.lookup("#visit-entry").query(), "visit-entry.png");
        robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(entry[0].saved().isPresent(), "saved");
        // shown without waiting here, so the test reloads as the workbench does after showAndWait
        robot.interact(() -> workbench.viewModel().reload());
        WaitForAsyncUtils.waitForFxEvents();
        select(robot, "Freya Breakwater");
        assertEquals(before + 1, robot.lookup("#visits").queryAs(TableView.class).getItems().size());
        try (Database db = Database.open(file)) {
            assertTrue(db.inTransaction(tx -> tx.visits().find(entry[0].saved().get().id())).isPresent());
        }
    }

    @Test
    void aSkinfoldPairSixPercentApartBringsUpTheThirdTrialAndSaveIsRefused(FxRobot robot) throws Exception {
        select(robot, "Freya Breakwater");
        VisitEntryView[] entry = new VisitEntryView[1];
        robot.interact(() -> {
            entry[0] = workbench.entryFor(null);
            entry[0].show();
        });
        TextField third = robot.lookup("#triceps-3").queryAs(TextField.class);
        assertFalse(third.isVisible());
        robot.clickOn("#triceps-1").write("10.0").type(KeyCode.ENTER).write("10.6").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(third.isVisible(), "third-trial field shown for 5.8 %");
        assertTrue(third.isFocused(), "Enter after trial 2 goes to the third trial when it is needed");
        assertTrue(robot.lookup("#save-visit").query().isDisabled());
        robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(entry[0].saved().isEmpty());
        robot.interact(() -> entry[0].show().close());
    }

    @Test
    void aStatureTypedInMetresIsFlaggedWithTheUnitHint(FxRobot robot) {
        select(robot, "Freya Breakwater");
        robot.interact(() -> workbench.entryFor(null).show());
        robot.clickOn("#stature-1").write("1.68").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        Label msg = robot.lookup("#stature-message").queryAs(Label.class);
        assertEquals("Trial 1: Stature 1.68 looks like metres; enter 168.0 cm. Stature needs a second trial.",
                msg.getText());
        assertTrue(robot.lookup("#save-visit").query().isDisabled());
    }

    @Test
    void theSquadPageShowsTheMeanAndSam(FxRobot robot) throws Exception {
        robot.interact(() -> {
            workbench.pages().getSelectionModel().select(1);
            workbench.squadChoice().setValue("Senior squad");
        });
        WaitForAsyncUtils.waitForFxEvents();
        Label summary = robot.lookup("#squad-summary").queryAs(Label.class);
        assertTrue(summary.getText().contains("Mean somatotype "), summary.getText());
        assertTrue(summary.getText().contains("SAM "), summary.getText());
        snapshot(stage.getScene().getRoot(), "workbench-squad.png");
        robot.interact(() -> workbench.pages().getSelectionModel().select(2));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(robot.lookup("#tem-table").queryAs(TableView.class).getItems().size() >= 20);
        snapshot(stage.getScene().getRoot(), "workbench-measurers.png");
    }

    @Test
    void hoveringAPointShowsItsTooltipAndClickingSelectsTheVisit(FxRobot robot) {
        select(robot, "Freya Breakwater");
        var chart = workbench.personPane().chart();
        var marker = chart.model().markers().get(chart.model().markers().size() - 1);
        double[] at = chart.devicePosition(marker);
        var screen = chart.localToScreen(at[0], at[1]);
        robot.moveTo(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(chart.tooltipText().startsWith("Freya Breakwater"), chart.tooltipText());
        robot.clickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        VisitLine selected = (VisitLine) workbench.personPane().visitsTable().getSelectionModel().getSelectedItem();
        assertEquals(marker.id(), "visit:" + selected.visitId());
    }

    @Test
    void theBlockViewSaysHowManyChangedAndWhoWasLeftOut(FxRobot robot) throws Exception {
        robot.interact(() -> {
            workbench.pages().getSelectionModel().select(1);
            workbench.squadChoice().setValue("Senior squad");
        });
        robot.interact(() -> ((javafx.scene.control.TabPane) robot.lookup("#squad-views").query())
                .getSelectionModel().select(1));
        WaitForAsyncUtils.waitForFxEvents();
        var l = workbench.viewModel().loadedProperty().get();
        var review = org.shapetrail.history.BlockReview.of(l.builder(), l.builder().academy().blocks().stream().filter(x -> x.name().equals(org.shapetrail.store.demo.DemoAcademy.BLOCK_NAME)).findFirst().orElseThrow(), 21);
        Label summary = robot.lookup("#block-summary").queryAs(Label.class);
        assertTrue(summary.getText().contains(review.result().beyondNoise() + " of " + review.result().n()
                + " changed beyond measurement noise"), summary.getText());
        assertTrue(robot.lookup("#block-left-out").queryAs(Label.class).getText().startsWith("Left out: "));
        snapshot(stage.getScene().getRoot(), "workbench-block.png");
    }

    @Test
    void theGrowthChartAndTheThreeDimensionalViewOrItsFallbackAreThere(FxRobot robot) throws Exception {
        select(robot, "Zeb Thistlewood");
        robot.interact(() -> workbench.personPane().views().getSelectionModel().select(1));
        WaitForAsyncUtils.waitForFxEvents();
        var growth = robot.lookup("#growth-chart").queryAs(org.shapetrail.chart.fx.ChartCanvas.class);
        assertTrue(growth.model().markers().size() >= 8, "a point per visit");
        snapshot(stage.getScene().getRoot(), "workbench-growth.png");
        robot.interact(() -> workbench.personPane().views().getSelectionModel().select(2));
        WaitForAsyncUtils.waitForFxEvents();
        if (!javafx.application.Platform.isSupported(javafx.application.ConditionalFeature.SCENE3D)) {
            // the software pipeline of headless tests has no 3D: the view says so in words
            Label msg = robot.lookup("#space-unavailable").queryAs(Label.class);
            assertTrue(msg.isVisible() && msg.getText().startsWith("The 3D view needs graphics hardware support"));
        } else {
            var space = workbench.personPane().space();
            double before = space.orbit().yaw();
            robot.drag(space).moveBy(60, 0).release(javafx.scene.input.MouseButton.PRIMARY);
            assertTrue(space.orbit().yaw() != before, "dragging rotates the view");
        }
    }

    @Test
    void aLetterCanBePreviewedBeforeExport(FxRobot robot) throws Exception {
        select(robot, "Zeb Thistlewood");
        robot.clickOn("#preview-letter");
        WaitForAsyncUtils.waitForFxEvents();
        javafx.stage.Stage preview = workbench.lastPreview();
        assertTrue(preview != null && preview.isShowing(), "preview window open");
        var box = (javafx.scene.layout.VBox) preview.getScene().lookup("#letter-preview");
        assertTrue(box.getChildren().size() >= 1 && box.getChildren().size() <= 2, "one or two pages");
        var img = ((javafx.scene.image.ImageView) box.getChildren().get(0)).getImage();
        // A4 at 80 dpi: 595 × 842 pt → 661 × 935 px (derived)
        assertEquals(661, Math.round(img.getWidth()), 1);
        robot.interact(preview::close);
    }

    @Test
    void anotherFileCanBeOpened(FxRobot robot) throws Exception {
        Path empty = Files.createTempDirectory("other").resolve("other.sqlite");
        try (Database db = Database.open(empty)) {
            db.inTransaction(tx -> tx.people().insert(org.shapetrail.store.Person.draft("Wilhelmina Sandpiper",
                    org.shapetrail.measure.Sex.FEMALE, java.time.LocalDate.of(2012, 5, 5))));
        }
        robot.interact(() -> workbench.viewModel().open(empty));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, people(robot).getItems().size());
        assertEquals("Wilhelmina Sandpiper", people(robot).getItems().get(0).name());
    }

    @Test
    void longWorkRunsOffTheFxThreadAndCanBeCancelled(FxRobot robot) throws Exception {
        FxTaskRunner runner = new FxTaskRunner();
        boolean[] stopped = {false};
        robot.interact(() -> runner.run("Long job", p -> {
            while (!p.isCancelled()) {
                try {
                    Thread.sleep(10);
                } catch (InterruptedException e) {
                    break; // cancel(true) interrupts the sleep
                }
            }
            stopped[0] = true;
            return null;
        }, v -> { }, t -> { }));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(runner.busyProperty().get());
        // the window still answers while the job runs
        robot.clickOn("#search").write("arlo");
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1, people(robot).getItems().size());
        robot.interact(runner::cancelCurrent);
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> !runner.busyProperty().get());
        assertFalse(runner.busyProperty().get());
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> stopped[0]);
    }
}
