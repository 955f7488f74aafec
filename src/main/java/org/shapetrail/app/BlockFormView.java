package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Locale;
import java.util.Optional;
import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ComboBox;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextArea;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.stage.Window;
import javafx.util.StringConverter;
import org.shapetrail.history.VisitResult;
import org.shapetrail.store.TrainingBlock;

/** The dialog for a new training block or an edit of one: its days, aim and each member's before and after. */
final class BlockFormView {
    private BlockFormView() {
    }

    static Optional<TrainingBlock> show(BlockFormViewModel vm, Window owner, Locale locale) {
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.setTitle(tr(vm.isEdit() ? "blockform.title.edit" : "blockform.title.new", vm.squad().name()));
        TextField name = new TextField();
        name.setId("block-name");
        name.setPromptText(tr("blockform.name.prompt"));
        name.textProperty().bindBidirectional(vm.name);
        DatePicker start = DatePickers.of(null, locale);
        start.setId("block-start");
        start.valueProperty().bindBidirectional(vm.start);
        DatePicker end = DatePickers.of(null, locale);
        end.setId("block-end");
        end.valueProperty().bindBidirectional(vm.end);
        TextArea aim = new TextArea();
        aim.setId("block-aim");
        aim.setPrefRowCount(2);
        aim.setWrapText(true);
        aim.textProperty().bindBidirectional(vm.aim);
        GridPane head = new GridPane();
        head.setHgap(8);
        head.setVgap(6);
        head.addRow(0, new Label(tr("blockform.name")), name);
        head.addRow(1, new Label(tr("blockform.first")), start);
        head.addRow(2, new Label(tr("blockform.last")), end);
        head.addRow(3, new Label(tr("blockform.aim")), aim);
        GridPane members = new GridPane();
        members.setId("block-members");
        members.setHgap(8);
        members.setVgap(4);
        Runnable fill = () -> fillMembers(members, vm, locale);
        vm.members.addListener((ListChangeListener<BlockFormViewModel.Member>) c -> fill.run());
        fill.run();
        ScrollPane scroll = new ScrollPane(members);
        scroll.setPrefViewportHeight(260);
        scroll.setFitToWidth(true);
        ListView<String> problems = new ListView<>(vm.problems);
        problems.setId("block-problems");
        problems.setPrefHeight(70);
        Label hint = new Label(tr("blockform.hint", org.shapetrail.history.BlockReview.DEFAULT_WINDOW_DAYS));
        hint.setWrapText(true);
        hint.getStyleClass().add("hint");
        VBox box = new VBox(8, head, hint, scroll, new Label(tr("form.toPutRight")), problems);
        box.setPadding(new Insets(10));
        box.setPrefWidth(640);
        d.getDialogPane().setContent(box);
        ButtonType ok = Buttons.cancelAndOk(d);
        d.getDialogPane().lookupButton(ok).disableProperty().bind(vm.canSave.not());
        Optional<ButtonType> b = d.showAndWait();
        if (Buttons.okIn(b)) {
            return vm.save();
        }
        return Optional.empty();
    }

    private static void fillMembers(GridPane g, BlockFormViewModel vm, Locale locale) {
        g.getChildren().clear();
        g.addRow(0, new Label(tr("blockform.member")), new Label(tr("blockform.before")),
                new Label(tr("blockform.after")));
        if (vm.members.isEmpty()) {
            g.add(new Label(tr("blockform.nobody")), 0, 1, 3, 1);
        }
        int r = 1;
        for (BlockFormViewModel.Member m : vm.members) {
            g.addRow(r++, new Label(m.person().displayName()), choice(m, m.beforeProperty(), locale),
                    choice(m, m.afterProperty(), locale));
        }
    }

    private static ComboBox<VisitResult> choice(BlockFormViewModel.Member m,
                                                javafx.beans.property.ObjectProperty<VisitResult> p, Locale locale) {
        ComboBox<VisitResult> c = new ComboBox<>(FXCollections.observableArrayList(m.rated()));
        if (p.get() == null) {
            c.getItems().add(0, null); // no default visit: left out unless one is chosen
        }
        c.valueProperty().bindBidirectional(p);
        c.setConverter(new StringConverter<>() {
            @Override
            public String toString(VisitResult v) {
                return v == null ? tr("blockform.leftOut") : v.visit().measuredAt().toLocalDate().format(
                        java.time.format.DateTimeFormatter.ofLocalizedDate(java.time.format.FormatStyle.MEDIUM)
                                .withLocale(locale)) + " · " + v.somatotype().rating().toDisplayString(locale);
            }

            @Override
            public VisitResult fromString(String s) {
                return null;
            }
        });
        return c;
    }
}
