package org.shapetrail.somatotype;

/** Somatochart coordinates of ratings (Carter & Heath 1990). */
public final class Somatochart {
    private Somatochart() {
    }

    /** X = ecto − endo; Y = 2·meso − (endo + ecto). */
    public static ChartPoint point(Rating r) {
        return new ChartPoint(r.ectomorphy() - r.endomorphy(),
                2 * r.mesomorphy() - (r.endomorphy() + r.ectomorphy()));
    }
}
