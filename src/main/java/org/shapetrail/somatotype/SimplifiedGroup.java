package org.shapetrail.somatotype;

/** The four simplified somatotype groups. */
public enum SimplifiedGroup {
    CENTRAL("central"),
    ENDOMORPH("endomorph"),
    MESOMORPH("mesomorph"),
    ECTOMORPH("ectomorph");

    private final String word;

    SimplifiedGroup(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }
}
