package org.shapetrail.noise;

import java.util.EnumMap;
import java.util.Map;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteKind;

/**
 * Relative TEMs used for a measurer's site when they have fewer than {@link #minPeople()} people with
 * repeats there. The built-in values sit at the accredited targets (skinfolds 5 %, other measures 1 %;
 * stature, sitting height, arm span and mass 0.3 %; common practice), so a verdict made with them errs
 * on the side of "within noise".
 */
public final class DefaultErrors {
    /** People with repeats needed before a measurer's own TEM is used (about 20; issue text, common practice). */
    public static final int MIN_PEOPLE = 20;

    private final Map<SiteKind, Double> relativePercent;
    private final int minPeople;

    public DefaultErrors(Map<SiteKind, Double> relativePercent, int minPeople) {
        this.relativePercent = new EnumMap<>(relativePercent);
        for (SiteKind k : SiteKind.values()) {
            Double v = this.relativePercent.get(k);
            if (v == null || !(v > 0) || v > 50) {
                throw new IllegalArgumentException("a default relative TEM for " + k + " must be in (0, 50] %");
            }
        }
        if (minPeople < 2) {
            throw new IllegalArgumentException("at least two people are needed for a TEM");
        }
        this.minPeople = minPeople;
    }

    /** The built-in defaults. */
    public static DefaultErrors standard() {
        Map<SiteKind, Double> m = new EnumMap<>(SiteKind.class);
        m.put(SiteKind.SKINFOLD, 5.0);
        m.put(SiteKind.GIRTH, 1.0);
        m.put(SiteKind.BREADTH, 1.0);
        m.put(SiteKind.LENGTH, 0.3);
        m.put(SiteKind.MASS, 0.3);
        return new DefaultErrors(m, MIN_PEOPLE);
    }

    public int minPeople() {
        return minPeople;
    }

    public double relativePercent(SiteKind kind) {
        return relativePercent.get(kind);
    }

    /** The default error of a site; defaults are relative only, so the absolute TEM is given as 0. */
    public SiteError forSite(Site site) {
        return new SiteError(site, 0, relativePercent(site.kind()), 0, true);
    }
}
