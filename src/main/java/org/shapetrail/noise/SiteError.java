package org.shapetrail.noise;

import java.util.Objects;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteKind;

/**
 * A measurer's repeatability at one site: the standard deviation of a single trial (the TEM), and where
 * the figure comes from.
 *
 * @param site the site
 * @param temAbsolute TEM in the site's unit (for skinfolds: at the mean value of the measurer's subjects)
 * @param temRelativePercent TEM as percent of the mean
 * @param people number of people behind the figure (0 for defaults)
 * @param fromDefaults true when the measurer had too few repeats and the configured default was used
 */
public record SiteError(Site site, double temAbsolute, double temRelativePercent, int people, boolean fromDefaults) {
    public SiteError {
        Objects.requireNonNull(site, "site");
        if (!(temAbsolute >= 0) || !(temRelativePercent >= 0)) {
            throw new IllegalArgumentException("TEM must be a non-negative number");
        }
    }

    /**
     * SD of a single trial for a person whose value is {@code value}: skinfold error is proportional to
     * the fold's thickness, so skinfolds use the relative TEM; every other site uses the absolute TEM.
     * Defaults are relative for every site.
     */
    public double singleTrialSd(double value) {
        if (site.kind() == SiteKind.SKINFOLD || fromDefaults) {
            return temRelativePercent / 100 * value;
        }
        return temAbsolute;
    }
}
