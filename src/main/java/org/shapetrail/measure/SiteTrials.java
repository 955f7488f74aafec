package org.shapetrail.measure;

import java.util.List;
import java.util.Objects;

/**
 * The trials taken at one site in one visit, in the order taken, in the site's unit.
 *
 * @param site the site
 * @param values one to three trial values, as entered (validated separately by {@link MeasurementCheck})
 */
public record SiteTrials(Site site, List<Double> values) {
    public static final int MAX_TRIALS = 3;

    public SiteTrials {
        Objects.requireNonNull(site, "site");
        values = List.copyOf(Objects.requireNonNull(values, "values"));
        if (values.isEmpty() || values.size() > MAX_TRIALS) {
            throw new IllegalArgumentException(site.label() + ": between 1 and 3 trials, not " + values.size());
        }
    }

    public static SiteTrials of(Site site, double... values) {
        return new SiteTrials(site, java.util.Arrays.stream(values).boxed().toList());
    }
}
