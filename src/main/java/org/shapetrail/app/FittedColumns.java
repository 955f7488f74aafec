package org.shapetrail.app;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import javafx.scene.control.Label;
import javafx.scene.control.TableColumn;
import javafx.scene.control.Tooltip;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.Text;

/**
 * Table columns as wide as their widest text — the header (bold, as the theme draws it, on as many lines
 * as it has) or any cell — so nothing in a table is cut short; each header carries a tooltip.
 *
 * @param <R> the table's row type
 */
final class FittedColumns<R> {
    /** The stylesheet's text size, px. */
    private static final double SIZE = 13;
    private static final Font PLAIN = Font.font(Font.getDefault().getFamily(), SIZE);
    private static final Font BOLD = Font.font(Font.getDefault().getFamily(), FontWeight.BOLD, SIZE);

    private record Fitted<R>(TableColumn<R, ?> column, Function<R, String> text, Label header, boolean boldCells) {
    }

    private final List<Fitted<R>> columns = new ArrayList<>();

    /**
     * Gives {@code c} a header of {@code header} (lines split at "\n") with {@code tip}, and sizes it to the
     * texts {@code text} makes of the rows; {@code boldCells} when some cells are drawn bold.
     */
    Label add(TableColumn<R, ?> c, Function<R, String> text, String header, String tip, boolean boldCells) {
        Label h = new Label(header);
        h.setTextAlignment(javafx.scene.text.TextAlignment.CENTER);
        if (tip != null) {
            h.setTooltip(new Tooltip(tip));
        }
        c.setGraphic(h);
        c.setText("");
        columns.add(new Fitted<>(c, text, h, boldCells));
        return h;
    }

    /** Every column as wide as its widest text over {@code rows}. */
    void fit(List<? extends R> rows) {
        for (Fitted<R> f : columns) {
            double w = 0;
            for (String line : f.header().getText().split("\n")) {
                w = Math.max(w, width(line, BOLD) + 18); // header padding and room for the sort arrow
            }
            for (R r : rows) {
                w = Math.max(w, width(f.text().apply(r), f.boldCells() ? BOLD : PLAIN) + 12);
            }
            f.column().setPrefWidth(Math.ceil(w));
            f.column().setMinWidth(Math.ceil(w));
        }
    }

    private static double width(String s, Font font) {
        if (s == null || s.isEmpty()) {
            return 0;
        }
        Text t = new Text(s);
        t.setFont(font);
        return t.getLayoutBounds().getWidth();
    }
}
