package org.shapetrail.store;

import java.time.LocalDate;
import java.util.Objects;
import org.shapetrail.measure.Sex;

/**
 * A person followed over time.
 *
 * @param id database id, 0 before the person is saved
 * @param fatherStatureCm father's stature in cm, or null when not recorded
 * @param motherStatureCm mother's stature in cm, or null when not recorded
 * @param predictedAdultStatureCm a predicted adult stature entered from another method, cm, or null
 */
public record Person(long id, String displayName, Sex sex, LocalDate birthDate, Double fatherStatureCm,
                     Double motherStatureCm, String notes, Consent consent, Double predictedAdultStatureCm,
                     String letterLanguage) {
    /** The languages a letter can be written in; "" is the desk's own. */
    public static final java.util.List<String> LETTER_LANGUAGES = java.util.List.of("", "en", "es", "pt");

    /** A person whose letters are in the desk's language. */
    public Person(long id, String displayName, Sex sex, LocalDate birthDate, Double fatherStatureCm,
                  Double motherStatureCm, String notes, Consent consent, Double predictedAdultStatureCm) {
        this(id, displayName, sex, birthDate, fatherStatureCm, motherStatureCm, notes, consent, predictedAdultStatureCm,
                "");
    }

    public Person {
        letterLanguage = letterLanguage == null ? "" : letterLanguage;
        if (!LETTER_LANGUAGES.contains(letterLanguage)) {
            throw new IllegalArgumentException("letter language \"" + letterLanguage + "\" is not one of en, es, pt"
                    + " (or empty for the desk's language)");
        }
        Objects.requireNonNull(displayName, "displayName");
        if (displayName.isBlank()) {
            throw new IllegalArgumentException("a person needs a name");
        }
        Objects.requireNonNull(sex, "sex");
        Objects.requireNonNull(birthDate, "birthDate");
        notes = notes == null ? "" : notes;
        consent = consent == null ? Consent.NONE : consent;
        parentStature("father's stature", fatherStatureCm);
        parentStature("mother's stature", motherStatureCm);
        parentStature("predicted adult stature", predictedAdultStatureCm);
    }

    private static void parentStature(String what, Double cm) {
        if (cm != null && (!Double.isFinite(cm) || cm < 120 || cm > 230)) {
            throw new IllegalArgumentException(what + " " + cm + " cm is outside 120–230 cm; enter it in cm");
        }
    }

    /** A person not yet saved. */
    public static Person draft(String displayName, Sex sex, LocalDate birthDate) {
        return new Person(0, displayName, sex, birthDate, null, null, "", Consent.NONE, null);
    }

    public Person withId(long newId) {
        return new Person(newId, displayName, sex, birthDate, fatherStatureCm, motherStatureCm, notes, consent,
                predictedAdultStatureCm, letterLanguage);
    }

    public Person withConsent(Consent c) {
        return new Person(id, displayName, sex, birthDate, fatherStatureCm, motherStatureCm, notes, c,
                predictedAdultStatureCm, letterLanguage);
    }

    public Person withParents(Double fatherCm, Double motherCm) {
        return new Person(id, displayName, sex, birthDate, fatherCm, motherCm, notes, consent, predictedAdultStatureCm,
                letterLanguage);
    }

    public Person withPredictedAdultStature(Double cm) {
        return new Person(id, displayName, sex, birthDate, fatherStatureCm, motherStatureCm, notes, consent, cm,
                letterLanguage);
    }

    /** The same person with letters in another language ("" for the desk's). */
    public Person withLetterLanguage(String language) {
        return new Person(id, displayName, sex, birthDate, fatherStatureCm, motherStatureCm, notes, consent,
                predictedAdultStatureCm, language);
    }
}
