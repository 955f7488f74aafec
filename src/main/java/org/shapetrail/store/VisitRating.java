package org.shapetrail.store;

import java.util.Objects;
import org.shapetrail.somatotype.Rating;

/** A rater's visual or criterion rating of a visit, kept beside the anthropometric one. */
public record VisitRating(long visitId, Rating rating, String rater, RatingMethod method) {
    public VisitRating {
        Objects.requireNonNull(rating, "rating");
        Objects.requireNonNull(method, "method");
        if (rater == null || rater.isBlank()) {
            throw new IllegalArgumentException("a rating needs the rater's name");
        }
    }
}
