package org.shapetrail.chart.fx;

import java.util.function.Consumer;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.Pane;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import javafx.util.Duration;
import org.shapetrail.chart.Anchor;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.ChartPainter;
import org.shapetrail.chart.DrawTarget;
import org.shapetrail.chart.Primitive;
import org.shapetrail.chart.Style;
import org.shapetrail.chart.Viewport;

/**
 * The JavaFX renderer: draws a chart model on a canvas that fills the pane; scroll zooms, drag pans,
 * double-click resets; hovering a marker shows its tooltip; clicking a marker reports its id.
 */
public final class ChartCanvas extends Pane {
    /** The toolkit's own font family. */
    private static final String FONT = "System"; // not words: a font family
    private final Canvas canvas = new Canvas();
    private final Tooltip tip = new Tooltip();
    private ChartModel model;
    private Viewport viewport;
    private double zoom = 1;
    private double panX;
    private double panY;
    private double dragX;
    private double dragY;
    private Consumer<String> onSelect = id -> { };
    private String hovered;

    public ChartCanvas() {
        getChildren().add(canvas);
        getStyleClass().add("chart-canvas");
        tip.setShowDelay(Duration.millis(80));
        Tooltip.install(canvas, tip);
        canvas.widthProperty().bind(widthProperty());
        canvas.heightProperty().bind(heightProperty());
        canvas.widthProperty().addListener(o -> redraw());
        canvas.heightProperty().addListener(o -> redraw());
        canvas.setOnScroll(e -> {
            double f = e.getDeltaY() > 0 ? 1.15 : 1 / 1.15;
            zoom = Math.max(0.5, Math.min(12, zoom * f));
            redraw();
        });
        canvas.setOnMousePressed(e -> {
            dragX = e.getX();
            dragY = e.getY();
        });
        canvas.setOnMouseDragged(e -> {
            panX += e.getX() - dragX;
            panY += e.getY() - dragY;
            dragX = e.getX();
            dragY = e.getY();
            redraw();
        });
        canvas.setOnMouseMoved(e -> hover(e.getX(), e.getY()));
        canvas.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2) {
                zoom = 1;
                panX = 0;
                panY = 0;
                redraw();
                return;
            }
            Primitive.Marker m = markerAt(e.getX(), e.getY());
            if (m != null && m.id() != null) {
                onSelect.accept(m.id());
            }
        });
    }

    public void setModel(ChartModel m) {
        this.layout = null;
        this.model = m;
        redraw();
    }

    /**
     * Shows a chart whose labels are laid out for the size it is drawn at: {@code layoutFor} makes the model
     * for a chart of the given height in points, and is asked again when the canvas or the zoom changes the
     * drawn size by more than a tenth, so labels never run into each other however large the chart is shown.
     */
    public void setLayout(java.util.function.DoubleFunction<ChartModel> layoutFor) {
        this.layout = layoutFor;
        this.laidOutFor = 0;
        this.model = layoutFor == null ? null : layoutFor.apply(520);
        redraw();
    }

    private java.util.function.DoubleFunction<ChartModel> layout;
    private double laidOutFor;

    public ChartModel model() {
        return model;
    }

    public void setOnSelect(Consumer<String> handler) {
        this.onSelect = handler;
    }

    /** The text of the tooltip now shown (empty when none); for tests. */
    public String tooltipText() {
        return hovered == null ? "" : tip.getText();
    }

    public double zoom() {
        return zoom;
    }

    /** The device position of a marker, for tests and keyboard focus. */
    public double[] devicePosition(Primitive.Marker m) {
        return new double[] {viewport.x(m.at().x()), viewport.y(m.at().y())};
    }

    private Primitive.Marker markerAt(double x, double y) {
        if (model == null || viewport == null) {
            return null;
        }
        Primitive.Marker best = null;
        double bestD = 9;
        for (Primitive.Marker m : model.markers()) {
            double d = Math.hypot(viewport.x(m.at().x()) - x, viewport.y(m.at().y()) - y);
            if (d < bestD) {
                bestD = d;
                best = m;
            }
        }
        return best;
    }

    private void hover(double x, double y) {
        Primitive.Marker m = markerAt(x, y);
        if (m == null || m.tooltip() == null) {
            hovered = null;
            tip.hide();
            tip.setText("");
            return;
        }
        hovered = m.id();
        tip.setText(m.tooltip());
        if (!tip.isShowing() && getScene() != null && getScene().getWindow() != null) {
            var p = canvas.localToScreen(x + 12, y + 12);
            tip.show(canvas, p.getX(), p.getY());
        }
    }

    private void redraw() {
        if (model == null || getWidth() <= 0 || getHeight() <= 0) {
            return;
        }
        if (layout != null) {
            // the height the chart's box is drawn at, in device points: labels are placed for it
            double drawn = Viewport.fit(model, getWidth(), getHeight(), ChartPainter.MARGIN, zoom, panX, panY).scale()
                    * (model.maxY() - model.minY());
            if (laidOutFor == 0 || Math.abs(drawn - laidOutFor) > 0.1 * laidOutFor) {
                laidOutFor = drawn;
                model = layout.apply(drawn);
            }
        }
        viewport = ChartPainter.paint(model, new FxTarget(canvas.getGraphicsContext2D()), getWidth(), getHeight(),
                zoom, panX, panY);
    }

    /** A draw target on any canvas (for benchmarks and image export of what the screen shows). */
    public static DrawTarget targetFor(Canvas c) {
        return new FxTarget(c.getGraphicsContext2D());
    }

    private static final class FxTarget implements DrawTarget {
        private static final java.util.Map<String, Color> COLOURS = new java.util.concurrent.ConcurrentHashMap<>();
        private final GraphicsContext g;

        private static Color web(String hex) {
            return COLOURS.computeIfAbsent(hex, Color::web);
        }

        FxTarget(GraphicsContext g) {
            this.g = g;
        }

        @Override
        public void begin(double width, double height, String background) {
            // clearing the whole canvas also drops the commands of earlier drawings
            g.clearRect(0, 0, g.getCanvas().getWidth(), g.getCanvas().getHeight());
            g.setFill(web(background));
            g.fillRect(0, 0, width, height);
            g.setLineCap(StrokeLineCap.ROUND);
            g.setLineJoin(StrokeLineJoin.ROUND);
        }

        @Override
        public void polyline(double[] xs, double[] ys, boolean closed, Style s, String role, String id) {
            g.setGlobalAlpha(1);
            if (s.fill() != null) {
                g.setGlobalAlpha(s.opacity());
                g.setFill(web(s.fill()));
                g.fillPolygon(xs, ys, xs.length);
                g.setGlobalAlpha(Math.min(1, s.opacity() + 0.3));
            } else {
                g.setGlobalAlpha(s.opacity());
            }
            if (s.stroke() != null && s.strokeWidth() > 0) {
                g.setStroke(web(s.stroke()));
                g.setLineWidth(s.strokeWidth());
                g.setLineDashes(s.dash().length == 0 ? null : s.dash());
                if (closed) {
                    g.strokePolygon(xs, ys, xs.length);
                } else {
                    g.strokePolyline(xs, ys, xs.length);
                }
            }
            g.setGlobalAlpha(1);
            g.setLineDashes((double[]) null);
        }

        @Override
        public void text(double x, double y, String text, double sizePt, Anchor anchor, boolean bold, String colour) {
            g.setFont(Font.font(FONT, bold ? FontWeight.BOLD : FontWeight.NORMAL, sizePt * 1.2));
            g.setFill(web(colour));
            g.setTextAlign(switch (anchor) {
                case START -> TextAlignment.LEFT;
                case MIDDLE -> TextAlignment.CENTER;
                case END -> TextAlignment.RIGHT;
            });
            g.fillText(text, x, y);
        }

        @Override
        public void circle(double x, double y, double r, Style s, String id) {
            g.setGlobalAlpha(s.opacity());
            if (s.fill() != null) {
                g.setFill(web(s.fill()));
                g.fillOval(x - r, y - r, 2 * r, 2 * r);
            }
            if (s.stroke() != null && s.strokeWidth() > 0) {
                g.setStroke(web(s.stroke()));
                g.setLineWidth(s.strokeWidth());
                g.setLineDashes((double[]) null);
                g.strokeOval(x - r, y - r, 2 * r, 2 * r);
            }
            g.setGlobalAlpha(1);
        }

        @Override
        public void end() {
            g.setTextAlign(TextAlignment.LEFT);
        }
    }
}
