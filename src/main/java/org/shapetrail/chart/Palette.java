package org.shapetrail.chart;

/**
 * Shapetrail's own chart palette: a deep teal ink on warm paper, with amber for attention. Series
 * colours were chosen to stay apart for the common colour-vision deficiencies and in grey print; every
 * meaning is carried by line style or marker shape as well.
 */
public final class Palette {
    public static final String PAPER = "#faf7f0";
    public static final String INK = "#1d3b44";
    public static final String GRID = "#e3ddd0";
    public static final String FRAME = "#7d8f91";
    public static final String MUTED = "#5e6e70";
    public static final String ACCENT = "#c9822b";
    public static final String NOISE = "#8fb3b0";
    /** Series colours in order (teal, amber, plum, olive, slate blue, brick). */
    public static final String[] SERIES = {"#1f6f78", "#c9822b", "#7b4b94", "#6b7d2a", "#3f5fa8", "#a3472f"};

    private Palette() {
    }

    public static String series(int i) {
        return SERIES[Math.floorMod(i, SERIES.length)];
    }
}
