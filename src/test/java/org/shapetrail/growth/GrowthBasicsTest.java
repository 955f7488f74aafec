package org.shapetrail.growth;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import org.junit.jupiter.api.Test;

class GrowthBasicsTest {
    @Test
    void decimalAgeCountsTheDaysOfTheCurrentYearOfLife() {
        // born 2012-03-01; on 2024-09-01 the 12th year of life began 2024-03-01 and runs 365 days to
        // 2025-03-01: 12 + 184/365 = 12.50411 (derived)
        assertEquals(12 + 184.0 / 365, DecimalAge.years(LocalDate.of(2012, 3, 1), LocalDate.of(2024, 9, 1)), 1e-12);
        // across 29 February: born 2011-09-01, on 2024-03-01 the year 2023-09-01..2024-09-01 has 366 days,
        // 182 of them passed: 12 + 182/366 (derived)
        assertEquals(12 + 182.0 / 366, DecimalAge.years(LocalDate.of(2011, 9, 1), LocalDate.of(2024, 3, 1)), 1e-12);
    }

    @Test
    void leapDayBirthdaysFallOnTheTwentyEighthInOtherYears() {
        // born 2012-02-29: on 2025-02-28 the 13th birthday has been reached (common practice for leap-day births)
        assertEquals(13.0, DecimalAge.years(LocalDate.of(2012, 2, 29), LocalDate.of(2025, 2, 28)), 1e-12);
    }

    @Test
    void aDateBeforeBirthIsRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> DecimalAge.years(LocalDate.of(2012, 3, 1), LocalDate.of(2012, 2, 1)));
    }

    @Test
    void velocityIsAnnualisedWithItsError() {
        // 3.0 cm in 146 days: 3.0 / (146/365.25) = 7.5051 cm/year; SE √(0.2² + 0.2²) / 0.39973 = 0.70759 (derived)
        Velocity v = Velocity.between(150.0, 0.2, 153.0, 0.2, 146);
        assertEquals(3.0 / (146 / 365.25), v.perYear(), 1e-12);
        assertEquals(Math.sqrt(0.08) / (146 / 365.25), v.sePerYear(), 1e-12);
        assertFalse(v.tooShortToRead());
        // above 7 cm/year (common practice), but over less than six months: never the alert alone
        assertTrue(v.shortInterval());
        assertFalse(GrowthAlert.standard().raisedBy(v));
    }

    @Test
    void aVelocityOverSixMonthsOrMoreRaisesTheAlert() {
        // 3.6 cm in 182 days: 3.6 / (182/365.25) = 7.22 cm/year, above 7 (derived; common practice threshold)
        Velocity v = Velocity.between(150.0, 0.2, 153.6, 0.2, 182);
        assertFalse(v.shortInterval());
        assertTrue(GrowthAlert.standard().raisedBy(v));
        assertFalse(GrowthAlert.standard().raisedBy(Velocity.between(150.0, 0.2, 153.6, 0.2, 181)));
    }

    @Test
    void shortIntervalsAreFlaggedAndDoNotRaiseTheAlert() {
        Velocity v = Velocity.between(150.0, 0.2, 152.0, 0.2, 60);
        assertTrue(v.tooShortToRead());
        assertFalse(GrowthAlert.standard().raisedBy(v));
    }

    @Test
    void aZeroDayIntervalIsRefusedWithAMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Velocity.between(150, 0.2, 150.5, 0.2, 0));
        assertTrue(e.getMessage().contains("same day"));
    }
}
