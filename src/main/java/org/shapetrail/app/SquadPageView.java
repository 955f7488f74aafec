package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.control.TableView;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import org.shapetrail.chart.fx.ChartCanvas;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.letters.LetterBatch;
import org.shapetrail.letters.LetterComposer;
import org.shapetrail.letters.LetterSettings;
import org.shapetrail.store.Squad;

/** The squad's members: their latest ratings on the chart with the mean, the table, and letters for all. */
final class SquadPageView {
    private final WorkbenchContext ctx;
    private final ComboBox<String> squadChoice = new ComboBox<>();
    private final Label summary = new Label();
    private final VBox blocks = new VBox(2);
    private final TableView<PersonRow> members;
    private final javafx.collections.ObservableList<PersonRow> memberRows = javafx.collections.FXCollections
            .observableArrayList();
    private final ChartCanvas chart = new ChartCanvas();
    private final BorderPane root = new BorderPane();
    private boolean stale = true;

    SquadPageView(WorkbenchContext ctx) {
        this.ctx = ctx;
        members = new PeopleTable("squad-members", ctx.locale, true, memberRows).table();
        squadChoice.setId("squad-choice");
        squadChoice.valueProperty().addListener((o, a, b) -> show());
        summary.setId("squad-summary");
        summary.setWrapText(true);
        chart.setId("squad-chart");
        chart.setMinSize(300, 300);
        chart.setOnSelect(id -> ctx.showPerson(Long.parseLong(id.substring("person:".length()))));
        Button letters = new Button(tr("squad.letters"));
        letters.setId("write-letters");
        letters.setOnAction(e -> writeLetters());
        Button newSquad = new Button(tr("squad.new"));
        newSquad.setId("new-squad");
        newSquad.setOnAction(e -> ctx.askAndOrganise(tr("squad.new.title"), tr("squad.new.prompt"),
                Organising::addSquad));
        VBox head = new VBox(6, new HBox(8, squadChoice, letters, newSquad), summary, new Label(tr("squad.blocks")),
                blocks);
        head.setPadding(new Insets(10, 12, 8, 12));
        root.setTop(head);
        SplitPane split = new SplitPane(members, chart);
        split.setDividerPositions(0.64); // the members table in full beside the chart
        root.setCenter(split);
    }

    Parent root() {
        return root;
    }

    ComboBox<String> squadChoice() {
        return squadChoice;
    }

    /** The file changed: the page is filled again when next looked at. */
    void invalidate() {
        stale = true;
    }

    /** Fills the page if the file changed since it was last filled. */
    void fill() {
        Loaded l = ctx.loaded();
        if (l == null || !stale) {
            return;
        }
        stale = false;
        String keep = squadChoice.getValue();
        squadChoice.getItems().setAll(l.builder().academy().squads().stream().map(Squad::name).toList());
        squadChoice.setValue(keep != null && squadChoice.getItems().contains(keep) ? keep
                : squadChoice.getItems().isEmpty() ? null : squadChoice.getItems().get(0));
        show();
    }

    private Optional<Squad> chosen() {
        Loaded l = ctx.loaded();
        String name = squadChoice.getValue();
        return l == null || name == null ? Optional.empty()
                : l.builder().academy().squads().stream().filter(s -> s.name().equals(name)).findFirst();
    }

    private void show() {
        chosen().ifPresent(s -> {
            SquadPage page = SquadPage.of(ctx.loaded(), s, LocalDate.now(), ctx.locale);
            summary.setText(page.summary());
            memberRows.setAll(page.members());
            blocks.getChildren().setAll(page.blocks().isEmpty() ? List.of(new Label(tr("squad.blocks.none")))
                    : page.blocks().stream().map(Label::new).toList());
            chart.setLayout(page.chartAt());
        });
    }

    private void writeLetters() {
        Loaded l = ctx.loaded();
        Optional<Squad> squad = chosen();
        if (l == null || squad.isEmpty()) {
            return;
        }
        Optional<LetterSettings> settings = LettersDialog.ask(ctx.window(), tr("squad.letters.title", squad.get().name()),
                ctx.locale);
        if (settings.isEmpty()) {
            return;
        }
        DirectoryChooser dc = new DirectoryChooser();
        dc.setTitle(tr("squad.letters.folder"));
        var folder = dc.showDialog(ctx.window());
        if (folder == null) {
            return;
        }
        List<PersonHistory> people = l.builder().academy().membersOn(squad.get().id(), settings.get().to()).stream()
                .map(id -> l.histories().get(id)).toList();
        var composer = new LetterComposer(l.builder(), settings.get(), ctx.locale);
        List<java.nio.file.Path> targets = new java.util.ArrayList<>(people.stream().map(h -> folder.toPath().resolve(
                LetterBatch.fileName(h.person().id(), h.person().displayName()))).toList());
        targets.add(folder.toPath().resolve(LetterBatch.COMBINED));
        List<java.nio.file.Path> there = org.shapetrail.OutputFiles.existing(targets);
        if (!there.isEmpty()) {
            javafx.scene.control.Alert ask = new javafx.scene.control.Alert(
                    javafx.scene.control.Alert.AlertType.CONFIRMATION, tr("squad.letters.there", there.size(), folder,
                    there.get(0).getFileName()),
                    Buttons.cancel(), Buttons.ok());
            ask.setHeaderText(tr("squad.letters.replace"));
            ask.initOwner(ctx.window());
            if (!Buttons.okIn(ask.showAndWait())) {
                return;
            }
        }
        ctx.vm.runner().run(tr("squad.letters.writing"), progress -> LetterBatch.write(composer, people, folder.toPath(), true,
                "confirm", (done, total) -> progress.update(done, total, tr("squad.letters.one", done, total)),
                progress::isCancelled), result -> {
                    ctx.vm.statusProperty().set(tr("squad.letters.wrote", result.letters().size(), folder));
                    ctx.vm.errorProperty().set(String.join(" ", result.refused()));
                }, t -> ctx.vm.errorProperty().set(Errors.describe(t)));
    }
}
