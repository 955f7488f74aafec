package org.shapetrail.measure;

/** What is wrong with an entered value; each kind has its own wording in {@link Problem#message()}. */
public enum ProblemKind {
    MISSING,
    NOT_A_NUMBER,
    NOT_POSITIVE,
    OUT_OF_RANGE,
    LIKELY_METRES,
    LIKELY_INCHES,
    LIKELY_CENTIMETRES,
    LIKELY_MILLIMETRES,
    LIKELY_POUNDS,
    LIKELY_GRAMS,
    THIRD_TRIAL_NEEDED,
    TOO_MANY_TRIALS,
    INCONSISTENT,
    IMPOSSIBLE_DATE,
    UNUSABLE_TEXT
}
