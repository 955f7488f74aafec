package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Comparator;
import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.ObservableList;
import javafx.collections.transformation.SortedList;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;

/**
 * A sortable table of people rows, used by the people browser and the squad page. Columns are as wide as
 * their widest text, so no header or cell is cut short; each header says in its tooltip what the column
 * holds. The first click on the change or growth column puts the largest first; sorting and the selection
 * survive a reload.
 */
final class PeopleTable {
    private final TableView<PersonRow> table = new TableView<>();
    private final Locale locale;
    private final FittedColumns<PersonRow> fitted = new FittedColumns<>();
    private final Label changeHeader;

    PeopleTable(String id, Locale locale, boolean compact, ObservableList<PersonRow> rows) {
        this.locale = locale;
        table.setId(id);
        table.setPlaceholder(new Label(tr("people.none")));
        SortedList<PersonRow> sorted = new SortedList<>(rows);
        sorted.comparatorProperty().bind(table.comparatorProperty());
        table.setItems(sorted);
        add(text(PersonRow::name), PersonRow::name, tr("people.col.name"), tr("people.col.name.tip"), false);
        TableColumn<PersonRow, PersonRow> age = custom(PersonRow::age, r -> Numbers.fmt(locale, r.age(), 1));
        add(age, r -> Numbers.fmt(locale, r.age(), 1), tr("people.col.age"), tr("people.col.age.tip"), false);
        if (!compact) {
            add(text(PersonRow::squad), PersonRow::squad, tr("people.col.squad"), tr("people.col.squad.tip"), false);
        }
        add(text(PersonRow::rating), PersonRow::rating, tr("people.col.rating"), tr("people.col.rating.tip"), false);
        TableColumn<PersonRow, PersonRow> change = custom(PersonRow::multiple, this::changeText);
        change.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(PersonRow r, boolean empty) {
                super.updateItem(r, empty);
                getStyleClass().removeAll("beyond", "borderline", "within");
                if (empty || r == null || r.change() == null) {
                    setText(null);
                    setTooltip(null);
                    return;
                }
                // the verdict in words, so nothing depends on colour alone
                setText(changeText(r));
                setTooltip(new Tooltip(tr("people.change.tip", r.changeFrom(), r.changeTo(),
                        Numbers.fmt(locale, r.change().sad(), 2), r.change().multipleText(locale))));
                getStyleClass().add(switch (r.verdict()) {
                    case BEYOND_NOISE -> "beyond";
                    case BORDERLINE -> "borderline";
                    case WITHIN_NOISE -> "within";
                });
            }
        });
        changeHeader = fitted.add(change, this::changeText, tr("people.col.change"), changeTip(), true);
        table.getColumns().add(change);
        TableColumn<PersonRow, PersonRow> growth = custom(PersonRow::velocity, this::growthText);
        growth.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(PersonRow r, boolean empty) {
                super.updateItem(r, empty);
                getStyleClass().remove("alert");
                if (empty || r == null || Double.isNaN(r.velocity())) {
                    setText(null);
                    return;
                }
                setText(growthText(r));
                if (r.rapidGrowth()) {
                    getStyleClass().add("alert");
                }
            }
        });
        add(growth, this::growthText, tr("people.col.growth"), tr("people.col.growth.tip"), true);
        add(text(r -> r.maturity() == null ? "" : r.maturity().words()),
                r -> r.maturity() == null ? "" : r.maturity().words(), tr("people.col.maturity"),
                tr("people.col.maturity.tip"), false);
        rows.addListener((javafx.collections.ListChangeListener<PersonRow>) c -> fitWidths());
        // the first click on the change or growth column puts the largest first (the table would start ascending)
        table.getSortOrder().addListener((javafx.collections.ListChangeListener<TableColumn<PersonRow, ?>>) c -> {
            while (c.next()) {
                for (TableColumn<PersonRow, ?> added : c.getAddedSubList()) {
                    if (added == change || added == growth) {
                        added.setSortType(TableColumn.SortType.DESCENDING);
                    }
                }
            }
        });
        fitWidths();
    }

    private String changeText(PersonRow r) {
        return r.change() == null ? "" : PersonPage.shortCell(r.change(), locale);
    }

    private String growthText(PersonRow r) {
        if (Double.isNaN(r.velocity())) {
            return "";
        }
        return Numbers.fmt(locale, r.velocity(), 1) + (r.shortInterval() ? " ±" + Numbers.fmt(locale, r.velocitySe(), 1)
                : "") + (r.rapidGrowth() ? " ▲" : "");
    }

    private static String changeTip() {
        return tr("people.change.tip.long");
    }

    TableView<PersonRow> table() {
        return table;
    }

    /** Names the period in the change column's header. */
    void setPeriod(Period p) {
        changeHeader.setText(p.header(locale).replaceFirst(" ", "\n"));
        changeHeader.setTextAlignment(javafx.scene.text.TextAlignment.CENTER);
        changeHeader.setTooltip(new Tooltip(p.header(locale) + ". " + changeTip()));
        fitWidths();
    }

    private static TableColumn<PersonRow, String> text(Function<PersonRow, String> f) {
        TableColumn<PersonRow, String> c = new TableColumn<>();
        c.setCellValueFactory(d -> new SimpleObjectProperty<>(f.apply(d.getValue())));
        return c;
    }

    /** A column holding the row, sorted by {@code key}. */
    private static TableColumn<PersonRow, PersonRow> custom(Function<PersonRow, Double> key,
                                                           Function<PersonRow, String> text) {
        TableColumn<PersonRow, PersonRow> c = new TableColumn<>();
        c.setCellValueFactory(d -> new SimpleObjectProperty<>(d.getValue()));
        c.setComparator(Comparator.comparingDouble(r -> {
            double v = key.apply(r);
            return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
        }));
        c.setCellFactory(col -> new TableCell<>() {
            @Override
            protected void updateItem(PersonRow r, boolean empty) {
                super.updateItem(r, empty);
                setText(empty || r == null ? null : text.apply(r));
            }
        });
        return c;
    }

    private void add(TableColumn<PersonRow, ?> c, Function<PersonRow, String> text, String header, String tip,
                     boolean boldCells) {
        fitted.add(c, text, header, tip, boldCells);
        table.getColumns().add(c);
    }

    private void fitWidths() {
        fitted.fit(table.getItems());
    }
}
