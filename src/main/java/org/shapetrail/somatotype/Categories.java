package org.shapetrail.somatotype;

import java.util.Arrays;
import java.util.Comparator;

/**
 * Assigns each rating exactly one of the 13 categories and one of the 4 simplified groups.
 *
 * <p>The decision is taken on the half-unit rating (round half up; Carter &amp; Heath 1990), with
 * "equal" meaning the two differ by at most ½ unit and "dominant" meaning higher than both others by
 * more than ½ unit. In order:
 * <ol>
 *   <li><b>central</b>: no component differs by more than 1 unit from the other two, and all lie in 2–4;</li>
 *   <li>the highest component is dominant: <b>balanced X</b> when the other two are equal, otherwise
 *       <b>(second)-ic X</b>;</li>
 *   <li>the two highest are equal and the lowest is more than ½ below the second: the pair category
 *       (<b>mesomorph-endomorph</b>, <b>mesomorph-ectomorph</b>, <b>endomorph-ectomorph</b>).</li>
 * </ol>
 * Two cases are left open by the published rules, and this class decides them so (docs/decisions/0001):
 * <ul>
 *   <li>a "chain", where each neighbour is equal but highest and lowest differ by a whole unit
 *       (e.g. 5-4½-4 outside the central range): the two highest form the pair category, since the
 *       lowest lies clearly below the highest;</li>
 *   <li>all three within ½ unit of each other but outside 2–4 (e.g. 5-5-5, 1½-1½-1): <b>central</b>,
 *       because such ratings plot at or next to the centre of the somatochart.</li>
 * </ul>
 * Ties in order (equal half-unit values) are broken by the unrounded values, then mesomorphy before
 * endomorphy before ectomorphy; this only decides naming order, never the category itself.
 */
public final class Categories {
    private Categories() {
    }

    /** The category of an unrounded rating. */
    public static Category classify(Rating rating) {
        Rating h = rating.halfUnits();
        double endo = h.endomorphy();
        double meso = h.mesomorphy();
        double ecto = h.ectomorphy();
        double max = Math.max(endo, Math.max(meso, ecto));
        double min = Math.min(endo, Math.min(meso, ecto));
        if (max - min <= 1.0 && min >= 2.0 && max <= 4.0) {
            return Category.CENTRAL;
        }
        Component[] order = ranked(rating, h);
        Component first = order[0];
        Component second = order[1];
        Component third = order[2];
        double a = h.get(first);
        double b = h.get(second);
        double c = h.get(third);
        if (a - b > 0.5) {
            if (b - c <= 0.5) {
                return balanced(first);
            }
            return qualified(first, second);
        }
        if (a - c > 0.5) {
            // the pair rule, including the chain case where b - c is exactly 0.5
            return pair(first, second);
        }
        return Category.CENTRAL;
    }

    /** The simplified group: central, or the group of the dominant component; pair categories go to the
     * component that is higher on the unrounded rating (mesomorphy, then endomorphy on an exact tie). */
    public static SimplifiedGroup simplify(Rating rating) {
        Category c = classify(rating);
        return switch (c) {
            case CENTRAL -> SimplifiedGroup.CENTRAL;
            case BALANCED_ENDOMORPH, MESOMORPHIC_ENDOMORPH, ECTOMORPHIC_ENDOMORPH -> SimplifiedGroup.ENDOMORPH;
            case BALANCED_MESOMORPH, ENDOMORPHIC_MESOMORPH, ECTOMORPHIC_MESOMORPH -> SimplifiedGroup.MESOMORPH;
            case BALANCED_ECTOMORPH, MESOMORPHIC_ECTOMORPH, ENDOMORPHIC_ECTOMORPH -> SimplifiedGroup.ECTOMORPH;
            case MESOMORPH_ENDOMORPH -> rating.endomorphy() > rating.mesomorphy()
                    ? SimplifiedGroup.ENDOMORPH : SimplifiedGroup.MESOMORPH;
            case MESOMORPH_ECTOMORPH -> rating.ectomorphy() > rating.mesomorphy()
                    ? SimplifiedGroup.ECTOMORPH : SimplifiedGroup.MESOMORPH;
            case ENDOMORPH_ECTOMORPH -> rating.ectomorphy() > rating.endomorphy()
                    ? SimplifiedGroup.ECTOMORPH : SimplifiedGroup.ENDOMORPH;
        };
    }

    private static Component[] ranked(Rating raw, Rating half) {
        Component[] cs = {Component.MESOMORPHY, Component.ENDOMORPHY, Component.ECTOMORPHY};
        Arrays.sort(cs, Comparator.comparingDouble((Component c) -> half.get(c)).reversed()
                .thenComparing(Comparator.comparingDouble((Component c) -> raw.get(c)).reversed()));
        return cs;
    }

    private static Category balanced(Component dominant) {
        return switch (dominant) {
            case ENDOMORPHY -> Category.BALANCED_ENDOMORPH;
            case MESOMORPHY -> Category.BALANCED_MESOMORPH;
            case ECTOMORPHY -> Category.BALANCED_ECTOMORPH;
        };
    }

    private static Category qualified(Component dominant, Component second) {
        return switch (dominant) {
            case ENDOMORPHY -> second == Component.MESOMORPHY
                    ? Category.MESOMORPHIC_ENDOMORPH : Category.ECTOMORPHIC_ENDOMORPH;
            case MESOMORPHY -> second == Component.ENDOMORPHY
                    ? Category.ENDOMORPHIC_MESOMORPH : Category.ECTOMORPHIC_MESOMORPH;
            case ECTOMORPHY -> second == Component.MESOMORPHY
                    ? Category.MESOMORPHIC_ECTOMORPH : Category.ENDOMORPHIC_ECTOMORPH;
        };
    }

    private static Category pair(Component a, Component b) {
        boolean endo = a == Component.ENDOMORPHY || b == Component.ENDOMORPHY;
        boolean meso = a == Component.MESOMORPHY || b == Component.MESOMORPHY;
        if (endo && meso) {
            return Category.MESOMORPH_ENDOMORPH;
        }
        if (meso) {
            return Category.MESOMORPH_ECTOMORPH;
        }
        return Category.ENDOMORPH_ECTOMORPH;
    }
}
