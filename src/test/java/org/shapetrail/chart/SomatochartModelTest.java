package org.shapetrail.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.Rating;

class SomatochartModelTest {
    @Test
    void cornersAndCentreMapToTheirStandardCoordinates() {
        // Carter & Heath 1990 chart coordinates
        assertEquals(new Point(-6, -6), SomatochartBuilder.ENDO_CORNER);
        assertEquals(new Point(0, 12), SomatochartBuilder.MESO_CORNER);
        assertEquals(new Point(6, -6), SomatochartBuilder.ECTO_CORNER);
        assertEquals(new Point(0, 0), SomatochartBuilder.pt(Rating.of(4, 4, 4)));
    }

    @Test
    void outlinePassesThroughTheCornersAndTheTwoComponentRatingsOnRoundArcs() {
        List<Point> outline = SomatochartBuilder.outline(60);
        assertEquals(180, outline.size());
        // the arcs start at the corners (derived: arc(a, m, b) starts at a)
        assertEquals(-6, outline.get(0).x(), 1e-9);
        assertEquals(-6, outline.get(0).y(), 1e-9);
        assertEquals(0, outline.get(60).x(), 1e-9);
        assertEquals(12, outline.get(60).y(), 1e-9);
        assertEquals(6, outline.get(120).x(), 1e-9);
        // every point of an arc is at the same display distance from the arc's centre (derived: a circle
        // through 7-1-1 (−6, −6), 5-5-1 (−4, 4) and 1-7-1 (0, 12), x in display units × √3)
        List<Point> first = outline.subList(0, 60);
        double[] c = circle(-6, -6, -4, 4, 0, 12);
        for (Point p : first) {
            assertEquals(c[2], Math.hypot(p.x() * Math.sqrt(3) - c[0], p.y() - c[1]), 1e-9);
        }
        // and 5-5-1 at (−4, 4) lies on it between the corners; the arc bulges past the straight side
        // through 4-4-1 at (−3, 3)
        assertTrue(first.stream().anyMatch(p -> Math.abs(p.y() - 4) < 0.3 && Math.abs(p.x() + 4) < 0.3));
    }

    static double[] circle(double x1, double y1, double x2, double y2, double x3, double y3) {
        double s = Math.sqrt(3);
        double ax = x1 * s;
        double bx = x2 * s;
        double cx = x3 * s;
        double d = 2 * (ax * (y2 - y3) + bx * (y3 - y1) + cx * (y1 - y2));
        double ux = ((ax * ax + y1 * y1) * (y2 - y3) + (bx * bx + y2 * y2) * (y3 - y1) + (cx * cx + y3 * y3) * (y1 - y2)) / d;
        double uy = ((ax * ax + y1 * y1) * (cx - bx) + (bx * bx + y2 * y2) * (ax - cx) + (cx * cx + y3 * y3) * (bx - ax)) / d;
        return new double[] {ux, uy, Math.hypot(ax - ux, y1 - uy)};
    }

    @Test
    void pathFollowsVisitDatesWhateverTheOrderGiven() {
        var b = new SomatochartBuilder("t");
        List<SomatochartBuilder.PathPoint> pts = List.of(
                new SomatochartBuilder.PathPoint(LocalDate.of(2025, 9, 1), Rating.of(3, 4, 3), null, "visit:3"),
                new SomatochartBuilder.PathPoint(LocalDate.of(2024, 9, 1), Rating.of(2, 4, 3), null, "visit:1"),
                new SomatochartBuilder.PathPoint(LocalDate.of(2025, 3, 1), Rating.of(2.5, 4, 3), null, "visit:2"));
        ChartModel m = b.path("A", pts, List.of(Verdict.WITHIN_NOISE, Verdict.BEYOND_NOISE), false).build();
        assertEquals(List.of("visit:1", "visit:2", "visit:3"), m.markers().stream().map(Primitive.Marker::id).toList());
        List<Primitive.Segment> steps = m.primitives().stream().filter(p -> p instanceof Primitive.Segment s && s.arrow())
                .map(p -> (Primitive.Segment) p).toList();
        assertEquals(2, steps.size());
        assertEquals(SomatochartBuilder.pt(Rating.of(2, 4, 3)), steps.get(0).from());
        assertEquals(SomatochartBuilder.pt(Rating.of(3, 4, 3)), steps.get(1).to());
    }

    @Test
    void stepsBeyondAndWithinNoiseDifferInLineStyleNotOnlyColour() {
        Style beyond = SomatochartBuilder.stepStyle(Verdict.BEYOND_NOISE, "#1f6f78");
        Style borderline = SomatochartBuilder.stepStyle(Verdict.BORDERLINE, "#1f6f78");
        Style within = SomatochartBuilder.stepStyle(Verdict.WITHIN_NOISE, "#1f6f78");
        assertEquals(0, beyond.dash().length);
        assertTrue(borderline.dash().length > 0 && within.dash().length > 0);
        assertFalse(java.util.Arrays.equals(borderline.dash(), within.dash()));
        assertTrue(beyond.strokeWidth() > borderline.strokeWidth() && borderline.strokeWidth() > within.strokeWidth());
    }

    @Test
    void labelsOnACrowdedChartNeverOverlap() {
        var b = new SomatochartBuilder("crowded");
        java.util.Random rnd = new java.util.Random(4);
        for (int person = 0; person < 12; person++) {
            List<SomatochartBuilder.PathPoint> pts = new ArrayList<>();
            for (int v = 0; v < 8; v++) {
                pts.add(new SomatochartBuilder.PathPoint(LocalDate.of(2023, 1, 1).plusMonths(4L * v),
                        Rating.of(2 + rnd.nextDouble(), 4 + rnd.nextDouble(), 2 + rnd.nextDouble()), null, null));
            }
            b.path("P" + person, pts, null, false);
        }
        b.build();
        List<LabelPlacer.Placed> placed = b.placedLabels();
        assertTrue(placed.size() > 5, "some labels are placed: " + placed.size());
        assertTrue(b.droppedLabels() > 0, "the fixture is crowded enough to drop some");
        for (int i = 0; i < placed.size(); i++) {
            for (int j = i + 1; j < placed.size(); j++) {
                assertFalse(placed.get(i).box().overlaps(placed.get(j).box()), "labels " + i + " and " + j);
            }
        }
    }

    @Test
    void categoryRegionsAreNamedWhereTheirRatingsPlot() throws Exception {
        ChartModel m = new SomatochartBuilder("regions", java.util.Locale.ENGLISH).withCategoryRegions().build();
        List<String> names = m.texts().stream().map(Primitive.Text::text).toList();
        for (String c : List.of("central", "balanced mesomorph", "balanced endomorph", "balanced ectomorph")) {
            assertTrue(names.contains(c), c + " in " + names);
        }
        // the chart point (x, y) with components summing to 12: 2.5-7-2.5 plots at (0, 9) (derived)
        Rating r = SomatochartBuilder.ratingAt(0, 9);
        assertEquals(2.5, r.endomorphy(), 1e-12);
        assertEquals(7.0, r.mesomorphy(), 1e-12);
        assertEquals(2.5, r.ectomorphy(), 1e-12);
        // "balanced mesomorph" is labelled above the centre, on the mesomorphy axis (derived from its ratings)
        Primitive.Text bm = m.texts().stream().filter(t -> t.text().equals("balanced mesomorph")).findFirst().orElseThrow();
        assertEquals(0, bm.at().x(), 0.3);
        assertTrue(bm.at().y() > 3, "y " + bm.at().y());
        java.awt.image.BufferedImage img = org.shapetrail.chart.png.PngRenderer.image(m, 520, 560, 2);
        javax.imageio.ImageIO.write(img, "png", org.shapetrail.docs.Screenshots.folder()
                .resolve("somatochart-categories.png").toFile());
    }

    @Test
    void noiseEllipseAxesFromTheChartCovariance() {
        // diag(4, 1) at k² = 1: semi-axes 2 and 1 along X (derived)
        double[] ax = Ellipses.axes(new double[][] {{4, 0}, {0, 1}}, 1);
        assertEquals(2, ax[0], 1e-12);
        assertEquals(1, ax[1], 1e-12);
        assertEquals(0, ax[2], 1e-12);
        // the 95 % region uses χ²(2) 0.95 = 5.991 (statistics table)
        assertEquals(5.991, Ellipses.CHI2_2_95, 5e-4);
        ComponentCovariance c = new ComponentCovariance(new double[][] {{0.01, 0, 0}, {0, 0.01, 0}, {0, 0, 0.01}});
        ChartModel m = new SomatochartBuilder("e").path("A", List.of(new SomatochartBuilder.PathPoint(
                LocalDate.of(2024, 1, 1), Rating.of(3, 4, 3), c, "v")), List.of(), true).build();
        assertTrue(m.primitives().stream().anyMatch(p -> p instanceof Primitive.Path path && path.points().size() == 40));
    }
}
