package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.awt.font.TextAttribute;
import java.text.AttributedCharacterIterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class ScriptedTextTest {

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', value = {
        "g cm^{-3}        | g cm⁻³",
        "Γ_1              | Γ₁",
        "10^9             | 10⁹",
        "T ≈ 10^{9} K     | T ≈ 10⁹ K",
        "1 − β            | 1 − β",
        "x_{(12)}         | x₍₁₂₎",
        "a\\_b            | a_b",
    })
    void digitAndSignScriptsBecomeUnicodeGlyphs(String markup, String expected) {
        assertEquals(Optional.of(expected), ScriptedText.parse(markup).unicode());
    }

    // One layout path: markup scripts and Unicode script glyphs give the same runs, and "P_{gas}"
    // keeps its whole subscript (the old legend bug set "g" low and "as" on the baseline).
    @Test
    void scriptsOfEitherSpellingBecomeTheSameRuns() {
        assertEquals(List.of(Map.entry("∇", 0), Map.entry("ad", -1)), ScriptedText.parse("∇_{ad}").pieces());
        assertEquals(List.of(Map.entry("P", 0), Map.entry("gas", -1)), ScriptedText.parse("P_{gas}").pieces());
        assertEquals(ScriptedText.parse("10^{-3}").pieces(), ScriptedText.parse("10⁻³").pieces());
        assertEquals(ScriptedText.parse("Γ_1").pieces(), ScriptedText.parse("Γ₁").pieces());
        assertEquals("∇ad", ScriptedText.parse("∇_{ad}").flat());
    }

    // A script is set smaller: "x" with subscript "ad" is narrower than "xad" in one size.
    @Test
    void scriptsAreSetSmallerThanTheBase() {
        java.awt.Graphics2D g2 = new java.awt.image.BufferedImage(1, 1, java.awt.image.BufferedImage.TYPE_INT_RGB)
                .createGraphics();
        Font font = BundledFont.atSize(8);
        double scripted = ScriptedText.parse("x_{ad}").bounds(g2, font).getWidth();
        double flat = ScriptedText.parse("xad").bounds(g2, font).getWidth();
        assertTrue(scripted < flat && scripted > 0.6 * flat, scripted + " vs " + flat);
        g2.dispose();
    }

    @Test
    void hyphenInsideAScriptBecomesTheMinusSign() {
        ScriptedText text = ScriptedText.parse("s^{-1}_{ab}");
        assertEquals("s\u22121ab", text.flat());
    }

    @Test
    void malformedMarkupIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> ScriptedText.parse("P_{rad"));
        assertThrows(IllegalArgumentException.class, () -> ScriptedText.parse("x^"));
    }

    @Test
    void theBundledFontHasEveryGlyphTheChartsUse() {
        Font font = BundledFont.atSize(8);
        String needed = "ρβΓ∇−⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻₀₁₂₃₄₅₆₇₈₉☉×≈λμψ⟨⟩";
        assertEquals(-1, font.canDisplayUpTo(needed), "missing glyph in " + needed);
        assertFalse(font.getFamily().isEmpty());
        assertEquals("DejaVu Sans", font.getFamily());
    }
}
