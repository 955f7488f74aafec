package org.shapetrail.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class MeasurementCheckTest {
    // Unit factors: 1 in = 2.54 cm, 1 kg = 2.2046226 lb (definitions of the units).

    private static Problem problem(Site site, double value) {
        return MeasurementCheck.check(site, value).orElseThrow();
    }

    @Test
    void plausibleValuesPass() {
        assertEquals(Optional.empty(), MeasurementCheck.check(Site.STATURE, 178.0));
        assertEquals(Optional.empty(), MeasurementCheck.check(Site.TRICEPS, 9.5));
        assertEquals(Optional.empty(), MeasurementCheck.check(Site.HUMERUS, 6.8));
    }

    @Test
    void statureInMetresIsNamed() {
        Problem p = problem(Site.STATURE, 1.78);
        assertEquals(ProblemKind.LIKELY_METRES, p.kind());
        assertEquals("Stature 1.78 looks like metres; enter 178.0 cm.", p.message());
    }

    @Test
    void statureInInchesIsNamed() {
        // 70 in × 2.54 = 177.8 cm
        Problem p = problem(Site.STATURE, 70);
        assertEquals(ProblemKind.LIKELY_INCHES, p.kind());
        assertEquals("Stature 70 looks like inches; enter 177.8 cm.", p.message());
    }

    @Test
    void skinfoldInCentimetresIsNamed() {
        Problem p = problem(Site.TRICEPS, 1.2);
        assertEquals(ProblemKind.LIKELY_CENTIMETRES, p.kind());
        assertEquals("Triceps skinfold 1.2 looks like centimetres; enter 12.0 mm.", p.message());
    }

    @Test
    void breadthInMillimetresIsNamed() {
        Problem p = problem(Site.HUMERUS, 68);
        assertEquals(ProblemKind.LIKELY_MILLIMETRES, p.kind());
        assertEquals("Humerus breadth 68 looks like millimetres; enter 6.8 cm.", p.message());
    }

    @Test
    void massInPoundsAboveTheRangeIsNamed() {
        // 300 lb / 2.2046 = 136.1 kg
        Problem p = problem(Site.BODY_MASS, 300);
        assertEquals(ProblemKind.LIKELY_POUNDS, p.kind());
        assertEquals("Body mass 300 looks like pounds; enter 136.1 kg.", p.message());
    }

    @Test
    void massInPoundsInsideTheRangeIsCaughtByTheBmi() {
        // 141 lb at 150 cm: BMI 141 / 1.5² = 62.7 (> 60, implausible); in kg 64.0 (derived)
        List<Problem> ps = MeasurementCheck.checkAll(Map.of(Site.STATURE, 150.0, Site.BODY_MASS, 141.0));
        assertEquals(1, ps.size());
        assertEquals(ProblemKind.LIKELY_POUNDS, ps.get(0).kind());
        assertEquals("Body mass 141 with stature 150 cm gives a BMI of 62.7; it looks like pounds; enter 64.0 kg.",
                ps.get(0).message());
    }

    @Test
    void massInGramsIsNamed() {
        assertEquals("Body mass 64000 looks like grams; enter 64.0 kg.", problem(Site.BODY_MASS, 64000).message());
    }

    @Test
    void outOfRangeWithoutAUnitExplanationSaysSo() {
        Problem p = problem(Site.CALF, 95);
        assertEquals(ProblemKind.OUT_OF_RANGE, p.kind());
        assertEquals("Calf girth 95 cm is outside the plausible range 18.0–65.0 cm; check the value and the unit.",
                p.message());
    }

    @Test
    void zeroNegativeAndNanAreRefused() {
        assertEquals(ProblemKind.NOT_POSITIVE, problem(Site.TRICEPS, 0).kind());
        assertEquals(ProblemKind.NOT_POSITIVE, problem(Site.STATURE, -170).kind());
        assertEquals(ProblemKind.NOT_A_NUMBER, problem(Site.STATURE, Double.NaN).kind());
    }

    @Test
    void sittingHeightNotBelowStatureIsInconsistent() {
        List<Problem> ps = MeasurementCheck.checkAll(Map.of(Site.STATURE, 120.0, Site.SITTING_HEIGHT, 121.0));
        assertEquals(1, ps.size());
        assertEquals(ProblemKind.INCONSISTENT, ps.get(0).kind());
        assertTrue(ps.get(0).message().startsWith("Sitting height 121 cm is not less than stature 120 cm"));
    }
}
