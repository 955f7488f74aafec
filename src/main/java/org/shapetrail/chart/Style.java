package org.shapetrail.chart;

import java.util.Objects;

/**
 * How a primitive is drawn: stroke colour and width, dash pattern (empty for solid), fill colour (null
 * for none). Colours are "#rrggbb" with an opacity. Widths and dashes are in points at 100 % zoom.
 */
public record Style(String stroke, double strokeWidth, double[] dash, String fill, double opacity) {
    public Style {
        Objects.requireNonNull(dash);
        dash = dash.clone();
        if (stroke != null && !stroke.matches("#[0-9a-f]{6}")) {
            throw new IllegalArgumentException("colours are #rrggbb in lower case: " + stroke);
        }
        if (fill != null && !fill.matches("#[0-9a-f]{6}")) {
            throw new IllegalArgumentException("colours are #rrggbb in lower case: " + fill);
        }
        if (!(opacity >= 0 && opacity <= 1)) {
            throw new IllegalArgumentException("opacity lies in 0..1");
        }
    }

    public static Style stroke(String colour, double width) {
        return new Style(colour, width, new double[0], null, 1);
    }

    public static Style dashed(String colour, double width, double... dash) {
        return new Style(colour, width, dash, null, 1);
    }

    public static Style filled(String fill, String stroke, double width) {
        return new Style(stroke, width, new double[0], fill, 1);
    }

    public Style withOpacity(double o) {
        return new Style(stroke, strokeWidth, dash, fill, o);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Style s && Objects.equals(stroke, s.stroke) && strokeWidth == s.strokeWidth
                && java.util.Arrays.equals(dash, s.dash) && Objects.equals(fill, s.fill) && opacity == s.opacity;
    }

    @Override
    public int hashCode() {
        return Objects.hash(stroke, strokeWidth, java.util.Arrays.hashCode(dash), fill, opacity);
    }
}
