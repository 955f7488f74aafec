package org.shapetrail.groups;

import java.util.List;
import org.shapetrail.somatotype.RatingSummary;

/**
 * What a training block did to a group: before and after summaries, the SAD between the means, per
 * component paired tests with effect sizes, the multivariate test of the mean change, and how many
 * athletes changed beyond noise.
 *
 * @param hotelling one-sample T² on the changes (null when there are too few athletes)
 * @param beyondNoise number of athletes whose own change is beyond noise
 */
public record BlockResult(int n, RatingSummary before, RatingSummary after, double sadBetweenMeans,
                          List<ComponentTest> components, Hotelling.Result hotelling, int beyondNoise) {
}
