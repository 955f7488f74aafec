package org.shapetrail.store;

/** How a rater's somatotype rating of a visit was obtained. */
public enum RatingMethod {
    PHOTOGRAPHS("photographs"),
    IN_PERSON("in person"),
    CRITERION("criterion");

    private final String code;

    RatingMethod(String code) {
        this.code = code;
    }

    public String code() {
        return code;
    }

    public static RatingMethod ofCode(String code) {
        for (RatingMethod m : values()) {
            if (m.code.equals(code)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown rating method " + code);
    }
}
