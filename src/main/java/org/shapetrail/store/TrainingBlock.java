package org.shapetrail.store;

import java.time.LocalDate;
import java.util.Objects;

/** A training block of a squad, from its first to its last day. */
public record TrainingBlock(long id, String name, long squadId, LocalDate startsOn, LocalDate endsOn) {
    public TrainingBlock {
        Objects.requireNonNull(startsOn, "startsOn");
        Objects.requireNonNull(endsOn, "endsOn");
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a training block needs a name");
        }
        if (endsOn.isBefore(startsOn)) {
            throw new IllegalArgumentException("a training block cannot end before it starts");
        }
    }
}
