package org.shapetrail.measure;

import java.time.LocalDate;
import java.util.Optional;

/**
 * The rule for a visit's date, the same for the entry form, the import and the store: a visit lies on or
 * after the person's date of birth and not after today (a date in the future is a typing slip, such as
 * 2099 for 2009, never a measurement).
 */
public final class VisitDate {
    private VisitDate() {
    }

    /**
     * The problem with {@code day}, if any.
     *
     * @param birth the person's date of birth, or null when not known yet (only the future is checked)
     * @param today the day it is now where the tool runs
     */
    public static Optional<Problem> check(LocalDate birth, LocalDate day, LocalDate today) {
        if (day.isAfter(today)) {
            return Optional.of(new Problem(null, ProblemKind.IMPOSSIBLE_DATE, org.shapetrail.i18n.Messages.tr(
                    "check.date.future", day, today)));
        }
        if (birth != null && day.isBefore(birth)) {
            return Optional.of(new Problem(null, ProblemKind.IMPOSSIBLE_DATE, org.shapetrail.i18n.Messages.tr(
                    "check.date.beforeBirth", day, birth)));
        }
        return Optional.empty();
    }
}
