package org.shapetrail.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDateTime;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextArea;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.shapetrail.store.Database;
import org.shapetrail.store.RecordSource;
import org.shapetrail.store.ServerAddress;
import org.shapetrail.store.StaffRole;
import org.shapetrail.store.TestServer;
import org.shapetrail.store.Visit;
import org.shapetrail.store.demo.DemoAcademy;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Two windows on one server, as a new academy would try it: a coach's and a measurer's. The measurer's
 * new visit appears in the coach's window without a restart, the coach is offered no way to edit it,
 * and the visit's history shows who entered it. Against the real PostgreSQL server .ci/run starts.
 */
@Tag("gui")
@Tag("server")
@ExtendWith(ApplicationExtension.class)
class SharedServerGuiTest {
    static final String PASSWORD = "pitch side 2026";
    static String uri;
    static String measurer;
    static String coach;
    Stage coachWindow;

    @BeforeAll
    static void academyOnTheServer() {
        uri = TestServer.sampleAcademy("gui");
        measurer = TestServer.uniqueLogin("mira");
        coach = TestServer.uniqueLogin("colm");
        TestServer.addAccounts(uri, PASSWORD, java.util.Map.of(measurer, StaffRole.MEASURER, coach, StaffRole.COACH));
    }

    @AfterAll
    static void endAccounts() {
        TestServer.removeAccounts(uri, List.of(measurer, coach));
    }

    static RecordSource.Server as(String user) {
        ServerAddress base = ServerAddress.parse(uri);
        return new RecordSource.Server(base.withUser(user),
                PASSWORD.toCharArray());
    }

    @Start
    void start(Stage stage) {
        coachWindow = stage;
        ShapetrailApp.show(stage, as(coach), new DirectTaskRunner(), Locale.UK, false);
    }

    @Test
    void aMeasurersNewVisitAppearsInTheCoachsWindowWhichCannotEditIt(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitForFxEvents();
        Label where = robot.lookup("#file-name").queryAs(Label.class);
        assertEquals(ServerAddress.parse(uri).database() + " on 127.0.0.1 · " + coach + " (coach)", where.getText());
        // a coach is offered no visit entry or editing, and no organising
        for (String id : List.of("#new-visit", "#edit-visit", "#delete-visit", "#new-person", "#edit-person",
                "#import-file")) {
            assertFalse(robot.lookup(id).query().isVisible(), id);
        }
        assertTrue(robot.lookup("#visit-history").query().isVisible());

        // the measurer's window on the same record offers visit entry
        Stage measurerWindow = WaitForAsyncUtils.asyncFx(() -> {
            Stage s = new Stage();
            ShapetrailApp.show(s, as(measurer), new DirectTaskRunner(), Locale.UK, false);
            return s;
        }).get(20, TimeUnit.SECONDS);
        try {
            WaitForAsyncUtils.waitForFxEvents();
            Node newVisit = measurerWindow.getScene().getRoot().lookup("#new-visit");
            assertTrue(newVisit.isVisible());
            assertFalse(measurerWindow.getScene().getRoot().lookup("#new-person").isVisible());

            // the coach's window has begun to listen for other desks' saves (set up off the FX thread)
            WorkbenchViewModel coachVm = (WorkbenchViewModel) coachWindow.getUserData();
            WaitForAsyncUtils.waitFor(15, TimeUnit.SECONDS, () -> coachVm.hearingOthersProperty().get());
            String name = "Arlo Ashcombe"; // person 1 of the demo academy
            select(robot, coachWindow, name);
            int before = visits(coachWindow).getItems().size();
            // the measurer saves a visit (what their form's Save does: one transaction as their login)
            // (its readings: the person's latest visit again, so that the page shows a believable record)
            try (Database db = as(measurer).open()) {
                db.inTransaction(tx -> {
                    List<Visit> theirs = tx.visits().ofPerson(1);
                    Visit last = theirs.get(theirs.size() - 1);
                    return tx.visits().insert(new Visit(0, 1, LocalDateTime.of(2026, 11, 24, 16, 30),
                            last.measurerId(), "after the cup tie", "", last.trials()));
                });
            }
            // heard by the coach's window, which reloads with the person still chosen
            long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(15);
            while (visits(coachWindow).getItems().size() == before && System.nanoTime() < until) {
                WaitForAsyncUtils.sleep(100, TimeUnit.MILLISECONDS);
                WaitForAsyncUtils.waitForFxEvents();
            }
            assertEquals(before + 1, visits(coachWindow).getItems().size(), "the new visit shows without a restart");
            WorkbenchGuiTest.snapshot(coachWindow.getScene().getRoot(), "workbench-server-coach.png");

            // the visit's history: entered by the measurer
            robot.interact(() -> {
                TableView<?> t = visits(coachWindow);
                for (int i = 0; i < t.getItems().size(); i++) {
                    if (((VisitLine) t.getItems().get(i)).context().equals("after the cup tie")) {
                        t.getSelectionModel().select(i);
                    }
                }
            });
            robot.interact(() -> ((javafx.scene.control.Button) coachWindow.getScene().getRoot()
                    .lookup("#visit-history")).fire());
            WaitForAsyncUtils.waitForFxEvents();
            TextArea history = robot.lookup("#visit-history-text").queryAs(TextArea.class);
            assertTrue(java.util.regex.Pattern.compile(java.util.regex.Pattern.quote(measurer) + " +insert +visit ")
                    .matcher(history.getText()).find(), history.getText());
            assertTrue(history.getText().contains("context after the cup tie"), history.getText());
            WorkbenchGuiTest.snapshot(history.getScene().getRoot(), "visit-history.png");
            robot.interact(() -> ((Stage) history.getScene().getWindow()).close());
        } finally {
            robot.interact(measurerWindow::close);
        }
    }

    @Test
    void connectingFromTheWindowSaysWhatIsWrongWithTheAddressThenOpensTheServer(FxRobot robot) throws Exception {
        // the window starts on a file; Connect to a server… asks for the address and the password
        Stage w = WaitForAsyncUtils.asyncFx(() -> {
            Stage s = new Stage();
            java.nio.file.Path f = java.nio.file.Files.createTempDirectory("connect").resolve("desk.sqlite");
            DemoAcademy.generate(f);
            ShapetrailApp.show(s, f, new DirectTaskRunner(), Locale.UK, false);
            return s;
        }).get(30, TimeUnit.SECONDS);
        try {
            WaitForAsyncUtils.waitForFxEvents();
            // the dialog waits for an answer: opened without waiting for it
            javafx.application.Platform.runLater(() -> ((javafx.scene.control.Button) w.getScene().getRoot()
                    .lookup("#connect-server")).fire());
            WaitForAsyncUtils.waitForFxEvents();
            WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> robot.lookup("#server-address").tryQuery().isPresent());
            javafx.scene.control.TextField address = robot.lookup("#server-address").queryAs(javafx.scene.control.TextField.class);
            robot.interact(() -> address.setText("postgresql://" + measurer + ":secret@127.0.0.1/x"));
            javafx.scene.control.DialogPane pane = (javafx.scene.control.DialogPane) address.getScene().getRoot();
            javafx.scene.control.Button connect = (javafx.scene.control.Button) pane.lookupButton(pane.getButtonTypes().get(0));
            robot.interact(connect::fire);
            Label problem = robot.lookup("#server-problem").queryAs(Label.class);
            assertTrue(problem.getText().contains("holds a password. Leave it out"), problem.getText());
            assertTrue(address.getScene().getWindow().isShowing(), "the dialog stays open with what was typed");
            WorkbenchGuiTest.snapshot(pane, "connect-server.png");
            ServerAddress a = as(measurer).address();
            robot.interact(() -> {
                address.setText(a.toString());
                robot.lookup("#server-password").queryAs(javafx.scene.control.PasswordField.class).setText(PASSWORD);
            });
            robot.interact(connect::fire);
            WaitForAsyncUtils.waitForFxEvents();
            WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> ((Label) w.getScene().getRoot().lookup("#file-name"))
                    .getText().contains(measurer));
            Label where = (Label) w.getScene().getRoot().lookup("#file-name");
            assertEquals(a.database() + " on 127.0.0.1 · " + measurer + " (measurer)", where.getText());
            assertEquals(a.toString(), ServerConnectDialog.lastAddress(), "remembered, without the password");
            assertFalse(ServerConnectDialog.lastAddress().contains(PASSWORD));
        } finally {
            robot.interact(w::close);
        }
    }

    @SuppressWarnings("unchecked")
    static TableView<VisitLine> visits(Stage s) {
        return (TableView<VisitLine>) s.getScene().getRoot().lookup("#visits");
    }

    @SuppressWarnings("unchecked")
    static void select(FxRobot robot, Stage s, String name) {
        robot.interact(() -> {
            TableView<PersonRow> t = (TableView<PersonRow>) s.getScene().getRoot().lookup("#people");
            t.getItems().stream().filter(p -> p.name().equals(name)).findFirst()
                    .ifPresent(p -> t.getSelectionModel().select(p));
        });
        WaitForAsyncUtils.waitForFxEvents();
    }
}
