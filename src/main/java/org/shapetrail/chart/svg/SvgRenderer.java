package org.shapetrail.chart.svg;

import java.util.Locale;
import org.shapetrail.chart.Anchor;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.ChartPainter;
import org.shapetrail.chart.DrawTarget;
import org.shapetrail.chart.Style;

/** Writes a chart model as a standalone SVG document; each marker is one {@code <polygon class="marker">}. */
public final class SvgRenderer implements DrawTarget {
    private final StringBuilder sb = new StringBuilder();

    private SvgRenderer() {
    }

    public static String render(ChartModel m, double width, double height) {
        SvgRenderer r = new SvgRenderer();
        ChartPainter.paint(m, r, width, height, 1, 0, 0);
        return r.sb.toString();
    }

    @Override
    public void begin(double width, double height, String background) {
        sb.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        sb.append(String.format(Locale.ROOT, "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%.0f\" height=\"%.0f\""
                + " viewBox=\"0 0 %.0f %.0f\" font-family=\"Liberation Sans, Arial, sans-serif\">%n", width, height,
                width, height));
        sb.append(String.format(Locale.ROOT, "<rect width=\"%.0f\" height=\"%.0f\" fill=\"%s\"/>%n", width, height,
                background));
    }

    @Override
    public void polyline(double[] xs, double[] ys, boolean closed, Style s, String role, String id) {
        sb.append(closed ? "<polygon" : "<polyline").append(" class=\"").append(role).append('"');
        if (id != null) {
            sb.append(" data-id=\"").append(escape(id)).append('"');
        }
        sb.append(" points=\"");
        for (int i = 0; i < xs.length; i++) {
            sb.append(String.format(Locale.ROOT, "%s%.2f,%.2f", i == 0 ? "" : " ", xs[i], ys[i]));
        }
        sb.append('"');
        sb.append(" fill=\"").append(s.fill() == null ? "none" : s.fill()).append('"');
        if (s.stroke() != null) {
            sb.append(" stroke=\"").append(s.stroke()).append('"');
            sb.append(String.format(Locale.ROOT, " stroke-width=\"%.2f\"", s.strokeWidth()));
            if (s.dash().length > 0) {
                sb.append(" stroke-dasharray=\"");
                for (int i = 0; i < s.dash().length; i++) {
                    sb.append(String.format(Locale.ROOT, "%s%.1f", i == 0 ? "" : " ", s.dash()[i]));
                }
                sb.append('"');
            }
        }
        if (s.opacity() < 1) {
            sb.append(String.format(Locale.ROOT, " opacity=\"%.2f\"", s.opacity()));
        }
        sb.append("/>\n");
    }

    @Override
    public void text(double x, double y, String text, double sizePt, Anchor anchor, boolean bold, String colour) {
        String a = switch (anchor) {
            case START -> "start";
            case MIDDLE -> "middle";
            case END -> "end";
        };
        sb.append(String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%.1f\" text-anchor=\"%s\""
                + " fill=\"%s\"%s>%s</text>%n", x, y, sizePt, a, colour, bold ? " font-weight=\"bold\"" : "",
                escape(text)));
    }

    @Override
    public void end() {
        sb.append("</svg>\n");
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;")
                .replace("\n", " · ");
    }
}
