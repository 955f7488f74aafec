package org.shapetrail.app;

import org.shapetrail.growth.MaturityStatus;
import org.shapetrail.noise.Verdict;

/**
 * One line of the people list.
 *
 * @param age decimal age at the latest visit (NaN without visits)
 * @param velocity latest stature velocity, cm/year (NaN when unknown)
 * @param latestSad SAD of the latest change (NaN without one)
 * @param latestMultiple shown noise multiple of the latest change (NaN without one)
 * @param verdict verdict of the latest change, or null
 * @param maturity maturity status, or null (adults, missing sites)
 */
public record PersonRow(long id, String name, String squad, double age, String rating, String category,
                        double latestSad, double latestMultiple, Verdict verdict, double velocity, boolean rapidGrowth,
                        MaturityStatus maturity) {
}
