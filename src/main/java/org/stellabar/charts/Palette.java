package org.stellabar.charts;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The series colours of every stellabar figure, declared once: the colour-blind-safe set of
 * Okabe &amp; Ito (2008, "Color Universal Design (CUD): how to make figures and presentations that
 * are friendly to colorblind people", https://jfly.uni-koeln.de/color/), without its yellow,
 * which is too faint on white. The charts ({@link ChartStyle}) and the notebooks the pipeline
 * writes (which receive {@link #hexCodes()}) both take their colours from here.
 *
 * <p>Declaration order is the order notebooks cycle through; {@link ChartStyle} uses its own
 * order of the same colours (black before sky blue, the palest last).
 */
public enum Palette {
    /** blue */
    BLUE(0x0072B2),
    /** vermillion */
    VERMILLION(0xD55E00),
    /** bluish green */
    BLUISH_GREEN(0x009E73),
    /** reddish purple */
    REDDISH_PURPLE(0xCC79A7),
    /** orange */
    ORANGE(0xE69F00),
    /** sky blue */
    SKY_BLUE(0x56B4E9),
    /** black */
    BLACK(0x000000);

    private final int rgb;

    Palette(int rgb) {
        this.rgb = rgb;
    }

    /** @return the colour, opaque */
    public Color colour() {
        return new Color(rgb);
    }

    /** @return the colour as {@code #RRGGBB}, upper-case hex digits */
    public String hex() {
        return String.format(Locale.US, "#%06X", rgb);
    }

    /** @return every colour as {@code #RRGGBB}, in declaration order */
    public static List<String> hexCodes() {
        List<String> codes = new ArrayList<>();
        for (Palette p : values()) {
            codes.add(p.hex());
        }
        return List.copyOf(codes);
    }
}
