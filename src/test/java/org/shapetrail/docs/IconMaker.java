package org.shapetrail.docs;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.util.List;
import javax.imageio.ImageIO;
import org.shapetrail.chart.Point;
import org.shapetrail.chart.SomatochartBuilder;

/**
 * Draws Shapetrail's own icon (packaging/linux/shapetrail.png): the somatochart's rounded outline with a
 * short migration path, in the app's colours. Run once when the icon changes:
 * {@code java -cp <test class path> org.shapetrail.docs.IconMaker packaging/linux/shapetrail.png}.
 */
public final class IconMaker {
    private IconMaker() {
    }

    public static void main(String[] args) throws Exception {
        int n = 256;
        BufferedImage img = new BufferedImage(n, n, BufferedImage.TYPE_INT_ARGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(new Color(0x1f, 0x3a, 0x44));
        g.fill(new RoundRectangle2D.Double(8, 8, n - 16, n - 16, 56, 56));
        // the outline in chart units (x −7..7 scaled by √3, y −8..12), mapped into the square
        List<Point> outline = SomatochartBuilder.outline(40);
        double s = 8.6;
        Path2D p = new Path2D.Double();
        for (int i = 0; i < outline.size(); i++) {
            double x = n / 2.0 + outline.get(i).x() * Math.sqrt(3) * s * 0.95;
            double y = n / 2.0 + 24 - outline.get(i).y() * s * 0.95;
            if (i == 0) {
                p.moveTo(x, y);
            } else {
                p.lineTo(x, y);
            }
        }
        p.closePath();
        g.setColor(new Color(0xfa, 0xf7, 0xf0));
        g.fill(p);
        g.setColor(new Color(0x2a, 0x6f, 0x78));
        g.setStroke(new BasicStroke(7, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        g.draw(p);
        // a migration path of three steps, the last one larger
        double[][] steps = {{-2.2, -3.2}, {-1.0, -1.0}, {0.2, 0.4}, {2.2, 4.0}};
        g.setColor(new Color(0xd8, 0x8a, 0x2e));
        g.setStroke(new BasicStroke(9, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        for (int i = 1; i < steps.length; i++) {
            g.drawLine(x(steps[i - 1][0], n, s), y(steps[i - 1][1], n, s), x(steps[i][0], n, s), y(steps[i][1], n, s));
        }
        for (double[] st : steps) {
            g.fillOval(x(st[0], n, s) - 10, y(st[1], n, s) - 10, 20, 20);
        }
        g.dispose();
        ImageIO.write(img, "png", new File(args[0]));
    }

    private static int x(double cx, int n, double s) {
        return (int) Math.round(n / 2.0 + cx * Math.sqrt(3) * s * 0.95);
    }

    private static int y(double cy, int n, double s) {
        return (int) Math.round(n / 2.0 + 24 - cy * s * 0.95);
    }
}
