package org.shapetrail.app;

import org.shapetrail.growth.MaturityStatus;
import org.shapetrail.noise.ChangeVerdict;

/**
 * One line of the people list.
 *
 * @param age decimal age at the latest visit (NaN without visits)
 * @param change the change over the list's period (the latest change by default), or null without two
 *     rated visits in it
 * @param changeFrom the first visit's day of that change, or null
 * @param changeTo the second visit's day of that change, or null
 * @param velocity latest stature velocity, cm/year (NaN when unknown)
 * @param velocitySe its standard error, cm/year (NaN when unknown)
 * @param shortInterval true when that velocity rests on less than six months
 * @param rapidGrowth the rapid-growth alert (from a velocity over six months or more)
 * @param maturity maturity status, or null (adults, missing sites)
 */
public record PersonRow(long id, String name, String squad, double age, String rating, String category,
                        ChangeVerdict change, java.time.LocalDate changeFrom, java.time.LocalDate changeTo,
                        double velocity, double velocitySe, boolean shortInterval, boolean rapidGrowth,
                        MaturityStatus maturity) {
    /** The shown noise multiple of the change (NaN without one), for sorting. */
    public double multiple() {
        return change == null ? Double.NaN : change.shownMultiple();
    }

    /** The verdict of the change, or null. */
    public org.shapetrail.noise.Verdict verdict() {
        return change == null ? null : change.verdict();
    }
}
