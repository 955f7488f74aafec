package org.shapetrail.history;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shapetrail.noise.Verdict;
import org.shapetrail.store.Database;
import org.shapetrail.store.demo.DemoAcademy;

/** The demo training block, against how it was built ({@link DemoAcademy#plan()}). */
class BlockReviewTest {
    static BlockReview review;
    static DemoAcademy.Plan plan;

    @BeforeAll
    static void load() throws Exception {
        Path f = Files.createTempDirectory("block").resolve("demo.sqlite");
        DemoAcademy.generate(f);
        try (Database db = Database.open(f)) {
            HistoryBuilder b = HistoryBuilder.of(Academy.load(db), AnalysisSettings.standard());
            review = BlockReview.of(b, b.academy().blocks().stream().filter(x -> x.name().equals(org.shapetrail.store.demo.DemoAcademy.BLOCK_NAME)).findFirst().orElseThrow(), BlockReview.DEFAULT_WINDOW_DAYS);
        }
        plan = DemoAcademy.plan();
    }

    @Test
    void membersWithoutBothVisitsAreListedByNameWithTheReason() {
        Set<String> expected = plan.seniors().stream().filter(DemoAcademy.SeniorPlan::missesPostBlockVisit)
                .map(DemoAcademy.SeniorPlan::name).collect(Collectors.toSet());
        assertEquals(expected, review.missing().stream().map(m -> m.person().displayName()).collect(Collectors.toSet()));
        assertTrue(review.missing().get(0).reason().startsWith("no rated visit in the 21 days from the end"));
        assertEquals(20 - expected.size(), review.athletes().size());
    }

    @Test
    void theAthletesBuiltToChangeAreFoundBeyondNoise() {
        Set<String> built = plan.seniors().stream().filter(s -> s.builtToChange() && !s.missesPostBlockVisit())
                .map(DemoAcademy.SeniorPlan::name).collect(Collectors.toSet());
        Set<String> beyond = review.athletes().stream().filter(a -> a.change().verdict() == Verdict.BEYOND_NOISE)
                .map(a -> a.person().displayName()).collect(Collectors.toSet());
        assertTrue(beyond.containsAll(built), "built to change " + built + ", found " + beyond);
        List<String> extra = beyond.stream().filter(n -> !built.contains(n)).toList();
        assertTrue(extra.size() <= 2, "at most two unchanged athletes flagged: " + extra);
        assertEquals(beyond.size(), review.result().beyondNoise());
        // the group's mean mesomorphy rose: the changers gained about 0.8 (generator), diluted by the others
        assertTrue(review.result().components().get(1).meanDifference() > 0.2);
        assertTrue(review.result().hotelling().pValue() < 0.05);
    }
}
