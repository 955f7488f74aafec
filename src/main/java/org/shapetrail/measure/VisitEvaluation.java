package org.shapetrail.measure;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * The outcome of checking every trial of a visit: the final value per site where one exists, every
 * problem found (not only the first), and the sites that still need a third trial.
 *
 * @param finalValues final value per site, in the site's unit, for sites without problems
 * @param outcomes the repeat-rule outcome per site whose trials were all valid
 * @param problems every problem, in measurement order
 */
public record VisitEvaluation(Map<Site, Double> finalValues, Map<Site, RepeatOutcome> outcomes,
                              List<Problem> problems) {
    public VisitEvaluation {
        finalValues = Map.copyOf(Objects.requireNonNull(finalValues));
        outcomes = Map.copyOf(Objects.requireNonNull(outcomes));
        problems = List.copyOf(Objects.requireNonNull(problems));
    }

    /** True when the visit can be saved: no problem of any kind. */
    public boolean isValid() {
        return problems.isEmpty();
    }

    /** The sites whose first two trials call for a third. */
    public Set<Site> thirdTrialNeeded() {
        EnumMap<Site, Boolean> m = new EnumMap<>(Site.class);
        outcomes.forEach((s, o) -> {
            if (o.status() == RepeatOutcome.Status.THIRD_TRIAL_NEEDED) {
                m.put(s, true);
            }
        });
        return m.keySet();
    }
}
