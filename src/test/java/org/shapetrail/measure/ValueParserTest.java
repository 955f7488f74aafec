package org.shapetrail.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class ValueParserTest {
    @Test
    void decimalCommaParsesUnderAGermanLocale() {
        ValueParser.Parsed p = ValueParser.parse(Site.TRICEPS, "1,5", DecimalStyle.of(Locale.GERMANY));
        assertEquals(1.5, p.value());
    }

    @Test
    void decimalCommaIsRefusedUnderAnEnglishLocale() {
        ValueParser.Parsed p = ValueParser.parse(Site.TRICEPS, "1,5", DecimalStyle.of(Locale.UK));
        assertFalse(p.ok());
        assertEquals("Triceps skinfold \"1,5\" uses ',' as the decimal separator; enter 1.5 mm.",
                p.problem().message());
    }

    @Test
    void textIsNotANumber() {
        ValueParser.Parsed p = ValueParser.parse(Site.CALF, "abc", DecimalStyle.POINT);
        assertEquals("Calf girth \"abc\" is not a number; enter the value in cm.", p.problem().message());
    }

    @Test
    void blankIsMissing() {
        assertEquals(ProblemKind.MISSING, ValueParser.parse(Site.CALF, "  ", DecimalStyle.POINT).problem().kind());
    }

    @Test
    void thousandsSeparatorsAreNotGuessed() {
        assertFalse(ValueParser.parse(Site.BODY_MASS, "1,234.5", DecimalStyle.POINT).ok());
    }
}
