package org.shapetrail.somatotype;

import java.util.List;
import java.util.Objects;

/**
 * Summary of a set of ratings: the mean rating and SAM (mean SAD of each rating from it), the mean chart
 * point and SDI (mean SDD of each point from it).
 *
 * @param n number of ratings (at least one)
 * @param meanRating component-wise mean
 * @param sam somatotype attitudinal mean; 0 for a single rating
 * @param meanPoint mean of the chart points (equal to the chart point of the mean rating)
 * @param sdi somatotype dispersion index; 0 for a single rating
 */
public record RatingSummary(int n, Rating meanRating, double sam, ChartPoint meanPoint, double sdi) {
    public RatingSummary {
        Objects.requireNonNull(meanRating);
        Objects.requireNonNull(meanPoint);
        if (n < 1) {
            throw new IllegalArgumentException("a summary needs at least one rating");
        }
    }

    /**
     * Summarises the ratings.
     *
     * @throws IllegalArgumentException for an empty list
     */
    public static RatingSummary of(List<Rating> ratings) {
        if (ratings.isEmpty()) {
            throw new IllegalArgumentException("a summary needs at least one rating");
        }
        int n = ratings.size();
        double en = 0;
        double me = 0;
        double ec = 0;
        double x = 0;
        double y = 0;
        for (Rating r : ratings) {
            en += r.endomorphy();
            me += r.mesomorphy();
            ec += r.ectomorphy();
            ChartPoint p = r.chartPoint();
            x += p.x();
            y += p.y();
        }
        Rating mean = new Rating(en / n, me / n, ec / n);
        ChartPoint meanPoint = new ChartPoint(x / n, y / n);
        double sam = 0;
        double sdi = 0;
        for (Rating r : ratings) {
            sam += Distances.sad(r, mean);
            sdi += Distances.sdd(r.chartPoint(), meanPoint);
        }
        return new RatingSummary(n, mean, sam / n, meanPoint, sdi / n);
    }
}
