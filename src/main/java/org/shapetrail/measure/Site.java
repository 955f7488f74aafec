package org.shapetrail.measure;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * The vocabulary of measurement sites, in ISAK measurement order, each with its unit and the range of
 * values plausible for a person from about age six to a heavy adult.
 *
 * <p>The ten sites the Heath-Carter somatotype needs are here together with the other common ISAK
 * sites, so that visits can record them without a change to the core.
 */
public enum Site {
    BODY_MASS("body_mass", "Body mass", SiteKind.MASS, 15.0, 250.0),
    STATURE("stature", "Stature", SiteKind.LENGTH, 90.0, 230.0),
    SITTING_HEIGHT("sitting_height", "Sitting height", SiteKind.LENGTH, 45.0, 130.0),
    ARM_SPAN("arm_span", "Arm span", SiteKind.LENGTH, 85.0, 250.0),
    TRICEPS("triceps", "Triceps skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    SUBSCAPULAR("subscapular", "Subscapular skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    BICEPS("biceps", "Biceps skinfold", SiteKind.SKINFOLD, 1.5, 80.0),
    ILIAC_CREST("iliac_crest", "Iliac crest skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    SUPRASPINALE("supraspinale", "Supraspinale skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    ABDOMINAL("abdominal", "Abdominal skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    FRONT_THIGH("front_thigh", "Front thigh skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    MEDIAL_CALF("medial_calf", "Medial calf skinfold", SiteKind.SKINFOLD, 2.0, 80.0),
    ARM_RELAXED("arm_relaxed", "Arm girth (relaxed)", SiteKind.GIRTH, 12.0, 60.0),
    ARM_FLEXED("arm_flexed", "Arm girth (flexed and tensed)", SiteKind.GIRTH, 12.0, 65.0),
    WAIST("waist", "Waist girth", SiteKind.GIRTH, 40.0, 200.0),
    HIP("hip", "Hip girth", SiteKind.GIRTH, 50.0, 200.0),
    CALF("calf", "Calf girth", SiteKind.GIRTH, 18.0, 65.0),
    HUMERUS("humerus", "Humerus breadth", SiteKind.BREADTH, 3.5, 11.0),
    FEMUR("femur", "Femur breadth", SiteKind.BREADTH, 5.5, 15.0);

    private final String code;
    private final String label;
    private final SiteKind kind;
    private final double minPlausible;
    private final double maxPlausible;

    Site(String code, String label, SiteKind kind, double minPlausible, double maxPlausible) {
        this.code = code;
        this.label = label;
        this.kind = kind;
        this.minPlausible = minPlausible;
        this.maxPlausible = maxPlausible;
    }

    /** Stable lower-case identifier used in files and the database, e.g. "medial_calf". */
    public String code() {
        return code;
    }

    /** The name a practitioner reads, e.g. "Medial calf skinfold". */
    public String label() {
        return label;
    }

    /**
     * The name in the reader's language (the trade's names in Spanish and Portuguese); {@link #label} stays
     * the English one that files and the CSV formats use.
     */
    public String shown() {
        return org.shapetrail.i18n.Messages.tr("site." + code);
    }

    public SiteKind kind() {
        return kind;
    }

    /** The unit the site is stored and computed in. */
    public Unit unit() {
        return switch (kind) {
            case MASS -> Unit.KG;
            case SKINFOLD -> Unit.MM;
            case LENGTH, GIRTH, BREADTH -> Unit.CM;
        };
    }

    /** Smallest plausible value, in {@link #unit()}. */
    public double minPlausible() {
        return minPlausible;
    }

    /** Largest plausible value, in {@link #unit()}. */
    public double maxPlausible() {
        return maxPlausible;
    }

    /** True when {@code value} (in the site's unit) lies inside the plausible range, ends included. */
    public boolean isPlausible(double value) {
        return value >= minPlausible && value <= maxPlausible;
    }

    /** The site with this code, ignoring case and surrounding blanks. */
    public static Optional<Site> byCode(String code) {
        if (code == null) {
            return Optional.empty();
        }
        String wanted = code.trim().toLowerCase(Locale.ROOT);
        return Arrays.stream(values()).filter(s -> s.code.equals(wanted)).findFirst();
    }
}
