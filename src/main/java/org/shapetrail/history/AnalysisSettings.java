package org.shapetrail.history;

import java.util.Objects;
import org.shapetrail.growth.GrowthAlert;
import org.shapetrail.noise.BiologicalVariation;
import org.shapetrail.noise.DefaultErrors;
import org.shapetrail.somatotype.EndomorphyVariant;

/** The user's choices that change computed results. */
public record AnalysisSettings(EndomorphyVariant endomorphy, DefaultErrors defaults, BiologicalVariation biological,
                               GrowthAlert alert) {
    public AnalysisSettings {
        Objects.requireNonNull(endomorphy);
        Objects.requireNonNull(defaults);
        Objects.requireNonNull(biological);
        Objects.requireNonNull(alert);
    }

    /**
     * Body mass varies by about half a kilogram from day to day with hydration and meals (common
     * practice, from memory); the standard settings add it so that an unchanged athlete weighed on
     * another day is not called changed. The user can change or remove it.
     */
    public static final double DEFAULT_MASS_DAY_TO_DAY_KG = 0.5;

    public static AnalysisSettings standard() {
        return new AnalysisSettings(EndomorphyVariant.HEIGHT_CORRECTED, DefaultErrors.standard(),
                new BiologicalVariation(java.util.Map.of(org.shapetrail.measure.Site.BODY_MASS,
                        DEFAULT_MASS_DAY_TO_DAY_KG)), GrowthAlert.standard());
    }
}
