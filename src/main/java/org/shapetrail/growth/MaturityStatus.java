package org.shapetrail.growth;

/** Where a junior stands relative to peak height velocity: offset below −1, −1 to +1, above +1 years (common practice). */
public enum MaturityStatus {
    PRE_PHV("pre-PHV"),
    CIRCA_PHV("circa-PHV"),
    POST_PHV("post-PHV");

    private final String words;

    MaturityStatus(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    public static MaturityStatus of(double offsetYears) {
        if (offsetYears < -1) {
            return PRE_PHV;
        }
        if (offsetYears > 1) {
            return POST_PHV;
        }
        return CIRCA_PHV;
    }
}
