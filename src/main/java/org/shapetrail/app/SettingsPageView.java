package org.shapetrail.app;

import java.util.Map;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.Label;
import javafx.scene.control.Spinner;
import javafx.scene.layout.VBox;
import org.shapetrail.growth.GrowthAlert;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.BiologicalVariation;
import org.shapetrail.somatotype.EndomorphyVariant;

/** The analysis settings: the rapid-growth threshold, body mass day-to-day variation, the endomorphy form. */
final class SettingsPageView {
    private final VBox root;

    SettingsPageView(WorkbenchContext ctx) {
        Spinner<Double> threshold = new Spinner<>(3.0, 15.0, GrowthAlert.DEFAULT_CM_PER_YEAR, 0.5);
        threshold.setId("alert-threshold");
        threshold.setEditable(true);
        Spinner<Double> mass = new Spinner<>(0.0, 3.0, AnalysisSettings.DEFAULT_MASS_DAY_TO_DAY_KG, 0.1);
        mass.setId("mass-variation");
        mass.setEditable(true);
        CheckBox uncorrected = new CheckBox("Endomorphy from the skinfold sum without the height correction"
                + " (170.18 / stature); the usual form has it");
        uncorrected.setId("uncorrected-endomorphy");
        Button apply = new Button("Recompute with these settings");
        apply.setId("recompute");
        apply.setOnAction(e -> {
            AnalysisSettings s = ctx.vm.settings();
            ctx.vm.recompute(new AnalysisSettings(uncorrected.isSelected() ? EndomorphyVariant.UNCORRECTED
                    : EndomorphyVariant.HEIGHT_CORRECTED, s.defaults(),
                    new BiologicalVariation(Map.of(Site.BODY_MASS, mass.getValue())),
                    new GrowthAlert(threshold.getValue())));
        });
        root = new VBox(10,
                new Label("Rapid-growth alert above (cm per year; common practice 7)"), threshold,
                new Label("Body mass day-to-day variation added to measurement error (kg; 0 to leave out)"), mass,
                uncorrected, apply);
        root.setPadding(new Insets(12));
    }

    Parent root() {
        return root;
    }
}
