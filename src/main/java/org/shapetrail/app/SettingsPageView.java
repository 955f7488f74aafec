package org.shapetrail.app;

import static org.shapetrail.i18n.Messages.tr;

import java.util.Map;
import javafx.geometry.Insets;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.Separator;
import javafx.scene.control.Spinner;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.shapetrail.growth.GrowthAlert;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.i18n.Messages;
import org.shapetrail.measure.Site;
import org.shapetrail.noise.BiologicalVariation;
import org.shapetrail.somatotype.EndomorphyVariant;

/**
 * The settings: the window's language (applied at once, the open page kept), then the analysis settings:
 * the rapid-growth threshold, body mass day-to-day variation, the endomorphy form (shown as they are now).
 */
final class SettingsPageView {
    private final VBox root;

    SettingsPageView(WorkbenchContext ctx) {
        AnalysisSettings now = ctx.vm.settings();
        Spinner<Double> threshold = new Spinner<>(3.0, 15.0, now.alert().thresholdCmPerYear(), 0.5);
        threshold.setId("alert-threshold");
        threshold.setEditable(true);
        Spinner<Double> mass = new Spinner<>(0.0, 3.0, now.biological().sd(Site.BODY_MASS), 0.1);
        mass.setId("mass-variation");
        mass.setEditable(true);
        for (Spinner<Double> s : java.util.List.of(threshold, mass)) {
            s.getValueFactory().setConverter(new javafx.util.converter.DoubleStringConverter() {
                private final java.text.NumberFormat f = java.text.NumberFormat.getNumberInstance(ctx.locale);

                @Override
                public String toString(Double v) {
                    return v == null ? "" : f.format(v);
                }

                @Override
                public Double fromString(String text) {
                    try {
                        return text == null || text.isBlank() ? null : f.parse(text.strip()).doubleValue();
                    } catch (java.text.ParseException e) {
                        return s.getValue(); // not a number: the value stays as it was
                    }
                }
            });
        }
        CheckBox uncorrected = new CheckBox(tr("settings.uncorrected"));
        uncorrected.setWrapText(true);
        uncorrected.setId("uncorrected-endomorphy");
        uncorrected.setSelected(now.endomorphy() == EndomorphyVariant.UNCORRECTED);
        Button apply = new Button(tr("settings.apply"));
        apply.setId("recompute");
        apply.setOnAction(e -> {
            AnalysisSettings s = ctx.vm.settings();
            ctx.vm.recompute(new AnalysisSettings(uncorrected.isSelected() ? EndomorphyVariant.UNCORRECTED
                    : EndomorphyVariant.HEIGHT_CORRECTED, s.defaults(),
                    new BiologicalVariation(Map.of(Site.BODY_MASS, mass.getValue())),
                    new GrowthAlert(threshold.getValue())));
        });
        ComboBox<String> language = new ComboBox<>();
        language.setId("window-language");
        language.getItems().add(Languages.SYSTEM);
        language.getItems().addAll(Messages.LANGUAGES);
        language.setConverter(new StringConverter<>() {
            @Override
            public String toString(String code) {
                if (code == null) {
                    return "";
                }
                return code.equals(Languages.SYSTEM) ? tr("settings.language.system", Languages.nameOf(Messages.languageOf(
                        Languages.system()))) : Languages.nameOf(code);
            }

            @Override
            public String fromString(String s) {
                return null;
            }
        });
        language.setValue(Languages.chosen());
        language.valueProperty().addListener((o, a, b) -> {
            if (b != null && !b.equals(a)) {
                ctx.speak(Languages.choose(b));
            }
        });
        Label note = new Label(tr("settings.language.note"));
        note.getStyleClass().add("hint");
        note.setWrapText(true);
        root = new VBox(10, new Label(tr("settings.language")), language, note, new Separator(),
                new Label(tr("settings.threshold")), threshold,
                new Label(tr("settings.mass")), mass,
                uncorrected, apply);
        root.setPadding(new Insets(12));
    }

    Parent root() {
        return root;
    }
}
