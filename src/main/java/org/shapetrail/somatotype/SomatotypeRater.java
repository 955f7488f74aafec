package org.shapetrail.somatotype;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import org.shapetrail.measure.Problem;
import org.shapetrail.measure.ProblemKind;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;
import org.shapetrail.measure.VisitCheck;
import org.shapetrail.measure.VisitEvaluation;

/**
 * Rates a visit: checks every value, applies the repeat rule, and computes the Heath-Carter somatotype
 * only when nothing is wrong and all ten sites are present. Never yields a number from a flagged value.
 */
public final class SomatotypeRater {
    private SomatotypeRater() {
    }

    /**
     * A somatotype or the reasons there is none.
     *
     * @param somatotype the result, or null when {@code problems} is not empty
     * @param evaluation the visit's checked values
     * @param problems every problem, including missing sites
     */
    public record Outcome(Somatotype somatotype, VisitEvaluation evaluation, List<Problem> problems) {
        public Outcome {
            problems = List.copyOf(problems);
            if ((somatotype == null) == problems.isEmpty()) {
                throw new IllegalArgumentException("a somatotype exists exactly when there is no problem");
            }
        }

        public boolean rated() {
            return somatotype != null;
        }
    }

    /** Rates a visit from its trials. */
    public static Outcome rate(Collection<SiteTrials> trials, EndomorphyVariant variant) {
        VisitEvaluation ev = VisitCheck.evaluate(trials);
        List<Problem> problems = new ArrayList<>(ev.problems());
        for (Site s : HeathCarterInput.missingSites(ev.finalValues())) {
            boolean reported = problems.stream().anyMatch(p -> p.site() == s);
            if (!reported) {
                problems.add(new Problem(s, ProblemKind.MISSING,
                        org.shapetrail.i18n.Messages.tr("check.missing", s.shown(), s.unit().symbol())));
            }
        }
        if (!problems.isEmpty()) {
            return new Outcome(null, ev, problems);
        }
        return new Outcome(HeathCarter.rate(HeathCarterInput.fromFinalValues(ev.finalValues()), variant), ev,
                List.of());
    }

    /** Rates final values (one value per site, no repeats). */
    public static Outcome rateFinalValues(Map<Site, Double> values, EndomorphyVariant variant) {
        List<SiteTrials> trials = values.entrySet().stream()
                .map(e -> SiteTrials.of(e.getKey(), e.getValue())).toList();
        return rate(trials, variant);
    }
}
