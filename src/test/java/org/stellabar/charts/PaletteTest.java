package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

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

    // Charts put black before sky blue (the palest last on white); every palette colour is used once.
    @Test
    void chartSlotsUseEveryPaletteColourOnce() {
        ChartStyle style = new ChartStyle(FigureSize.ONE_COLUMN);
        List<Palette> slots = List.of(Palette.BLUE, Palette.VERMILLION, Palette.BLUISH_GREEN, Palette.REDDISH_PURPLE,
                Palette.ORANGE, Palette.BLACK, Palette.SKY_BLUE);
        for (int i = 0; i < slots.size(); i++) {
            assertEquals(slots.get(i).colour(), style.colour(i), "slot " + i);
        }
        assertEquals(style.colour(0), style.colour(slots.size()), "the cycle repeats");
    }
}
