package org.shapetrail.somatotype;

/** The three components of the somatotype, in the order ratings are written (endo-meso-ecto). */
public enum Component {
    ENDOMORPHY("endomorphy", "endomorph", "endomorphic"),
    MESOMORPHY("mesomorphy", "mesomorph", "mesomorphic"),
    ECTOMORPHY("ectomorphy", "ectomorph", "ectomorphic");

    private final String label;
    private final String noun;
    private final String adjective;

    Component(String label, String noun, String adjective) {
        this.label = label;
        this.noun = noun;
        this.adjective = adjective;
    }

    /** "endomorphy" */
    public String label() {
        return label;
    }

    /** The component's name in the reader's language ("endomorfia"). */
    public String shown() {
        return org.shapetrail.i18n.Messages.tr("component." + label);
    }

    /** "endomorph", as used for the dominant component of a category name. */
    public String noun() {
        return noun;
    }

    /** "endomorphic", as used for the second component of a category name. */
    public String adjective() {
        return adjective;
    }
}
