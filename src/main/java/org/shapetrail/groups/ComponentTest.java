package org.shapetrail.groups;

import org.shapetrail.somatotype.Component;

/**
 * A per-component t-test with its effect size.
 *
 * @param meanDifference mean change (paired) or difference of means (independent), later/first − earlier/second
 * @param t the t statistic
 * @param df degrees of freedom (Welch–Satterthwaite for independent groups)
 * @param pValue two-sided p-value
 * @param effectSize Cohen's d: dz = mean change / SD of changes (paired), or difference / pooled SD
 * @param effectLow lower end of its approximate 95 % confidence interval
 * @param effectHigh upper end
 */
public record ComponentTest(Component component, double meanDifference, double t, double df, double pValue,
                            double effectSize, double effectLow, double effectHigh) {
}
