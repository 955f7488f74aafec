package org.shapetrail.measure;

/** Units in which Shapetrail stores and computes measurements; each site has exactly one. */
public enum Unit {
    CM("cm"),
    MM("mm"),
    KG("kg");

    private final String symbol;

    Unit(String symbol) {
        this.symbol = symbol;
    }

    /** The symbol written after a number, e.g. "cm". */
    public String symbol() {
        return symbol;
    }
}
