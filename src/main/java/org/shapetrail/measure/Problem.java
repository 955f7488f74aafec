package org.shapetrail.measure;

import java.util.Objects;

/**
 * One reason why an entered value cannot be used, worded for the practitioner: it names the site, the
 * value as entered and what to do.
 *
 * @param site the site concerned, or null for a problem of the whole visit
 * @param kind what is wrong
 * @param message the sentence shown to a person
 */
public record Problem(Site site, ProblemKind kind, String message) {
    public Problem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
        if (message.isBlank()) {
            throw new IllegalArgumentException("a problem needs a message");
        }
    }

    @Override
    public String toString() {
        return message;
    }
}
