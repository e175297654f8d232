package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.util.List;
import org.junit.jupiter.api.Test;

class PaletteTest {

    // Okabe & Ito (2008), "Color Universal Design (CUD)", https://jfly.uni-koeln.de/color/: the
    // RGB values of blue, vermillion, bluish green, reddish purple, orange, sky blue and black
    // (from memory, as already used by ChartStyle; not re-read from the page for this test).
    @Test
    void hexCodesInDeclarationOrder() {
        assertEquals(List.of("#0072B2", "#D55E00", "#009E73", "#CC79A7", "#E69F00", "#56B4E9", "#000000"),
                Palette.hexCodes());
    }

    @Test
    void colourAndHexAgree() {
        for (Palette p : Palette.values()) {
            Color c = p.colour();
            assertEquals(p.hex(), String.format("#%02X%02X%02X", c.getRed(), c.getGreen(), c.getBlue()));
            assertEquals(255, c.getAlpha());
        }
    }

    // Charts use the five palette colours that keep 3:1 contrast on white, in this order.
    @Test
    void chartSlotsUseTheDarkColoursInOrder() {
        ChartStyle style = new ChartStyle(FigureSize.ONE_COLUMN);
        List<Palette> slots = List.of(Palette.BLUE, Palette.VERMILLION, Palette.BLUISH_GREEN, Palette.REDDISH_PURPLE,
                Palette.BLACK);
        for (int i = 0; i < slots.size(); i++) {
            assertEquals(slots.get(i).colour(), style.colour(i), "slot " + i);
        }
        assertEquals(style.colour(0), style.colour(slots.size()), "the cycle repeats");
    }

    /**
     * Greyscale: every slot's colour keeps a contrast ratio of at least 3:1 against white, the
     * threshold for graphics in WCAG 2.1 (W3C 2018, success criterion 1.4.11), with relative
     * luminance and contrast ratio as WCAG 2.1 defines them; and any two of the first six slots
     * differ in dash pattern and in marker shape too, so series survive printing in grey.
     */
    @Test
    void everySlotSurvivesGreyscale() {
        ChartStyle style = new ChartStyle(FigureSize.ONE_COLUMN);
        for (int i = 0; i < 12; i++) {
            double contrast = 1.05 / (luminance(style.colour(i)) + 0.05);
            assertTrue(contrast >= 3.0, "slot " + i + " contrast " + contrast);
        }
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                assertFalse(java.util.Arrays.equals(((java.awt.BasicStroke) style.line(i)).getDashArray(),
                        ((java.awt.BasicStroke) style.line(j)).getDashArray()), "dash " + i + " vs " + j);
                assertFalse(new java.awt.geom.Area(style.marker(i)).equals(new java.awt.geom.Area(style.marker(j))),
                        "marker " + i + " vs " + j);
            }
        }
    }

    private static double luminance(Color c) {
        return 0.2126 * linear(c.getRed()) + 0.7152 * linear(c.getGreen()) + 0.0722 * linear(c.getBlue());
    }

    private static double linear(int channel) {
        double v = channel / 255.0;
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }
}
