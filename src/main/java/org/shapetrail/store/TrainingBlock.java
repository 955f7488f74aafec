package org.shapetrail.store;

import java.time.LocalDate;
import java.util.Map;
import java.util.Objects;

/**
 * A training block of a squad, from its first to its last day, with its aim and, for members whose
 * before and after visits were chosen by hand, those visits (the others take the default: the nearest
 * rated visit up to the start and from the end).
 *
 * @param picks chosen visits by person id
 */
public record TrainingBlock(long id, String name, long squadId, LocalDate startsOn, LocalDate endsOn, String aim,
                            Map<Long, Pick> picks) {
    /** The visits chosen to stand for one member's before and after. */
    public record Pick(long beforeVisitId, long afterVisitId) {
        public Pick {
            if (beforeVisitId == afterVisitId) {
                throw new IllegalArgumentException("the same visit cannot stand for both the before and the after");
            }
        }
    }

    public TrainingBlock {
        Objects.requireNonNull(startsOn, "startsOn");
        Objects.requireNonNull(endsOn, "endsOn");
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a training block needs a name");
        }
        if (endsOn.isBefore(startsOn)) {
            throw new IllegalArgumentException("a training block cannot end before it starts");
        }
        aim = aim == null ? "" : aim;
        picks = Map.copyOf(picks == null ? Map.of() : picks);
    }

    /** A block without an aim or chosen visits. */
    public TrainingBlock(long id, String name, long squadId, LocalDate startsOn, LocalDate endsOn) {
        this(id, name, squadId, startsOn, endsOn, "", Map.of());
    }

    public TrainingBlock withId(long newId) {
        return new TrainingBlock(newId, name, squadId, startsOn, endsOn, aim, picks);
    }
}
