package org.shapetrail.noise;

import java.util.EnumMap;
import java.util.Map;
import org.shapetrail.measure.Site;

/**
 * Optional day-to-day biological variation per site (for example body mass with hydration), as a
 * standard deviation in the site's unit, added by the user on top of measurement error.
 */
public final class BiologicalVariation {
    private static final BiologicalVariation NONE = new BiologicalVariation(Map.of());
    private final Map<Site, Double> sd;

    public BiologicalVariation(Map<Site, Double> sd) {
        this.sd = sd.isEmpty() ? Map.of() : new EnumMap<>(sd);
        this.sd.forEach((s, v) -> {
            if (!(v >= 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException(s.label() + ": biological variation must be zero or more");
            }
        });
    }

    public static BiologicalVariation none() {
        return NONE;
    }

    /** SD at the site, 0 when none is set. */
    public double sd(Site site) {
        return sd.getOrDefault(site, 0.0);
    }

    public boolean isNone() {
        return sd.isEmpty() || sd.values().stream().allMatch(v -> v == 0);
    }
}
