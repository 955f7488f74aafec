package org.shapetrail.exchange;

import java.util.Objects;
import org.shapetrail.measure.Site;

/**
 * What one CSV column holds, as the mapping step decided (or the user corrected).
 *
 * @param header the header as in the file
 * @param role what it is
 * @param site for SITE_VALUE and the long layout's values, the site (else null)
 * @param trial 1–3 for a trial column, 0 for a final value
 * @param unit the unit the column is in (converted to the site's unit on import), or null for the site's own
 */
public record Column(String header, Role role, Site site, int trial, InputUnit unit) {
    /** The roles a column can have. */
    public enum Role {
        PERSON_ID, NAME, BIRTH_DATE, SEX,
        /** the language of the person's letters: en, es, pt, or empty for the desk's */
        LETTER_LANGUAGE,
        DATE, TIME, MEASURER, CONTEXT,
        /** wide layout: a site's trial or final value */
        SITE_VALUE,
        /** long layout: which site the row's value is */
        SITE_NAME,
        /** long layout: trial number */
        TRIAL_NUMBER,
        /** long layout: the value */
        VALUE,
        /** long layout: the value's unit */
        UNIT,
        IGNORED
    }

    public Column {
        Objects.requireNonNull(header);
        Objects.requireNonNull(role);
        if (role == Role.SITE_VALUE && site == null) {
            throw new IllegalArgumentException("a site column needs its site");
        }
    }
}
