package org.shapetrail.store;

import java.time.LocalDateTime;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;

/**
 * One measurement session of one person: who measured, when, in what context, and the raw trials per
 * site in the site's unit.
 *
 * @param id database id, 0 before the visit is saved
 * @param context a label such as "pre-season"
 */
public record Visit(long id, long personId, LocalDateTime measuredAt, long measurerId, String context, String notes,
                    List<SiteTrials> trials) {
    public Visit {
        Objects.requireNonNull(measuredAt, "measuredAt");
        context = context == null ? "" : context;
        notes = notes == null ? "" : notes;
        trials = List.copyOf(Objects.requireNonNull(trials, "trials"));
    }

    public Visit withId(long newId) {
        return new Visit(newId, personId, measuredAt, measurerId, context, notes, trials);
    }

    public Visit withContext(String newContext) {
        return new Visit(id, personId, measuredAt, measurerId, newContext, notes, trials);
    }

    /** Number of trial values over all sites. */
    public int trialCount() {
        return trials.stream().mapToInt(t -> t.values().size()).sum();
    }

    /** The trials of one site, if measured. */
    public Optional<SiteTrials> trialsAt(Site site) {
        return trials.stream().filter(t -> t.site() == site).findFirst();
    }
}
