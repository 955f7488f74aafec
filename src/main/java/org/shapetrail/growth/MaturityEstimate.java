package org.shapetrail.growth;

import java.util.Locale;
import java.util.Objects;

/**
 * A maturity-offset estimate with what a reader must know about it.
 *
 * @param method the equation used
 * @param offsetYears years from PHV (negative before)
 * @param ageAtPhv estimated age at PHV = age − offset
 * @param seeYears the published standard error of estimate, years
 * @param status pre / circa / post PHV
 * @param timing early / on time / late against the reference mean ± 1 year
 */
public record MaturityEstimate(MaturityMethod method, double offsetYears, double ageAtPhv, double seeYears,
                               MaturityStatus status, MaturityTiming timing) {
    /** The caution shown with every estimate, in the reader's language. */
    public static String caution() {
        return org.shapetrail.i18n.Messages.tr("maturity.caution");
    }

    public MaturityEstimate {
        Objects.requireNonNull(method);
        Objects.requireNonNull(status);
        Objects.requireNonNull(timing);
    }

    /** E.g. "circa-PHV, offset −0.4 y (± 0.59), age at PHV 13.9 (Mirwald et al. 2002)". */
    public String summary() {
        Locale l = org.shapetrail.i18n.Messages.current();
        return org.shapetrail.i18n.Messages.tr("maturity.summary", status.words(), String.format(l, "%+.1f", offsetYears),
                String.format(l, "%.2f", seeYears), String.format(l, "%.1f", ageAtPhv), method.citation());
    }
}
