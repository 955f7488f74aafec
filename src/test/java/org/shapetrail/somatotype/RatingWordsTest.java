package org.shapetrail.somatotype;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class RatingWordsTest {
    @Test
    void levelsFollowTheHalfUnitBands() {
        // Carter & Heath 1990: ½–2½ low, 3–5 moderate, 5½–7 high, ≥ 7½ very high
        assertEquals(RatingLevel.LOW, RatingLevel.of(0.1));
        assertEquals(RatingLevel.LOW, RatingLevel.of(2.74));
        assertEquals(RatingLevel.MODERATE, RatingLevel.of(2.75));
        assertEquals(RatingLevel.MODERATE, RatingLevel.of(5.24));
        assertEquals(RatingLevel.HIGH, RatingLevel.of(5.25));
        assertEquals(RatingLevel.HIGH, RatingLevel.of(7.24));
        assertEquals(RatingLevel.VERY_HIGH, RatingLevel.of(7.25));
    }

    @Test
    void halfUnitsRoundHalfUpWithHalfAsTheLowest() {
        assertEquals(2.5, HalfUnit.round(2.25));
        assertEquals(2.0, HalfUnit.round(2.2499));
        assertEquals(0.5, HalfUnit.round(0.1));
        assertEquals("2½", HalfUnit.format(2.5));
        assertEquals("½", HalfUnit.format(0.5));
        assertEquals("4", HalfUnit.format(4.0));
    }

    @Test
    void displayUsesOneDecimalAndRoundingDoesNotFeedBack() {
        Rating r = Rating.of(2.46, 4.04, 2.96);
        assertEquals("2.5-4.0-3.0", r.toDisplayString());
        assertEquals(2.46, r.endomorphy());
    }
}
