package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.font.TextAttribute;
import java.awt.font.TextLayout;
import java.awt.geom.Rectangle2D;
import java.text.AttributedString;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.jfree.chart.ui.TextAnchor;

/**
 * A chart text with sub- and superscripts, written in a small TeX-like markup that astronomers
 * type without thinking: {@code _x} or {@code _{ad}} is a subscript, {@code ^2} or {@code ^{-3}}
 * a superscript, a backslash escapes the next character. Examples: {@code "∇_{ad}"},
 * {@code "Γ_1"}, {@code "g cm^{-3}"}, {@code "P_{rad} = P_{gas}"}, {@code "M_☉"}.
 *
 * <p>Scripts made only of digits and signs are written with the font's Unicode superscript and
 * subscript glyphs (⁻³, ₁), so the text stays plain text: searchable and selectable in PDF and
 * SVG. Any other script (letters, as in ∇_ad) is drawn from an {@link AttributedString} that
 * carries the font's own attributes plus {@link TextAttribute#SUPERSCRIPT}; setting
 * {@link TextAttribute#FONT} instead would make Java ignore the script attribute. Inside a
 * script a hyphen becomes the minus sign U+2212.
 */
public final class ScriptedText {

    /** The minus sign U+2212, wider than a hyphen and at the height of a plus. */
    public static final char MINUS = '\u2212';

    private static final String SUPER_SOURCE = "0123456789+-\u2212=()";
    private static final String SUPER_GLYPHS = "⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻⁻⁼⁽⁾";
    private static final String SUB_GLYPHS = "₀₁₂₃₄₅₆₇₈₉₊₋₋₌₍₎";

    private enum Level { BASE, SUPER, SUB }

    private record Run(String text, Level level) {
    }

    private final String markup;
    private final List<Run> runs;

    private ScriptedText(String markup, List<Run> runs) {
        this.markup = markup;
        this.runs = List.copyOf(runs);
    }

    /**
     * Parses the markup.
     *
     * @param markup text with {@code _} and {@code ^} scripts
     * @return the parsed text
     * @throws IllegalArgumentException for an unclosed brace or a script with nothing after it
     */
    public static ScriptedText parse(String markup) {
        Objects.requireNonNull(markup, "markup");
        List<Run> runs = new ArrayList<>();
        StringBuilder base = new StringBuilder();
        int i = 0;
        while (i < markup.length()) {
            char c = markup.charAt(i);
            if (c == '\\' && i + 1 < markup.length()) {
                base.append(markup.charAt(i + 1));
                i += 2;
            } else if (c == '_' || c == '^') {
                Level level = c == '^' ? Level.SUPER : Level.SUB;
                if (i + 1 >= markup.length()) {
                    throw new IllegalArgumentException("chart text \"" + markup + "\" ends with '" + c
                            + "'; write " + c + "x or " + c + "{...}");
                }
                String script;
                if (markup.charAt(i + 1) == '{') {
                    int close = markup.indexOf('}', i + 2);
                    if (close < 0) {
                        throw new IllegalArgumentException("chart text \"" + markup + "\" has an unclosed '{'");
                    }
                    script = markup.substring(i + 2, close);
                    i = close + 1;
                } else {
                    int end = i + 1 + Character.charCount(markup.codePointAt(i + 1));
                    script = markup.substring(i + 1, end);
                    i = end;
                }
                if (base.length() > 0) {
                    runs.add(new Run(base.toString(), Level.BASE));
                    base.setLength(0);
                }
                if (!script.isEmpty()) {
                    runs.add(new Run(script.replace('-', MINUS), level));
                }
            } else {
                base.append(c);
                i++;
            }
        }
        if (base.length() > 0) {
            runs.add(new Run(base.toString(), Level.BASE));
        }
        return new ScriptedText(markup, runs);
    }

    /** @return the markup this text was parsed from */
    public String markup() {
        return markup;
    }

    /** @return true if there is nothing to draw */
    public boolean isEmpty() {
        return runs.isEmpty();
    }

    /**
     * The text as plain Unicode, if every script can be written with super- or subscript glyphs.
     *
     * @return the plain text, or empty if some script needs an attributed string
     */
    public Optional<String> unicode() {
        StringBuilder out = new StringBuilder();
        for (Run run : runs) {
            if (run.level() == Level.BASE) {
                out.append(run.text());
                continue;
            }
            String glyphs = run.level() == Level.SUPER ? SUPER_GLYPHS : SUB_GLYPHS;
            for (int k = 0; k < run.text().length(); k++) {
                int at = SUPER_SOURCE.indexOf(run.text().charAt(k));
                if (at < 0) {
                    return Optional.empty();
                }
                out.append(glyphs.charAt(at));
            }
        }
        return Optional.of(out.toString());
    }

    /**
     * The text with every script written inline, for places that take a plain string only
     * (file names, tool tips): "∇_{ad}" gives "∇ad".
     *
     * @return the characters without markup
     */
    public String flat() {
        return unicode().orElseGet(() -> {
            StringBuilder out = new StringBuilder();
            runs.forEach(r -> out.append(r.text()));
            return out.toString();
        });
    }

    /**
     * The text as an attributed string in this font: the font's attributes on every character,
     * plus {@link TextAttribute#SUPERSCRIPT} on the scripts.
     *
     * @param font the font
     * @return a new attributed string (never empty: an empty text gives a single space)
     */
    public AttributedString attributed(Font font) {
        StringBuilder all = new StringBuilder();
        runs.forEach(r -> all.append(r.text()));
        if (all.length() == 0) {
            all.append(' ');
        }
        AttributedString result = new AttributedString(all.toString());
        result.addAttributes(font.getAttributes(), 0, all.length());
        int at = 0;
        for (Run run : runs) {
            int end = at + run.text().length();
            if (run.level() != Level.BASE) {
                result.addAttribute(TextAttribute.SUPERSCRIPT, run.level() == Level.SUPER
                        ? TextAttribute.SUPERSCRIPT_SUPER : TextAttribute.SUPERSCRIPT_SUB, at, end);
            }
            at = end;
        }
        return result;
    }

    /**
     * The size of the drawn text.
     *
     * @param g2 the target (for its font render context)
     * @param font the font
     * @return bounds relative to the baseline start: x = 0, y = −ascent, width = advance,
     *     height = ascent + descent
     */
    public Rectangle2D bounds(Graphics2D g2, Font font) {
        FontRenderContext frc = g2.getFontRenderContext();
        Optional<String> plain = unicode();
        if (plain.isPresent()) {
            String text = plain.get().isEmpty() ? " " : plain.get();
            LineMetrics lm = font.getLineMetrics(text, frc);
            double width = font.getStringBounds(text, frc).getWidth();
            return new Rectangle2D.Double(0, -lm.getAscent(), width, lm.getAscent() + lm.getDescent());
        }
        TextLayout layout = new TextLayout(attributed(font).getIterator(), frc);
        return new Rectangle2D.Double(0, -layout.getAscent(), layout.getAdvance(),
                layout.getAscent() + layout.getDescent());
    }

    /**
     * Draws the text with the given anchor at (x, y): plain text through
     * {@link Graphics2D#drawString(String, float, float)} when possible (it stays text in PDF and
     * SVG), otherwise through a {@link TextLayout}.
     *
     * @param g2 the target; its font is left changed to {@code font}
     * @param font the font
     * @param x anchor x in the target's user space
     * @param y anchor y in the target's user space
     * @param anchor which point of the text lies at (x, y)
     */
    public void draw(Graphics2D g2, Font font, double x, double y, TextAnchor anchor) {
        if (isEmpty()) {
            return;
        }
        Rectangle2D box = boxAt(g2, font, x, y, anchor);
        double baseline = box.getY() + ascent(g2, font);
        g2.setFont(font);
        Optional<String> plain = unicode();
        if (plain.isPresent()) {
            g2.drawString(plain.get(), (float) box.getX(), (float) baseline);
        } else {
            new TextLayout(attributed(font).getIterator(), g2.getFontRenderContext())
                    .draw(g2, (float) box.getX(), (float) baseline);
        }
    }

    /**
     * Where {@link #draw} puts the text.
     *
     * @param g2 the graphics the text would be drawn on (for its font metrics)
     * @param font the font
     * @param x anchor point x, user space
     * @param y anchor point y, user space
     * @param anchor which point of the box sits at (x, y)
     * @return the box from the top of the ascent to the bottom of the descent, in user space
     *
     */
    public Rectangle2D boxAt(Graphics2D g2, Font font, double x, double y, TextAnchor anchor) {
        Rectangle2D b = bounds(g2, font);
        double left = x;
        if (anchor.isHorizontalCenter()) {
            left = x - b.getWidth() / 2;
        } else if (anchor.isRight()) {
            left = x - b.getWidth();
        }
        double ascent = -b.getY();
        double descent = b.getHeight() - ascent;
        double baseline = y;
        if (anchor.isTop()) {
            baseline = y + ascent;
        } else if (anchor.isBottom()) {
            baseline = y - descent;
        } else if (anchor.isHalfAscent()) {
            baseline = y + ascent / 2;
        } else if (anchor.isVerticalCenter()) {
            baseline = y + (ascent - descent) / 2;
        }
        return new Rectangle2D.Double(left, baseline - ascent, b.getWidth(), b.getHeight());
    }

    private double ascent(Graphics2D g2, Font font) {
        return -bounds(g2, font).getY();
    }

    @Override
    public String toString() {
        return markup;
    }
}
