package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Font;
import java.awt.font.TextAttribute;
import java.text.AttributedCharacterIterator;
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

    @Test
    void letterScriptsNeedAnAttributedStringCarryingFontAttributesNotTheFontObject() {
        ScriptedText text = ScriptedText.parse("∇_{ad}");
        assertTrue(text.unicode().isEmpty());
        assertEquals("∇ad", text.flat());
        Font font = BundledFont.atSize(8);
        AttributedCharacterIterator it = text.attributed(font).getIterator();
        assertEquals('∇', it.first());
        assertNull(it.getAttribute(TextAttribute.SUPERSCRIPT));
        // the pitfall: TextAttribute.FONT would make Java ignore SUPERSCRIPT
        assertNull(it.getAttribute(TextAttribute.FONT));
        assertEquals(font.getFamily(), it.getAttribute(TextAttribute.FAMILY));
        it.next();
        assertEquals('a', it.current());
        assertEquals(TextAttribute.SUPERSCRIPT_SUB, it.getAttribute(TextAttribute.SUPERSCRIPT));
        assertEquals(8f, ((Number) it.getAttribute(TextAttribute.SIZE)).floatValue());
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
