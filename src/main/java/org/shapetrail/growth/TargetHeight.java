package org.shapetrail.growth;

import org.shapetrail.measure.Sex;

/**
 * Adult stature targets: the mid-parent target height (Tanner et al. 1970) and the share of a predicted
 * adult stature already attained, with the usual bio-banding bands (common practice).
 */
public final class TargetHeight {
    private TargetHeight() {
    }

    /** (father + mother + 13) / 2 for boys, (father + mother − 13) / 2 for girls, cm. */
    public static double midParent(Sex sex, double fatherCm, double motherCm) {
        return (fatherCm + motherCm + (sex == Sex.MALE ? 13 : -13)) / 2;
    }

    /** Stature as percent of an adult target. */
    public static double percentAttained(double statureCm, double adultCm) {
        if (!(adultCm > 0)) {
            throw new IllegalArgumentException("the adult stature must be positive");
        }
        return statureCm / adultCm * 100;
    }

    /** Bio-banding bands by percent of predicted adult stature (common practice). */
    public enum Band {
        BELOW_85("below 85 % (pre-pubertal)"),
        FROM_85_TO_90("85–90 % (early pubertal)"),
        FROM_90_TO_95("90–95 % (mid-pubertal, around the growth spurt)"),
        ABOVE_95("above 95 % (late pubertal)");

        private final String words;

        Band(String words) {
            this.words = words;
        }

        /** The band in the reader's language. */
        public String shown() {
            return org.shapetrail.i18n.Messages.tr("band." + name());
        }

        public String words() {
            return words;
        }

        public static Band of(double percent) {
            if (percent < 85) {
                return BELOW_85;
            }
            if (percent < 90) {
                return FROM_85_TO_90;
            }
            if (percent <= 95) {
                return FROM_90_TO_95;
            }
            return ABOVE_95;
        }
    }
}
