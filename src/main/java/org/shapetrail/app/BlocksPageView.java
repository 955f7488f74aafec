package org.shapetrail.app;

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
import org.shapetrail.history.BlockReview;
import org.shapetrail.store.Squad;
import org.shapetrail.store.TrainingBlock;

/** A squad's training blocks: did the block change the group, and whom; with its own choice of squad. */
final class BlocksPageView {
    private final WorkbenchContext ctx;
    private final ComboBox<String> squadChoice = new ComboBox<>();
    private final ComboBox<String> blockChoice = new ComboBox<>();
    private final Label summary = new Label();
    private final javafx.scene.control.ListView<String> athletes = new javafx.scene.control.ListView<>();
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
        leftOut.setId("block-left-out");
        leftOut.setWrapText(true);
        chart.setId("block-chart");
        profile.setId("block-profile");
        chart.setMinSize(280, 280);
        profile.setMinSize(220, 160);
        Label key = new Label("Arrows: each athlete before → after; ━━ beyond noise  ╺ ╸ borderline  ┈┈ within noise;"
                + " ◆ group means (grey before, amber after) with their dispersion");
        key.getStyleClass().add("hint");
        key.setWrapText(true);
        VBox head = new VBox(6, new HBox(8, squadChoice, blockChoice), summary, leftOut);
        head.setPadding(new Insets(10, 12, 8, 12));
        SplitPane charts = new SplitPane(chart, profile);
        charts.setOrientation(Orientation.VERTICAL);
        charts.setDividerPositions(0.62);
        BorderPane chartBox = new BorderPane(charts);
        chartBox.setBottom(key);
        SplitPane split = new SplitPane(athletes, chartBox);
        split.setDividerPositions(0.42);
        root.setCenter(split);
        root.setTop(head);
    }

    Parent root() {
        return root;
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
        String keep = blockChoice.getValue();
        blockChoice.getItems().setAll(names);
        blockChoice.setValue(keep != null && names.contains(keep) ? keep : names.isEmpty() ? null
                : names.get(names.size() - 1));
        if (names.isEmpty()) {
            summary.setText("This squad has no training blocks.");
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
                    athletes.getItems().setAll(page.athletes());
                    leftOut.setText(page.leftOut().isEmpty() ? "" : "Left out: " + String.join("; ", page.leftOut()));
                    chart.setModel(page.chart());
                    profile.setModel(page.profile());
                });
    }
}
