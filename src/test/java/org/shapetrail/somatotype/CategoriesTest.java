package org.shapetrail.somatotype;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Expected categories follow the definitions of Carter &amp; Heath 1990 applied by hand to half-unit
 * ratings ("equal" = within ½, "dominant" = more than ½ above both others); the open cases follow this
 * project's documented rule (docs/decisions/0001-somatotype-categories.md).
 */
class CategoriesTest {
    @ParameterizedTest(name = "{0}-{1}-{2} is {3}")
    @CsvSource({
            "3,   4,   3.5, central",
            "2,   3,   3,   central",
            "6,   3,   3,   balanced endomorph",
            "6,   4,   2,   mesomorphic endomorph",
            "6,   2,   4,   ectomorphic endomorph",
            "5,   5,   2,   mesomorph-endomorph",
            "2,   6,   2,   balanced mesomorph",
            "4,   6,   2,   endomorphic mesomorph",
            "2,   6,   4,   ectomorphic mesomorph",
            "1.5, 4.5, 4.5, mesomorph-ectomorph",
            "2,   2,   6,   balanced ectomorph",
            "1.5, 3.5, 5,   mesomorphic ectomorph",
            "3.5, 1.5, 5,   endomorphic ectomorph",
            "4.5, 1.5, 4.5, endomorph-ectomorph"
    })
    void everyCategoryHasItsTextbookExample(double endo, double meso, double ecto, String expected) {
        assertEquals(expected, Categories.classify(Rating.of(endo, meso, ecto)).displayName());
    }

    @ParameterizedTest(name = "{0}-{1}-{2} is {3}")
    @CsvSource({
            // dominance needs more than ½: a lead of exactly ½ is "equal"
            "5,   4.5, 2,   mesomorph-endomorph",
            "5.5, 4.5, 2,   mesomorphic endomorph",
            // "equal" allows exactly ½
            "6,   3.5, 3,   balanced endomorph",
            "6,   4,   3,   mesomorphic endomorph",
            // central needs every component in 2–4
            "4,   4,   5,   balanced ectomorph",
            "3,   4,   4.5, mesomorph-ectomorph"
    })
    void boundariesOfEqualAndDominant(double endo, double meso, double ecto, String expected) {
        assertEquals(expected, Categories.classify(Rating.of(endo, meso, ecto)).displayName());
    }

    @ParameterizedTest(name = "{0}-{1}-{2} is {3}")
    @CsvSource({
            // chain: neighbours equal, ends a unit apart, outside 2–4: the two highest form the pair
            "5,   4.5, 4,   mesomorph-endomorph",
            "1.5, 2.5, 2,   mesomorph-ectomorph",
            // all three within ½, outside 2–4: central (plots at the chart's centre)
            "5,   5,   5,   central",
            "5,   5,   4.5, central",
            "1.5, 2,   2,   central"
    })
    void documentedRuleForTheOpenCases(double endo, double meso, double ecto, String expected) {
        assertEquals(expected, Categories.classify(Rating.of(endo, meso, ecto)).displayName());
    }

    @Test
    void categoriesAreDecidedOnRatingsRoundedHalfUp() {
        // 5.25 rounds to 5.5 (dominant by 1 over 4.5), 5.24 to 5.0 (only ½ ahead): Carter & Heath 1990 rule
        assertEquals(Category.MESOMORPHIC_ENDOMORPH, Categories.classify(Rating.of(5.25, 4.5, 2)));
        assertEquals(Category.MESOMORPH_ENDOMORPH, Categories.classify(Rating.of(5.24, 4.5, 2)));
    }

    @Test
    void pairCategoriesGoToTheHigherUnroundedComponentInTheSimplifiedGroups() {
        assertEquals(SimplifiedGroup.ENDOMORPH, Categories.simplify(Rating.of(5.1, 4.9, 2)));
        assertEquals(SimplifiedGroup.MESOMORPH, Categories.simplify(Rating.of(4.9, 5.1, 2)));
        assertEquals(SimplifiedGroup.MESOMORPH, Categories.simplify(Rating.of(5, 5, 2)));
        assertEquals(SimplifiedGroup.CENTRAL, Categories.simplify(Rating.of(3, 4, 3)));
        assertEquals(SimplifiedGroup.ECTOMORPH, Categories.simplify(Rating.of(2, 2, 6)));
    }

    @Test
    void everyRatingOnAFineGridGetsACategory() {
        // the rule is total: no rating in 0.1–9 (steps of 0.25) throws or returns null
        int count = 0;
        for (double e = 0.1; e <= 9; e += 0.25) {
            for (double m = 0.1; m <= 9; m += 0.25) {
                for (double c = 0.1; c <= 9; c += 0.25) {
                    if (Categories.classify(Rating.of(e, m, c)) != null) {
                        count++;
                    }
                }
            }
        }
        assertEquals(36 * 36 * 36, count);
    }
}
