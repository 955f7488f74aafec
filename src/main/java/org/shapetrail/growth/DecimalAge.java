package org.shapetrail.growth;

import java.time.LocalDate;
import java.time.temporal.ChronoUnit;

/**
 * Decimal age: whole years since birth plus the fraction of the current year of life, counted in days
 * between the last and the next birthday, so leap years are exact (a birthday on 29 February falls on
 * 28 February in other years).
 */
public final class DecimalAge {
    private DecimalAge() {
    }

    /**
     * Age in decimal years on {@code day}.
     *
     * @throws IllegalArgumentException when {@code day} is before {@code birth}
     */
    public static double years(LocalDate birth, LocalDate day) {
        if (day.isBefore(birth)) {
            throw new IllegalArgumentException("the date " + day + " is before the date of birth " + birth);
        }
        long whole = ChronoUnit.YEARS.between(birth, day);
        LocalDate last = birth.plusYears(whole);
        LocalDate next = birth.plusYears(whole + 1);
        return whole + (double) ChronoUnit.DAYS.between(last, day) / ChronoUnit.DAYS.between(last, next);
    }
}
