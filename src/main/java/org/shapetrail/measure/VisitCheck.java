package org.shapetrail.measure;

import static org.shapetrail.i18n.Messages.tr;

import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * Checks all trials of a visit at once: each trial value against its site's range and unit mistakes, the
 * ISAK repeat rule per site, then the combinations of final values. Collects every problem.
 */
public final class VisitCheck {
    private VisitCheck() {
    }

    /** Evaluates the trials of one visit; at most one {@link SiteTrials} per site. */
    public static VisitEvaluation evaluate(Collection<SiteTrials> trials) {
        Map<Site, SiteTrials> bySite = new EnumMap<>(Site.class);
        List<Problem> problems = new ArrayList<>();
        for (SiteTrials t : trials) {
            if (bySite.put(t.site(), t) != null) {
                problems.add(new Problem(t.site(), ProblemKind.TOO_MANY_TRIALS,
                        tr("check.twice", t.site().shown())));
            }
        }
        Map<Site, Double> finals = new EnumMap<>(Site.class);
        Map<Site, RepeatOutcome> outcomes = new EnumMap<>(Site.class);
        for (SiteTrials t : bySite.values()) {
            boolean allValid = true;
            for (int i = 0; i < t.values().size(); i++) {
                var p = MeasurementCheck.check(t.site(), t.values().get(i));
                if (p.isPresent()) {
                    allValid = false;
                    Problem raw = p.get();
                    String prefix = t.values().size() > 1 ? tr("check.trial", i + 1) : "";
                    problems.add(new Problem(raw.site(), raw.kind(), prefix + raw.message()));
                }
            }
            if (!allValid) {
                continue;
            }
            RepeatOutcome outcome = RepeatRule.apply(t);
            outcomes.put(t.site(), outcome);
            if (outcome.status() == RepeatOutcome.Status.THIRD_TRIAL_NEEDED) {
                problems.add(new Problem(t.site(), ProblemKind.THIRD_TRIAL_NEEDED,
                        tr("check.third", t.site().shown(), Numbers.asEntered(t.values().get(0)),
                                Numbers.asEntered(t.values().get(1)), Numbers.oneDecimal(outcome.differencePercent()),
                                Numbers.asEntered(t.site().kind().repeatTolerancePercent()))));
            } else {
                finals.put(t.site(), outcome.value().getAsDouble());
            }
        }
        problems.addAll(MeasurementCheck.checkCombinations(finals));
        problems.sort((a, b) -> Integer.compare(order(a), order(b)));
        return new VisitEvaluation(finals, outcomes, problems);
    }

    private static int order(Problem p) {
        return p.site() == null ? Integer.MAX_VALUE : p.site().ordinal();
    }
}
