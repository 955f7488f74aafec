package org.shapetrail.measure;

/** Sex as recorded for the sex-specific growth and maturity equations. */
public enum Sex {
    FEMALE("F"),
    MALE("M");

    private final String code;

    Sex(String code) {
        this.code = code;
    }

    /** "F" or "M", as stored. */
    public String code() {
        return code;
    }

    public static Sex ofCode(String code) {
        for (Sex s : values()) {
            if (s.code.equalsIgnoreCase(code.strip())) {
                return s;
            }
        }
        throw new IllegalArgumentException("sex must be F or M, not " + code);
    }
}
