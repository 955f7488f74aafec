package org.shapetrail.store;

import java.time.LocalDate;
import java.util.Objects;

/** A person's membership of a squad from {@code joinedOn} to {@code leftOn} (null while still a member). */
public record Membership(long personId, long squadId, LocalDate joinedOn, LocalDate leftOn) {
    public Membership {
        Objects.requireNonNull(joinedOn, "joinedOn");
        if (leftOn != null && leftOn.isBefore(joinedOn)) {
            throw new IllegalArgumentException("a membership cannot end before it starts");
        }
    }

    /** True when the person was a member on that day. */
    public boolean covers(LocalDate day) {
        return !day.isBefore(joinedOn) && (leftOn == null || !day.isAfter(leftOn));
    }
}
