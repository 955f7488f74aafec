package org.shapetrail.letters;

import java.time.LocalDate;
import java.util.Objects;

/**
 * What the sender chooses for a batch of letters.
 *
 * @param academy the academy's name, at the head of the letter
 * @param sender who signs
 * @param senderRole e.g. "Academy physiotherapist"
 * @param contact how to reach the sender
 * @param from first day of the period
 * @param to last day of the period
 * @param skinfoldsForUnder16 whether skinfold thickness (endomorphy) is described for juniors under 16
 */
public record LetterSettings(String academy, String sender, String senderRole, String contact, LocalDate from,
                             LocalDate to, boolean skinfoldsForUnder16) {
    public LetterSettings {
        Objects.requireNonNull(academy);
        Objects.requireNonNull(sender);
        Objects.requireNonNull(senderRole);
        Objects.requireNonNull(contact);
        Objects.requireNonNull(from);
        Objects.requireNonNull(to);
        if (to.isBefore(from)) {
            throw new IllegalArgumentException("the period ends before it starts");
        }
    }
}
