package org.shapetrail.chart;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.chart.png.PngRenderer;
import org.shapetrail.docs.Screenshots;
import org.shapetrail.history.Academy;
import org.shapetrail.history.AnalysisSettings;
import org.shapetrail.history.HistoryBuilder;
import org.shapetrail.history.PersonHistory;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.Verdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * The guide's picture of a change against its noise limit is true to the verdict: on every consecutive
 * change of the sample academy, a step that leaves the drawn shadow is beyond noise. Writes the pictures
 * of a short step called beyond noise and a longer one within it for docs/guide.md.
 */
class NoiseLimitPictureTest {
    static HistoryBuilder builder;

    @BeforeAll
    static void load() throws Exception {
        Path f = Files.createTempDirectory("noise-picture").resolve("demo.sqlite");
        DemoAcademy.generate(f);
        try (Database db = Database.open(f)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
    }

    static ComponentCovariance combined(PersonHistory.Change c) {
        return c.from().covariance().plus(c.to().covariance());
    }

    @Test
    void aStepOutsideTheShadowIsAlwaysBeyondNoise() throws Exception {
        int outside = 0;
        int insideButBeyond = 0;
        PersonHistory.Change shortBeyond = null;
        PersonHistory.Change longWithin = null;
        for (var p : builder.academy().people()) {
            for (PersonHistory.Change c : builder.history(p).changes()) {
                if (SomatochartBuilder.leavesNoiseShadow(c.verdict(), combined(c))) {
                    // the shadow holds the projection of the whole 3D noise ellipsoid (derived)
                    assertTrue(c.verdict().verdict() == Verdict.BEYOND_NOISE, p.displayName() + " " + c.verdict());
                    outside++;
                } else if (c.verdict().verdict() == Verdict.BEYOND_NOISE) {
                    insideButBeyond++;
                }
                if (SomatochartBuilder.leavesNoiseShadow(c.verdict(), combined(c))
                        && (shortBeyond == null || c.verdict().sad() < shortBeyond.verdict().sad())) {
                    shortBeyond = c;
                }
                if (c.verdict().verdict() == Verdict.WITHIN_NOISE
                        && (longWithin == null || c.verdict().sad() > longWithin.verdict().sad())) {
                    longWithin = c;
                }
            }
        }
        assertTrue(outside > 0, "steps leaving the shadow: " + outside + ", beyond inside it: " + insideButBeyond);
        assertTrue(shortBeyond != null && longWithin != null);
        write(shortBeyond, "noise-limit-short-step-beyond.png");
        write(longWithin, "noise-limit-long-step-within.png");
        // the guide quotes these two (docs/guide.md, "Trusting a verdict")
        System.out.println(caption(shortBeyond) + "\n" + caption(longWithin));
    }

    static String caption(PersonHistory.Change c) {
        var v = c.verdict();
        return String.format(Locale.UK, "%s: SAD %.2f, %s× noise limit, %s (SAD alone would need %.2f)",
                c.from().visit().measuredAt().toLocalDate(), v.sad(), v.multipleText(Locale.UK), v.verdict().words(),
                v.sadNoise95());
    }

    static void write(PersonHistory.Change c, String name) throws Exception {
        ChartModel m = new SomatochartBuilder(caption(c), Locale.UK).withoutLegend().changeAgainstNoise(c.verdict(), combined(c),
                c.from().visit().measuredAt().toLocalDate().toString(), c.to().visit().measuredAt().toLocalDate()
                        .toString()).buildAroundData(3.2, 300);
        try (OutputStream out = Files.newOutputStream(Screenshots.folder().resolve(name))) {
            PngRenderer.write(m, 340, 320, 2, out);
        }
    }
}
