package org.shapetrail.somatotype;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.shapetrail.measure.Site;

/**
 * The ten final measurement values the Heath-Carter anthropometric somatotype needs, units in the names.
 * All values must be finite and positive; plausibility is checked earlier, by
 * {@link org.shapetrail.measure.MeasurementCheck}.
 */
public record HeathCarterInput(double statureCm, double massKg, double tricepsMm, double subscapularMm,
                               double supraspinaleMm, double medialCalfMm, double humerusBreadthCm,
                               double femurBreadthCm, double armFlexedGirthCm, double calfGirthCm) {
    /** The sites this input is made of, in the order of the record components. */
    public static final List<Site> SITES = List.of(Site.STATURE, Site.BODY_MASS, Site.TRICEPS, Site.SUBSCAPULAR,
            Site.SUPRASPINALE, Site.MEDIAL_CALF, Site.HUMERUS, Site.FEMUR, Site.ARM_FLEXED, Site.CALF);

    public HeathCarterInput {
        positive("stature", statureCm);
        positive("body mass", massKg);
        positive("triceps skinfold", tricepsMm);
        positive("subscapular skinfold", subscapularMm);
        positive("supraspinale skinfold", supraspinaleMm);
        positive("medial calf skinfold", medialCalfMm);
        positive("humerus breadth", humerusBreadthCm);
        positive("femur breadth", femurBreadthCm);
        positive("arm flexed girth", armFlexedGirthCm);
        positive("calf girth", calfGirthCm);
    }

    private static void positive(String name, double v) {
        if (!Double.isFinite(v) || v <= 0) {
            throw new IllegalArgumentException(name + " must be a finite positive number, not " + v);
        }
    }

    /** The sites among {@link #SITES} that {@code finalValues} lacks, in that order. */
    public static List<Site> missingSites(Map<Site, Double> finalValues) {
        List<Site> missing = new ArrayList<>();
        for (Site s : SITES) {
            if (!finalValues.containsKey(s)) {
                missing.add(s);
            }
        }
        return missing;
    }

    /**
     * The input made from a visit's final values.
     *
     * @throws IllegalArgumentException naming the missing sites when any is absent
     */
    public static HeathCarterInput fromFinalValues(Map<Site, Double> v) {
        List<Site> missing = missingSites(v);
        if (!missing.isEmpty()) {
            throw new IllegalArgumentException("missing for the somatotype: "
                    + missing.stream().map(Site::label).toList());
        }
        return new HeathCarterInput(v.get(Site.STATURE), v.get(Site.BODY_MASS), v.get(Site.TRICEPS),
                v.get(Site.SUBSCAPULAR), v.get(Site.SUPRASPINALE), v.get(Site.MEDIAL_CALF), v.get(Site.HUMERUS),
                v.get(Site.FEMUR), v.get(Site.ARM_FLEXED), v.get(Site.CALF));
    }

    /** The value of one of the ten sites. */
    public double get(Site site) {
        return switch (site) {
            case STATURE -> statureCm;
            case BODY_MASS -> massKg;
            case TRICEPS -> tricepsMm;
            case SUBSCAPULAR -> subscapularMm;
            case SUPRASPINALE -> supraspinaleMm;
            case MEDIAL_CALF -> medialCalfMm;
            case HUMERUS -> humerusBreadthCm;
            case FEMUR -> femurBreadthCm;
            case ARM_FLEXED -> armFlexedGirthCm;
            case CALF -> calfGirthCm;
            default -> throw new IllegalArgumentException(site.label() + " is not a Heath-Carter input");
        };
    }
}
