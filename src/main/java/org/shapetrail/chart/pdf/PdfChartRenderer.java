package org.shapetrail.chart.pdf;

import java.awt.Color;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState;
import org.shapetrail.chart.Anchor;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.ChartPainter;
import org.shapetrail.chart.DrawTarget;
import org.shapetrail.chart.Style;

/** Draws a chart model as vector graphics into a box of a PDF page (PDFBox). */
public final class PdfChartRenderer implements DrawTarget {
    private final PDPageContentStream cs;
    private final PDFont regular;
    private final PDFont bold;
    private final double left;
    private final double top;

    private PdfChartRenderer(PDPageContentStream cs, PDFont regular, PDFont bold, double left, double top) {
        this.cs = cs;
        this.regular = regular;
        this.bold = bold;
        this.left = left;
        this.top = top;
    }

    /**
     * Draws {@code m} into the box with lower-left corner (x, y) and the given size, in PDF points.
     *
     * @param regular and bold embedded fonts for the texts
     */
    public static void draw(ChartModel m, PDPageContentStream cs, PDFont regular, PDFont bold, double x, double y,
                            double width, double height) {
        ChartPainter.paint(m, new PdfChartRenderer(cs, regular, bold, x, y + height), width, height, 1, 0, 0);
    }

    @Override
    public void begin(double width, double height, String background) {
        try {
            cs.saveGraphicsState();
            cs.setNonStrokingColor(Color.decode(background));
            cs.addRect((float) left, (float) (top - height), (float) width, (float) height);
            cs.fill();
            // keep a cropped chart's frame inside its box
            cs.addRect((float) left, (float) (top - height), (float) width, (float) height);
            cs.clip();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void polyline(double[] xs, double[] ys, boolean closed, Style s, String role, String id) {
        try {
            cs.saveGraphicsState();
            if (s.opacity() < 1) {
                PDExtendedGraphicsState gs = new PDExtendedGraphicsState();
                gs.setNonStrokingAlphaConstant((float) s.opacity());
                gs.setStrokingAlphaConstant((float) Math.min(1, s.opacity() + 0.3));
                cs.setGraphicsStateParameters(gs);
            }
            cs.moveTo((float) (left + xs[0]), (float) (top - ys[0]));
            for (int i = 1; i < xs.length; i++) {
                cs.lineTo((float) (left + xs[i]), (float) (top - ys[i]));
            }
            if (closed) {
                cs.closePath();
            }
            boolean stroke = s.stroke() != null && s.strokeWidth() > 0;
            if (stroke) {
                cs.setStrokingColor(Color.decode(s.stroke()));
                cs.setLineWidth((float) s.strokeWidth());
                float[] dash = new float[s.dash().length];
                for (int i = 0; i < dash.length; i++) {
                    dash[i] = (float) s.dash()[i];
                }
                cs.setLineDashPattern(dash, 0);
            }
            if (s.fill() != null) {
                cs.setNonStrokingColor(Color.decode(s.fill()));
                if (stroke) {
                    cs.fillAndStroke();
                } else {
                    cs.fill();
                }
            } else if (stroke) {
                cs.stroke();
            }
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void text(double x, double y, String text, double sizePt, Anchor anchor, boolean isBold, String colour) {
        try {
            PDFont f = isBold ? bold : regular;
            double w = f.getStringWidth(text) / 1000 * sizePt;
            double dx = switch (anchor) {
                case START -> 0;
                case MIDDLE -> -w / 2;
                case END -> -w;
            };
            cs.beginText();
            cs.setFont(f, (float) sizePt);
            cs.setNonStrokingColor(Color.decode(colour));
            cs.newLineAtOffset((float) (left + x + dx), (float) (top - y));
            cs.showText(text);
            cs.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void end() {
        try {
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
