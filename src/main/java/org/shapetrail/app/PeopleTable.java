package org.shapetrail.app;

import java.util.Comparator;
import java.util.Locale;
import java.util.function.Function;
import javafx.beans.property.SimpleObjectProperty;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;

/** A sortable table of people rows, used by the people browser and the squad page. */
final class PeopleTable {
    private PeopleTable() {
    }

    static TableView<PersonRow> create(String id, Locale locale, boolean compact) {
        TableView<PersonRow> t = new TableView<>();
        t.setId(id);
        t.setPlaceholder(new Label("Nobody matches"));
        t.getColumns().add(text("Name", PersonRow::name, 150));
        t.getColumns().add(number("Age", PersonRow::age, 1, locale, 48));
        if (!compact) {
            t.getColumns().add(text("Squad", PersonRow::squad, 100));
        }
        t.getColumns().add(text("Somatotype", PersonRow::rating, 85));
        TableColumn<PersonRow, PersonRow> change = new TableColumn<>("Latest change");
        change.setCellValueFactory(d -> new SimpleObjectProperty<>(d.getValue()));
        change.setComparator(Comparator.comparingDouble(r -> Double.isNaN(r.latestMultiple()) ? -1 : r.latestMultiple()));
        change.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(PersonRow r, boolean empty) {
                super.updateItem(r, empty);
                getStyleClass().removeAll("beyond", "borderline", "within");
                if (empty || r == null || r.verdict() == null) {
                    setText(null);
                    return;
                }
                // the verdict in words, so nothing depends on colour alone
                setText(Numbers.fmt(locale, r.latestMultiple(), 2) + "× " + r.verdict().words());
                setTooltip(new Tooltip("Moved SAD " + Numbers.fmt(locale, r.latestSad(), 2) + " somatotype units; the"
                        + " change is " + Numbers.fmt(locale, r.latestMultiple(), 2) + " times the noise limit"
                        + " (1.00 or more: beyond noise)"));
                getStyleClass().add(switch (r.verdict()) {
                    case BEYOND_NOISE -> "beyond";
                    case BORDERLINE -> "borderline";
                    case WITHIN_NOISE -> "within";
                });
            }
        });
        change.setPrefWidth(130);
        t.getColumns().add(change);
        TableColumn<PersonRow, PersonRow> growth = new TableColumn<>("Growth cm/y");
        growth.setCellValueFactory(d -> new SimpleObjectProperty<>(d.getValue()));
        growth.setComparator(Comparator.comparingDouble(r -> Double.isNaN(r.velocity()) ? -99 : r.velocity()));
        growth.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(PersonRow r, boolean empty) {
                super.updateItem(r, empty);
                getStyleClass().remove("alert");
                if (empty || r == null || Double.isNaN(r.velocity())) {
                    setText(null);
                    return;
                }
                setText(Numbers.fmt(locale, r.velocity(), 1) + (r.rapidGrowth() ? "  ▲ rapid" : ""));
                if (r.rapidGrowth()) {
                    getStyleClass().add("alert");
                }
            }
        });
        growth.setPrefWidth(95);
        t.getColumns().add(growth);
        t.getColumns().add(text("Maturity", r -> r.maturity() == null ? "" : r.maturity().words(), 80));
        return t;
    }

    private static TableColumn<PersonRow, String> text(String name, Function<PersonRow, String> f, double w) {
        TableColumn<PersonRow, String> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new SimpleObjectProperty<>(f.apply(d.getValue())));
        c.setPrefWidth(w);
        return c;
    }

    private static TableColumn<PersonRow, Double> number(String name, Function<PersonRow, Double> f, int decimals,
                                                         Locale locale, double w) {
        TableColumn<PersonRow, Double> c = new TableColumn<>(name);
        c.setCellValueFactory(d -> new SimpleObjectProperty<>(f.apply(d.getValue())));
        c.setCellFactory(col -> new TableCell<>() {
            @Override
            protected void updateItem(Double v, boolean empty) {
                super.updateItem(v, empty);
                setText(empty || v == null ? null : Numbers.fmt(locale, v, decimals));
            }
        });
        c.setPrefWidth(w);
        return c;
    }
}
