package org.shapetrail.chart.png;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import javax.imageio.ImageIO;
import org.shapetrail.chart.Anchor;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.ChartPainter;
import org.shapetrail.chart.DrawTarget;
import org.shapetrail.chart.Style;

/** Renders a chart model to a PNG image with Java2D (no JavaFX needed; works headless). */
public final class PngRenderer implements DrawTarget {
    private static final Font BASE = loadFont();
    private final double scale;
    private BufferedImage image;
    private Graphics2D g;

    private PngRenderer(double scale) {
        this.scale = scale;
    }

    private static Font loadFont() {
        try (InputStream in = PngRenderer.class.getResourceAsStream(
                "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf")) {
            if (in != null) {
                return Font.createFont(Font.TRUETYPE_FONT, in);
            }
        } catch (Exception e) {
            // fall back to the logical font below
        }
        return new Font(Font.SANS_SERIF, Font.PLAIN, 10);
    }

    /** The image of the chart at {@code width × height} points, {@code scale} pixels per point. */
    public static BufferedImage image(ChartModel m, double width, double height, double scale) {
        PngRenderer r = new PngRenderer(scale);
        ChartPainter.paint(m, r, width, height, 1, 0, 0);
        r.g.dispose();
        return r.image;
    }

    public static void write(ChartModel m, double width, double height, double scale, OutputStream out)
            throws IOException {
        ImageIO.write(image(m, width, height, scale), "png", out);
    }

    @Override
    public void begin(double width, double height, String background) {
        image = new BufferedImage((int) Math.round(width * scale), (int) Math.round(height * scale),
                BufferedImage.TYPE_INT_RGB);
        g = image.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.scale(scale, scale);
        g.setColor(Color.decode(background));
        g.fillRect(0, 0, (int) Math.ceil(width), (int) Math.ceil(height));
    }

    @Override
    public void polyline(double[] xs, double[] ys, boolean closed, Style s, String role, String id) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            p.lineTo(xs[i], ys[i]);
        }
        if (closed) {
            p.closePath();
        }
        if (s.fill() != null) {
            g.setColor(colour(s.fill(), s.opacity()));
            g.fill(p);
        }
        if (s.stroke() != null && s.strokeWidth() > 0) {
            float[] dash = null;
            if (s.dash().length > 0) {
                dash = new float[s.dash().length];
                for (int i = 0; i < dash.length; i++) {
                    dash[i] = (float) s.dash()[i];
                }
            }
            g.setStroke(new BasicStroke((float) s.strokeWidth(), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 4,
                    dash, 0));
            g.setColor(colour(s.stroke(), Math.min(1, s.opacity() + (s.fill() != null ? 0.3 : 0))));
            g.draw(p);
        }
    }

    private static Color colour(String hex, double opacity) {
        Color c = Color.decode(hex);
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), (int) Math.round(255 * opacity));
    }

    @Override
    public void text(double x, double y, String text, double sizePt, Anchor anchor, boolean bold, String colour) {
        Font f = BASE.deriveFont(bold ? Font.BOLD : Font.PLAIN, (float) sizePt);
        g.setFont(f);
        g.setColor(Color.decode(colour));
        double w = g.getFontMetrics().stringWidth(text);
        double dx = switch (anchor) {
            case START -> 0;
            case MIDDLE -> -w / 2;
            case END -> -w;
        };
        g.drawString(text, (float) (x + dx), (float) y);
    }

    @Override
    public void end() {
        // nothing to flush: the image is complete
    }
}
