package org.shapetrail.groups;

import java.util.List;
import org.shapetrail.somatotype.RatingSummary;

/**
 * Two independent groups compared: their summaries, the SAD between their means, per-component Welch
 * t-tests, and the two-sample Hotelling T² (null when there are too few people).
 */
public record GroupComparison(RatingSummary first, RatingSummary second, double sadBetweenMeans,
                              List<ComponentTest> components, Hotelling.Result hotelling) {
}
