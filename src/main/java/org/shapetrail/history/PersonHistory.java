package org.shapetrail.history;

import java.util.List;
import java.util.Optional;
import org.shapetrail.noise.ChangeVerdict;
import org.shapetrail.store.Person;

/**
 * A person's record as a practitioner reads it: every visit computed, the change between consecutive
 * rated visits and from first to last with their verdicts, and their growth.
 *
 * @param changes change into each rated visit from the previous rated one (one fewer than rated visits)
 * @param firstToLast change from the first to the last rated visit, or null with fewer than two
 */
public record PersonHistory(Person person, List<VisitResult> visits, List<Change> changes, ChangeVerdict firstToLast,
                            GrowthSummary growth) {
    /** The change from one visit to the next rated one. */
    public record Change(VisitResult from, VisitResult to, ChangeVerdict verdict) {
    }

    public PersonHistory {
        visits = List.copyOf(visits);
        changes = List.copyOf(changes);
    }

    public List<VisitResult> rated() {
        return visits.stream().filter(v -> v.somatotype() != null).toList();
    }

    public Optional<VisitResult> latest() {
        return visits.isEmpty() ? Optional.empty() : Optional.of(visits.get(visits.size() - 1));
    }

    /** The change into the latest rated visit. */
    public Optional<Change> latestChange() {
        return changes.isEmpty() ? Optional.empty() : Optional.of(changes.get(changes.size() - 1));
    }

    /** The change into a given visit, if it has one. */
    public Optional<Change> changeInto(long visitId) {
        return changes.stream().filter(c -> c.to().visit().id() == visitId).findFirst();
    }
}
