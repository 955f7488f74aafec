package org.shapetrail.history;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shapetrail.growth.ObservedPhv;
import org.shapetrail.noise.Verdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.Person;
import org.shapetrail.store.demo.DemoAcademy;

/**
 * What the analyses find in the demo database, against what it was built with ({@link DemoAcademy#plan()}).
 * The expected values are the generator's own parameters, not numbers typed in here.
 */
class DemoAcademyFindingsTest {
    @TempDir
    static Path dir;

    static HistoryBuilder builder;
    static DemoAcademy.Plan plan;

    @BeforeAll
    static void load() throws Exception {
        Path f = dir.resolve("demo.sqlite");
        DemoAcademy.generate(f);
        try (Database db = Database.open(f)) {
            builder = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
        }
        plan = DemoAcademy.plan();
    }

    private Person byName(String name) {
        return builder.academy().people().stream().filter(p -> p.displayName().equals(name)).findFirst().orElseThrow();
    }

    @Test
    void seniorsBuiltToChangeAreBeyondNoiseAndTheOthersMostlyWithin() {
        int changersFound = 0;
        int changers = 0;
        int stillWithin = 0;
        int still = 0;
        for (DemoAcademy.SeniorPlan sp : plan.seniors()) {
            if (sp.missesPostBlockVisit()) {
                continue;
            }
            PersonHistory h = builder.history(byName(sp.name()));
            Verdict v = h.latestChange().orElseThrow().verdict().verdict();
            if (sp.builtToChange()) {
                changers++;
                changersFound += v == Verdict.BEYOND_NOISE ? 1 : 0;
            } else {
                still++;
                stillWithin += v != Verdict.BEYOND_NOISE ? 1 : 0;
            }
        }
        assertEquals(changers, changersFound, "every athlete built to change is found");
        // "mostly within noise" (issue text): at least two thirds. With a 5 % false-positive rate and 11 athletes
        // one flag is expected; breadths read to 0.1 cm make a careful measurer's small changes jump in steps.
        assertTrue(3 * stillWithin >= 2 * still, stillWithin + " of " + still + " unchanged athletes are not flagged");
    }

    @Test
    void juniorsWhoseSpurtFallsInsideTheRecordAreFoundNearTheirGeneratedAge() {
        List<String> misses = new ArrayList<>();
        int inside = 0;
        int found = 0;
        for (DemoAcademy.JuniorPlan jp : plan.juniors()) {
            Person p = byName(jp.name());
            PersonHistory h = builder.history(p);
            double first = h.visits().get(0).ageYears();
            double last = h.visits().get(h.visits().size() - 1).ageYears();
            double truth = jp.ageAtPhv();
            ObservedPhv.Result r = h.growth().observedPhv();
            if (truth > first + 0.5 && truth < last - 0.5) {
                inside++;
                if (r.status() == ObservedPhv.Status.FOUND) {
                    found++;
                    if (Math.abs(r.ageAtPeak() - truth) > 0.5) {
                        misses.add(jp.name() + ": found " + r.ageAtPeak() + ", built " + truth);
                    }
                }
            }
        }
        assertTrue(inside >= 8, inside + " juniors pass their spurt well inside the record");
        assertTrue(found >= inside * 0.7, found + " of " + inside + " spurts found");
        assertTrue(misses.isEmpty(), "ages at PHV within 0.5 years of the generating curve: " + misses);
    }

    @Test
    void aPredictedAdultStatureGivesThePercentReachedAndItsBand() {
        Person p = builder.academy().people().stream().filter(x -> x.predictedAdultStatureCm() != null).findFirst()
                .orElseThrow();
        PersonHistory h = builder.history(p);
        double stature = h.latest().orElseThrow().value(org.shapetrail.measure.Site.STATURE).orElseThrow();
        // percent = stature / predicted × 100 (derived); bands < 85, 85–90, 90–95, > 95 % (common practice)
        assertEquals(stature / p.predictedAdultStatureCm() * 100, h.growth().percentOfPredicted(), 1e-9);
        assertEquals(org.shapetrail.growth.TargetHeight.Band.of(h.growth().percentOfPredicted()), h.growth().band());
    }

    @Test
    void legLengthVelocityIsStatureVelocityLessSittingHeightVelocity() {
        // derived: leg length = stature − sitting height, both over the same interval here (every demo visit
        // has both), so the velocities subtract
        PersonHistory h = builder.history(byName("Zeb Thistlewood"));
        var g = h.growth();
        assertEquals(g.latestVelocity().perYear() - g.otherVelocities().get("sitting height").perYear(),
                g.otherVelocities().get("leg length").perYear(), 1e-9);
        assertTrue(g.otherVelocities().containsKey("body mass"));
    }
}
