package org.shapetrail.chart;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.awt.font.FontRenderContext;
import java.awt.geom.Rectangle2D;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * Labels as they are drawn: every person's migration path in the sample academy, laid out for the size
 * it is drawn at (the screen's small and large chart, the letter's), measured with a real font, never has
 * two labels overlapping.
 */
class DrawnLabelsTest {
    static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    /** The labels' boxes in device points, from the font's own metrics. */
    static List<Rectangle2D> drawnBoxes(ChartModel m, double width, double height) {
        Viewport v = Viewport.fit(m, width, height, ChartPainter.MARGIN, 1, 0, 0);
        List<Rectangle2D> out = new ArrayList<>();
        for (Primitive p : m.primitives()) {
            if (p instanceof Primitive.Text t && t.sizePt() <= 8.5 && t.anchor() == Anchor.START) {
                Rectangle2D r = new Font("SansSerif", Font.PLAIN, 1).deriveFont((float) t.sizePt())
                        .getStringBounds(t.text(), FRC);
                out.add(new Rectangle2D.Double(v.x(t.at().x()) + 0.5, v.y(t.at().y()) + r.getY() + 0.5,
                        r.getWidth() - 1, r.getHeight() - 1));
            }
        }
        return out;
    }

    @Test
    void noTwoDrawnLabelsOverlapAtAnySizeTheChartIsShown() throws Exception {
        Path f = Files.createTempDirectory("labels").resolve("demo.sqlite");
        DemoAcademy.generate(f);
        HistoryBuilder b;
        try (Database db = Database.open(f)) {
            b = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        int charts = 0;
        for (var p : b.academy().people()) {
            PersonHistory h = b.history(p);
            for (double[] size : new double[][] {{380, 300}, {700, 620}, {260, 260}}) {
                ChartModel m = ChartPainter.laidOutFor(height -> Charts.migration(h, true, Locale.UK, false, false,
                        height), size[0], size[1]);
                List<Rectangle2D> boxes = drawnBoxes(m, size[0], size[1]);
                for (int i = 0; i < boxes.size(); i++) {
                    for (int j = i + 1; j < boxes.size(); j++) {
                        assertFalse(boxes.get(i).intersects(boxes.get(j)), p.displayName() + " at " + size[0] + "×"
                                + size[1] + ": " + boxes.get(i) + " and " + boxes.get(j));
                    }
                }
                charts++;
            }
        }
        assertTrue(charts > 100);
    }
}
