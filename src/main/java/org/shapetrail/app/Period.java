package org.shapetrail.app;

import java.time.LocalDate;
import java.time.Month;
import java.time.format.DateTimeFormatter;
import java.time.format.FormatStyle;
import java.util.Locale;
import java.util.Objects;

/**
 * The span the people list's change column covers: the latest change (between the last two rated
 * visits), this season, the last twelve months, since a date, or between two dates — each person's first
 * rated visit on or after the start against their last on or before the end.
 *
 * @param from first day (null for LATEST)
 * @param to last day (null for LATEST)
 */
public record Period(Kind kind, LocalDate from, LocalDate to) {
    /** The choices of the period. */
    public enum Kind {
        LATEST, SEASON, YEAR, SINCE, BETWEEN;

        @Override
        public String toString() {
            return org.shapetrail.i18n.Messages.tr("period." + name());
        }
    }

    /** The month a season starts in: August, as in most European football and rowing calendars (common practice). */
    public static final Month SEASON_START = Month.AUGUST;

    public Period {
        Objects.requireNonNull(kind, "kind");
        if (kind != Kind.LATEST && (from == null || to == null)) {
            throw new IllegalArgumentException("a period needs its first and last day");
        }
        if (from != null && to != null && to.isBefore(from)) {
            throw new IllegalArgumentException("a period cannot end before it starts");
        }
    }

    public static final Period LATEST = new Period(Kind.LATEST, null, null);

    /** The season that holds {@code today}: from the last 1 August up to today. */
    public static Period season(LocalDate today) {
        LocalDate start = LocalDate.of(today.getMonthValue() >= SEASON_START.getValue() ? today.getYear()
                : today.getYear() - 1, SEASON_START, 1);
        return new Period(Kind.SEASON, start, today);
    }

    public static Period lastYear(LocalDate today) {
        return new Period(Kind.YEAR, today.minusYears(1), today);
    }

    /** The column's header, e.g. "Latest change" or "Change since 1 Aug 2026". */
    public String header(Locale locale) {
        DateTimeFormatter f = DateTimeFormatter.ofLocalizedDate(FormatStyle.MEDIUM).withLocale(locale);
        return switch (kind) {
            case LATEST -> org.shapetrail.i18n.Messages.tr("period.LATEST");
            case SEASON, YEAR, SINCE -> org.shapetrail.i18n.Messages.tr("period.header.since", from.format(f));
            case BETWEEN -> org.shapetrail.i18n.Messages.tr("period.header.between", from.format(f), to.format(f));
        };
    }
}
