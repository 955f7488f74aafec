package org.shapetrail.exchange;

import java.util.Locale;
import java.util.Optional;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteKind;

/**
 * Units a spreadsheet column may declare, with the explicit conversion into a site's own unit. A column
 * without a declared unit is taken in the site's unit; the core's unit-mistake checks then still apply.
 */
public enum InputUnit {
    MM("mm", 0.1),
    CM("cm", 1),
    M("m", 100),
    INCH("in", 2.54),
    KG("kg", 1),
    LB("lb", 1 / 2.2046226218),
    G("g", 0.001);

    private final String symbol;
    /** Factor into cm (lengths) or kg (mass). */
    private final double factor;

    InputUnit(String symbol, double factor) {
        this.symbol = symbol;
        this.factor = factor;
    }

    public String symbol() {
        return symbol;
    }

    public static Optional<InputUnit> parse(String s) {
        String t = s.strip().toLowerCase(Locale.ROOT);
        return switch (t) {
            case "mm" -> Optional.of(MM);
            case "cm" -> Optional.of(CM);
            case "m" -> Optional.of(M);
            case "in", "inch", "inches" -> Optional.of(INCH);
            case "kg" -> Optional.of(KG);
            case "lb", "lbs", "pound", "pounds" -> Optional.of(LB);
            case "g" -> Optional.of(G);
            default -> Optional.empty();
        };
    }

    /** True when this unit can be turned into the site's unit. */
    public boolean fits(Site site) {
        boolean mass = this == KG || this == LB || this == G;
        return (site.kind() == SiteKind.MASS) == mass;
    }

    /** The value converted into the site's unit (mm for skinfolds, cm for other lengths, kg for mass). */
    public double toSiteUnit(double v, Site site) {
        if (!fits(site)) {
            throw new IllegalArgumentException(symbol + " is not a unit of " + site.label());
        }
        if (symbol.equals(site.unit().symbol())) {
            return v; // the site's own unit: the value as written, no rounding through another unit
        }
        if (site.kind() == SiteKind.MASS) {
            return v * factor;
        }
        double cm = v * factor;
        return site.kind() == SiteKind.SKINFOLD ? cm * 10 : cm;
    }
}
