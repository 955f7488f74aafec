package org.shapetrail.somatotype;

/** The 13 somatotype categories (Carter &amp; Heath 1990), named as the command line writes them. */
public enum Category {
    CENTRAL("central"),
    BALANCED_ENDOMORPH("balanced endomorph"),
    MESOMORPHIC_ENDOMORPH("mesomorphic endomorph"),
    ECTOMORPHIC_ENDOMORPH("ectomorphic endomorph"),
    MESOMORPH_ENDOMORPH("mesomorph-endomorph"),
    BALANCED_MESOMORPH("balanced mesomorph"),
    ENDOMORPHIC_MESOMORPH("endomorphic mesomorph"),
    ECTOMORPHIC_MESOMORPH("ectomorphic mesomorph"),
    MESOMORPH_ECTOMORPH("mesomorph-ectomorph"),
    BALANCED_ECTOMORPH("balanced ectomorph"),
    MESOMORPHIC_ECTOMORPH("mesomorphic ectomorph"),
    ENDOMORPHIC_ECTOMORPH("endomorphic ectomorph"),
    ENDOMORPH_ECTOMORPH("endomorph-ectomorph");

    private final String displayName;

    Category(String displayName) {
        this.displayName = displayName;
    }

    /** Lower-case name, e.g. "ectomorphic mesomorph". */
    /** The category in the reader's language ({@link #displayName} stays English for the CSV formats). */
    public String shown() {
        return org.shapetrail.i18n.Messages.tr("category." + name());
    }

    public String displayName() {
        return displayName;
    }

    @Override
    public String toString() {
        return displayName;
    }
}
