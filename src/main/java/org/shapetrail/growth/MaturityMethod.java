package org.shapetrail.growth;

/** Published equations for maturity offset (years from peak height velocity). */
public enum MaturityMethod {
    /** Mirwald et al. 2002, Med Sci Sports Exerc 34:689; needs sitting height. SEE about 0.59 y (boys), 0.57 y (girls). */
    MIRWALD_2002("Mirwald et al. 2002"),
    /** Moore et al. 2015, Med Sci Sports Exerc 47:1755; boys need sitting height, girls stature. */
    MOORE_2015("Moore et al. 2015");

    private final String citation;

    MaturityMethod(String citation) {
        this.citation = citation;
    }

    public String citation() {
        return citation;
    }
}
