package org.shapetrail.bench;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import javafx.application.Platform;
import javafx.scene.canvas.Canvas;
import org.shapetrail.chart.ChartModel;
import org.shapetrail.chart.MarkerShape;
import org.shapetrail.chart.Palette;
import org.shapetrail.chart.SomatochartBuilder;
import org.shapetrail.chart.png.PngRenderer;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Rating;

/**
 * Harness for docs/performance.md: a squad chart with 10,000 points and 2,000 paths (each path 5 visits,
 * plus 10,000 latest-rating points), redrawn on a JavaFX canvas (the work the FX thread does per redraw,
 * headless Monocle, software pipeline) and, for comparison, rasterised to a PNG image with Java2D. Run with
 * {@code mvn -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=org.shapetrail.bench.ChartRedrawBenchmark}.
 */
public final class ChartRedrawBenchmark {
    private ChartRedrawBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Random rnd = new Random(9);
        SomatochartBuilder b = new SomatochartBuilder("squad", java.util.Locale.ENGLISH).withoutLegend();
        for (int p = 0; p < 2000; p++) {
            List<SomatochartBuilder.PathPoint> pts = new ArrayList<>();
            for (int v = 0; v < 5; v++) {
                pts.add(new SomatochartBuilder.PathPoint(LocalDate.of(2022, 1, 1).plusMonths(4L * v),
                        Rating.of(1 + rnd.nextDouble() * 5, 2 + rnd.nextDouble() * 5, 1 + rnd.nextDouble() * 5), null,
                        "p" + p + "v" + v));
            }
            b.path("P" + p, pts, List.of(Verdict.WITHIN_NOISE, Verdict.BORDERLINE, Verdict.BEYOND_NOISE,
                    Verdict.WITHIN_NOISE), false);
        }
        for (int i = 0; i < 10_000; i++) {
            b.point(Rating.of(1 + rnd.nextDouble() * 5, 2 + rnd.nextDouble() * 5, 1 + rnd.nextDouble() * 5), null, null,
                    Palette.series(0), MarkerShape.CIRCLE);
        }
        ChartModel m = b.build();
        System.out.println("primitives: " + m.primitives().size() + ", markers: " + m.markers().size());

        System.setProperty("glass.platform", "Monocle");
        System.setProperty("monocle.platform", "Headless");
        System.setProperty("prism.order", "sw");
        CountDownLatch up = new CountDownLatch(1);
        Platform.startup(up::countDown);
        up.await();
        Canvas canvas = CompletableFuture.supplyAsync(() -> new Canvas(900, 900), Platform::runLater).get();
        Harness.time("FX canvas redraw (10,000 points, 2,000 paths)", 5, 15, () ->
                CompletableFuture.runAsync(() -> org.shapetrail.chart.ChartPainter.paint(m,
                        fxTarget(canvas), 900, 900, 1, 0, 0), Platform::runLater).get());
        Harness.time("Java2D raster to PNG image (900 × 900)", 2, 7, () -> PngRenderer.image(m, 900, 900, 1));
        Platform.exit();
    }

    static org.shapetrail.chart.DrawTarget fxTarget(Canvas c) {
        return org.shapetrail.chart.fx.ChartCanvas.targetFor(c);
    }
}
