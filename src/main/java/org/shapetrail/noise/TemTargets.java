package org.shapetrail.noise;

import org.shapetrail.measure.SiteKind;

/**
 * The usual accreditation targets for a measurer's intra-measurer relative TEM (common practice, quoted
 * from memory in DESIGN.md §3): skinfolds ≤ 5 % (≤ 7.5 % at entry level), every other measure ≤ 1 %
 * (≤ 1.5 % at entry level).
 */
public final class TemTargets {
    private TemTargets() {
    }

    /** How a relative TEM stands against the targets. */
    public enum Standing {
        WITHIN_TARGET("within target"),
        ENTRY_LEVEL_ONLY("within the entry-level target only"),
        OUTSIDE("outside the targets");

        private final String words;

        Standing(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }

        /** The standing in the reader's language. */
        public String shown() {
            return org.shapetrail.i18n.Messages.tr("tem." + name());
        }
    }

    /** Target for an accredited measurer, percent. */
    public static double target(SiteKind kind) {
        return kind == SiteKind.SKINFOLD ? 5.0 : 1.0;
    }

    /** Target at entry level, percent. */
    public static double entryLevel(SiteKind kind) {
        return kind == SiteKind.SKINFOLD ? 7.5 : 1.5;
    }

    public static Standing standing(SiteKind kind, double relativeTemPercent) {
        if (relativeTemPercent <= target(kind)) {
            return Standing.WITHIN_TARGET;
        }
        if (relativeTemPercent <= entryLevel(kind)) {
            return Standing.ENTRY_LEVEL_ONLY;
        }
        return Standing.OUTSIDE;
    }
}
