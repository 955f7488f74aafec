package org.shapetrail.history;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.somatotype.Somatotype;
import org.shapetrail.store.Measurer;
import org.shapetrail.store.Visit;

/**
 * One visit with everything computed from its raw trials.
 *
 * @param ageYears decimal age on the day
 * @param finalValues final value per site (repeat rule applied)
 * @param somatotype the rating, or null when the visit lacks a Heath-Carter site
 * @param missing why there is no somatotype (empty when there is one)
 * @param covariance measurement covariance of the rating (ZERO when there is no rating)
 * @param basis whose repeatability the covariance rests on, in words
 * @param standardErrors SE of each final value
 */
public record VisitResult(Visit visit, Measurer measurer, double ageYears, Map<Site, Double> finalValues,
                          Somatotype somatotype, List<Problem> missing, ComponentCovariance covariance, String basis,
                          Map<Site, Double> standardErrors) {
    public VisitResult {
        finalValues = Map.copyOf(finalValues);
        missing = List.copyOf(missing);
        standardErrors = Map.copyOf(standardErrors);
    }

    public Optional<Somatotype> rating() {
        return Optional.ofNullable(somatotype);
    }

    public Optional<Double> value(Site site) {
        return Optional.ofNullable(finalValues.get(site));
    }
}
