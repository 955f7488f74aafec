package org.shapetrail.exchange;

import org.shapetrail.measure.DecimalStyle;

/**
 * The user's choices for an import.
 *
 * @param decimals the decimal separator, or null to follow the delimiter (semicolon: comma)
 * @param monthFirst read 03/04/2024 as 4 March (US order) instead of 3 April
 * @param createMissing create people and measurers not yet in the file (otherwise their rows are rejected)
 */
public record ImportOptions(DecimalStyle decimals, boolean monthFirst, boolean createMissing) {
    public static ImportOptions standard() {
        return new ImportOptions(null, false, false);
    }
}
