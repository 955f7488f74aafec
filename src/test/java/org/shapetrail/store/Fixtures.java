package org.shapetrail.store;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.List;
import org.shapetrail.measure.Sex;
import org.shapetrail.measure.Site;
import org.shapetrail.measure.SiteTrials;

/** Small, fixed test data (invented; no expected value is derived from it except by the code under test). */
final class Fixtures {
    private Fixtures() {
    }

    /** A full Heath-Carter visit with duplicate trials, all within the ISAK tolerance. */
    static List<SiteTrials> fullTrials() {
        return List.of(
                SiteTrials.of(Site.BODY_MASS, 72.0, 72.1),
                SiteTrials.of(Site.STATURE, 178.0, 178.2),
                SiteTrials.of(Site.SITTING_HEIGHT, 92.4, 92.6),
                SiteTrials.of(Site.TRICEPS, 9.0, 9.2),
                SiteTrials.of(Site.SUBSCAPULAR, 10.0, 10.2),
                SiteTrials.of(Site.SUPRASPINALE, 7.0, 7.2),
                SiteTrials.of(Site.MEDIAL_CALF, 8.0, 8.2),
                SiteTrials.of(Site.ARM_FLEXED, 33.0, 33.1),
                SiteTrials.of(Site.CALF, 37.0, 37.1),
                SiteTrials.of(Site.HUMERUS, 7.0, 7.0),
                SiteTrials.of(Site.FEMUR, 9.8, 9.8, 9.9));
    }

    static Person person(String name) {
        return Person.draft(name, Sex.FEMALE, LocalDate.of(2011, 2, 28));
    }

    static Visit visit(long personId, long measurerId, LocalDateTime when) {
        return new Visit(0, personId, when, measurerId, "pre-season", "", fullTrials());
    }
}
