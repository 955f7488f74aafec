package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import org.shapetrail.store.RecordSource;
import java.util.List;
import java.util.Optional;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Parent;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.SplitPane;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.shapetrail.chart.fx.ChartCanvas;
import java.nio.file.Path;
import org.shapetrail.history.BlockReview;
import org.shapetrail.store.Database;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;

/** A squad's training blocks: did the block change the group, and whom; with its own choice of squad. */
final class BlocksPageView {
    private final WorkbenchContext ctx;
    private final ComboBox<String> squadChoice = new ComboBox<>();
    private final ComboBox<String> blockChoice = new ComboBox<>();
    private final Label summary = new Label();
    private final javafx.scene.control.TableView<BlockPage.AthleteLine> athletes = new javafx.scene.control.TableView<>();
    private final javafx.scene.control.Button edit = new javafx.scene.control.Button(tr("blocks.edit"));
    private final javafx.scene.control.Button delete = new javafx.scene.control.Button(tr("blocks.delete"));
    private final javafx.scene.control.Button undo = new javafx.scene.control.Button(tr("blocks.undo"));
    /** The blocks deleted in this session, newest first, for undo. */
    private final java.util.Deque<TrainingBlock> deleted = new java.util.ArrayDeque<>();
    private final Label leftOut = new Label();
    private final ChartCanvas chart = new ChartCanvas();
    private final ChartCanvas profile = new ChartCanvas();
    private final BorderPane root = new BorderPane();
    private boolean stale = true;

    BlocksPageView(WorkbenchContext ctx) {
        this.ctx = ctx;
        squadChoice.setId("block-squad-choice");
        squadChoice.valueProperty().addListener((o, a, b) -> fillBlocks());
        blockChoice.setId("block-choice");
        blockChoice.valueProperty().addListener((o, a, b) -> show());
        summary.setId("block-summary");
        summary.setWrapText(true);
        athletes.setId("block-athletes");
        athletes.setPlaceholder(new Label(tr("blocks.nobody")));
        column(tr("blocks.col.athlete"), BlockPage.AthleteLine::name, null);
        column(tr("blocks.col.before"), BlockPage.AthleteLine::before, tr("blocks.col.before.tip"));
        column(tr("blocks.col.after"), BlockPage.AthleteLine::after, tr("blocks.col.after.tip"));
        column(tr("blocks.col.change"), BlockPage.AthleteLine::change, tr("blocks.col.change.tip"));
        column(tr("blocks.col.sad"), BlockPage.AthleteLine::sad, tr("blocks.col.sad.tip"));
        athletes.setRowFactory(t -> new javafx.scene.control.TableRow<>() {
            @Override
            protected void updateItem(BlockPage.AthleteLine line, boolean empty) {
                super.updateItem(line, empty);
                setTooltip(empty || line == null ? null : new javafx.scene.control.Tooltip(line.words()));
            }
        });
        javafx.scene.control.Button create = new javafx.scene.control.Button(tr("blocks.new"));
        create.setId("new-block");
        create.setOnAction(e -> squad().ifPresent(s -> form(s, null)));
        edit.setId("edit-block");
        edit.setOnAction(e -> chosen().ifPresent(b -> squad().ifPresent(s -> form(s, b))));
        delete.setId("delete-block");
        delete.setOnAction(e -> chosen().ifPresent(this::delete));
        undo.setId("undo-block");
        undo.setDisable(true);
        undo.setOnAction(e -> undoDelete());
        edit.disableProperty().bind(blockChoice.valueProperty().isNull());
        delete.disableProperty().bind(blockChoice.valueProperty().isNull());
        leftOut.setId("block-left-out");
        leftOut.setWrapText(true);
        chart.setId("block-chart");
        profile.setId("block-profile");
        chart.setMinSize(280, 280);
        profile.setMinSize(220, 160);
        Label key = new Label(tr("blocks.key"));
        key.getStyleClass().add("hint");
        key.setWrapText(true);
        javafx.scene.layout.FlowPane actions = new javafx.scene.layout.FlowPane(8, 6, squadChoice, blockChoice, create,
                edit, delete, undo);
        VBox head = new VBox(6, actions, summary, leftOut);
        head.setPadding(new Insets(10, 12, 8, 12));
        // the athletes' table across the page, every column in full; the two charts side by side below it
        SplitPane charts = new SplitPane(chart, profile);
        charts.setDividerPositions(0.55);
        BorderPane chartBox = new BorderPane(charts);
        chartBox.setBottom(key);
        SplitPane split = new SplitPane(athletes, chartBox);
        split.setOrientation(Orientation.VERTICAL);
        split.setDividerPositions(0.45);
        root.setCenter(split);
        root.setTop(head);
    }

    Parent root() {
        return root;
    }

    private final FittedColumns<BlockPage.AthleteLine> fitted = new FittedColumns<>();

    private void column(String name, java.util.function.Function<BlockPage.AthleteLine, String> f, String tip) {
        javafx.scene.control.TableColumn<BlockPage.AthleteLine, String> c = new javafx.scene.control.TableColumn<>();
        c.setCellValueFactory(d -> new javafx.beans.property.SimpleStringProperty(f.apply(d.getValue())));
        fitted.add(c, f, name, tip, false);
        athletes.getColumns().add(c);
    }

    private Optional<TrainingBlock> chosen() {
        Loaded l = ctx.loaded();
        Optional<Squad> s = squad();
        String name = blockChoice.getValue();
        if (l == null || s.isEmpty() || name == null) {
            return Optional.empty();
        }
        return l.builder().academy().blocks().stream().filter(b -> b.squadId() == s.get().id() && b.name().equals(name))
                .findFirst();
    }

    /** The form for a new block of the squad or an edit of one; a saved block is shown. */
    private void form(Squad s, TrainingBlock editing) {
        BlockFormView.show(new BlockFormViewModel(ctx.loaded(), s, editing), ctx.window(), ctx.locale).ifPresent(b -> {
            blockChoice.setValue(null);
            pendingBlock = b.name();
            ctx.vm.reload();
        });
    }

    /** The block to select once the file is read again. */
    private String pendingBlock;

    private void delete(TrainingBlock b) {
        javafx.scene.control.Alert a = new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.CONFIRMATION,
                tr("blocks.delete.ask", b.name(), b.startsOn(), b.endsOn()), Buttons.cancel(), Buttons.ok());
        a.setHeaderText(tr("blocks.delete.title"));
        a.initOwner(ctx.window());
        if (!Buttons.okIn(a.showAndWait())) {
            return;
        }
        RecordSource file = ctx.loaded().source();
        boolean done = ctx.organise(() -> {
            try (Database db = file.open()) {
                db.inTransaction(tx -> tx.blocks().delete(b.id()));
            }
            return Optional.empty();
        });
        if (done) {
            deleted.push(b);
        }
        undo.setDisable(deleted.isEmpty());
        undo.setText(deleted.isEmpty() ? tr("blocks.undo") : tr("blocks.undo.what", deleted.peek().name()));
    }

    private void undoDelete() {
        TrainingBlock b = deleted.peek();
        if (b == null) {
            return;
        }
        RecordSource file = ctx.loaded().source();
        pendingBlock = b.name();
        boolean done = ctx.organise(() -> {
            try (Database db = file.open()) {
                db.inTransaction(tx -> tx.blocks().insert(b.withId(0)));
            }
            return Optional.empty();
        });
        if (done) {
            deleted.pop();
        }
        undo.setDisable(deleted.isEmpty());
        undo.setText(deleted.isEmpty() ? tr("blocks.undo") : tr("blocks.undo.what", deleted.peek().name()));
    }

    ComboBox<String> squadChoice() {
        return squadChoice;
    }

    void invalidate() {
        stale = true;
    }

    /** Fills the page if the file changed; {@code preferredSquad} (the squad page's choice) is taken first. */
    void fill(String preferredSquad) {
        Loaded l = ctx.loaded();
        if (l == null || !stale) {
            return;
        }
        stale = false;
        String keep = squadChoice.getValue() != null ? squadChoice.getValue() : preferredSquad;
        squadChoice.getItems().setAll(l.builder().academy().squads().stream().map(Squad::name).toList());
        squadChoice.setValue(keep != null && squadChoice.getItems().contains(keep) ? keep
                : squadChoice.getItems().isEmpty() ? null : squadChoice.getItems().get(0));
        fillBlocks();
    }

    private Optional<Squad> squad() {
        Loaded l = ctx.loaded();
        String name = squadChoice.getValue();
        return l == null || name == null ? Optional.empty()
                : l.builder().academy().squads().stream().filter(s -> s.name().equals(name)).findFirst();
    }

    private void fillBlocks() {
        Optional<Squad> s = squad();
        if (s.isEmpty()) {
            return;
        }
        List<String> names = ctx.loaded().builder().academy().blocks().stream().filter(b -> b.squadId() == s.get().id())
                .map(TrainingBlock::name).toList();
        String keep = pendingBlock != null ? pendingBlock : blockChoice.getValue();
        pendingBlock = null;
        blockChoice.getItems().setAll(names);
        blockChoice.setValue(keep != null && names.contains(keep) ? keep : names.isEmpty() ? null
                : names.get(names.size() - 1));
        if (names.isEmpty()) {
            summary.setText(tr("blocks.none"));
            athletes.getItems().clear();
            leftOut.setText("");
            chart.setModel(null);
            profile.setModel(null);
        }
    }

    private void show() {
        Loaded l = ctx.loaded();
        String name = blockChoice.getValue();
        Optional<Squad> s = squad();
        if (l == null || name == null || s.isEmpty()) {
            return;
        }
        l.builder().academy().blocks().stream().filter(b -> b.squadId() == s.get().id() && b.name().equals(name))
                .findFirst().ifPresent(b -> {
                    BlockPage page = BlockPage.of(BlockReview.of(l.builder(), b, BlockReview.DEFAULT_WINDOW_DAYS,
                            p -> l.histories().get(p.id())), ctx.locale);
                    summary.setText(page.summary());
                    athletes.getItems().setAll(page.rows());
                    fitted.fit(page.rows());
                    leftOut.setText(page.leftOut().isEmpty() ? "" : tr("blocks.leftOut", String.join("; ", page.leftOut())));
                    chart.setLayout(page.chartAt());
                    profile.setModel(page.profile());
                });
    }
}
