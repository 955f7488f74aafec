package org.shapetrail.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class VisitCheckTest {
    @Test
    void everyProblemOfTheVisitIsCollectedNotOnlyTheFirst() {
        VisitEvaluation ev = VisitCheck.evaluate(List.of(
                SiteTrials.of(Site.STATURE, 1.78, 1.78),
                SiteTrials.of(Site.TRICEPS, 10.0, 11.0),
                SiteTrials.of(Site.HUMERUS, 68, 6.8)));
        assertEquals(List.of(ProblemKind.LIKELY_METRES, ProblemKind.LIKELY_METRES, ProblemKind.THIRD_TRIAL_NEEDED,
                ProblemKind.LIKELY_MILLIMETRES), ev.problems().stream().map(Problem::kind).toList());
        assertEquals("Trial 1: Humerus breadth 68 looks like millimetres; enter 6.8 cm.",
                ev.problems().get(3).message());
        assertEquals(Set.of(Site.TRICEPS), ev.thirdTrialNeeded());
        assertEquals(Map.of(), ev.finalValues());
    }

    @Test
    void thirdTrialMessageNamesTheTrialsAndTheTolerance() {
        // 10.0 and 11.0 mm: 1.0 / 10.5 = 9.5 % (derived), tolerance 5 % (ISAK, common practice)
        VisitEvaluation ev = VisitCheck.evaluate(List.of(SiteTrials.of(Site.TRICEPS, 10.0, 11.0)));
        assertEquals("Triceps skinfold trials 10 and 11 differ by 9.5 % (more than 5 %); take a third trial.",
                ev.problems().get(0).message());
    }

    @Test
    void validTrialsGiveFinalValues() {
        VisitEvaluation ev = VisitCheck.evaluate(List.of(
                SiteTrials.of(Site.STATURE, 170.0, 170.5),
                SiteTrials.of(Site.TRICEPS, 10.0, 11.0, 10.2)));
        assertEquals(Map.of(Site.STATURE, 170.25, Site.TRICEPS, 10.2), ev.finalValues());
        assertEquals(List.of(), ev.problems());
    }
}
