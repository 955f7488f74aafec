package org.shapetrail.app;

/** Age bands of the people filter, by age at the latest visit. */
public enum AgeBand {
    ALL(0, 200),
    JUNIORS(0, 18),
    UNDER_12(0, 12),
    FROM_12_TO_13(12, 14),
    FROM_14_TO_15(14, 16),
    FROM_16_TO_17(16, 18),
    ADULT(18, 200);

    private final double from;
    private final double below;

    AgeBand(double from, double below) {
        this.from = from;
        this.below = below;
    }

    public boolean contains(double age) {
        return this == ALL || (age >= from && age < below);
    }

    @Override
    public String toString() {
        return org.shapetrail.i18n.Messages.tr("ageband." + name());
    }
}
