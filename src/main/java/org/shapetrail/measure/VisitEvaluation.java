package org.shapetrail.measure;

import java.util.Collections;
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
        finalValues = frozen(Objects.requireNonNull(finalValues));
        outcomes = frozen(Objects.requireNonNull(outcomes));
        problems = List.copyOf(Objects.requireNonNull(problems));
    }

    /** An unmodifiable copy kept as an EnumMap: far cheaper than a general immutable map for a few sites. */
    private static <V> Map<Site, V> frozen(Map<Site, V> m) {
        EnumMap<Site, V> copy;
        if (m instanceof EnumMap<Site, V> e) {
            copy = e.clone();
        } else {
            copy = new EnumMap<>(Site.class);
            copy.putAll(m);
        }
        if (copy.containsValue(null)) {
            throw new NullPointerException("a site without a value");
        }
        return Collections.unmodifiableMap(copy);
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
