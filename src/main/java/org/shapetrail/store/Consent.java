package org.shapetrail.store;

/**
 * What a person (or, for a minor, their parent) has agreed to. Photographs stay off unless
 * {@code photographs} is recorded.
 */
public record Consent(boolean measurement, boolean photographs, boolean shareWithParent) {
    public static final Consent NONE = new Consent(false, false, false);
    public static final Consent MEASUREMENT_AND_SHARING = new Consent(true, false, true);
}
