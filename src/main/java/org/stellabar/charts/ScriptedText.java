package org.stellabar.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.jfree.chart.ui.TextAnchor;

/**
 * A chart text with sub- and superscripts, written in a small TeX-like markup that astronomers
 * type without thinking: {@code _x} or {@code _{ad}} is a subscript, {@code ^2} or {@code ^{-3}}
 * a superscript, a backslash escapes the next character. Examples: {@code "∇_{ad}"},
 * {@code "Γ_1"}, {@code "g cm^{-3}"}, {@code "P_{rad} = P_{gas}"}, {@code "M_☉"}.
 *
 * <p>Every script is set one way, wherever the text appears (legend, axis title, tick label,
 * label on the plot): in a font {@value #SCRIPT_SCALE} times the size, on a raised or lowered
 * baseline, drawn as text run by run ({@link #draw}), so that it stays searchable and selectable
 * in PDF and SVG. Unicode super- and subscript glyphs in the markup (⁻³, ₁, as tick labels and
 * older labels carry) are read as scripts too, so the two never mix in one figure. Inside a
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
            } else if (SUPER_GLYPHS.indexOf(c) >= 0 || SUB_GLYPHS.indexOf(c) >= 0) {
                // a Unicode script glyph (⁻³, ₁) is a script like any other, set the same way
                boolean sup = SUPER_GLYPHS.indexOf(c) >= 0;
                String glyphs = sup ? SUPER_GLYPHS : SUB_GLYPHS;
                StringBuilder script = new StringBuilder();
                while (i < markup.length() && glyphs.indexOf(markup.charAt(i)) >= 0) {
                    script.append(SUPER_SOURCE.charAt(glyphs.indexOf(markup.charAt(i))));
                    i++;
                }
                if (base.length() > 0) {
                    runs.add(new Run(base.toString(), Level.BASE));
                    base.setLength(0);
                }
                runs.add(new Run(script.toString().replace('-', MINUS), sup ? Level.SUPER : Level.SUB));
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

    /** Size of script text relative to the base text. */
    static final double SCRIPT_SCALE = 0.70;
    /** Rise of a superscript's baseline, in units of the base font size. */
    static final double SUPER_RISE = 0.36;
    /** Drop of a subscript's baseline, in units of the base font size. */
    static final double SUB_DROP = 0.16;

    /** @return the font of a run: the base font, or the smaller script font */
    private static Font fontOf(Run run, Font font) {
        return run.level() == Level.BASE ? font : font.deriveFont((float) (font.getSize2D() * SCRIPT_SCALE));
    }

    /** @return the baseline shift of a run, downwards positive */
    private static double shiftOf(Run run, Font font) {
        return switch (run.level()) {
            case BASE -> 0.0;
            case SUPER -> -SUPER_RISE * font.getSize2D();
            case SUB -> SUB_DROP * font.getSize2D();
        };
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
        LineMetrics base = font.getLineMetrics("Xg", frc);
        double ascent = base.getAscent();
        double descent = base.getDescent();
        double width = 0.0;
        for (Run run : runs) {
            Font f = fontOf(run, font);
            LineMetrics lm = f.getLineMetrics(run.text(), frc);
            double shift = shiftOf(run, font);
            ascent = Math.max(ascent, lm.getAscent() - shift);
            descent = Math.max(descent, lm.getDescent() + shift);
            width += f.getStringBounds(run.text(), frc).getWidth();
        }
        return new Rectangle2D.Double(0, -ascent, width, ascent + descent);
    }

    /**
     * Draws the text with the given anchor at (x, y). This is the one way chart text is drawn:
     * each run through {@link Graphics2D#drawString(String, float, float)} in its own font and at
     * its own baseline, so that every letter stays text (searchable and selectable in PDF and
     * SVG) and every sub- and superscript, in whatever chart element, is set the same way.
     *
     * @param g2 the target; its font is left changed
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
        double baseline = box.getY() - bounds(g2, font).getY();
        double at = box.getX();
        FontRenderContext frc = g2.getFontRenderContext();
        for (Run run : runs) {
            Font f = fontOf(run, font);
            g2.setFont(f);
            g2.drawString(run.text(), (float) at, (float) (baseline + shiftOf(run, font)));
            at += f.getStringBounds(run.text(), frc).getWidth();
        }
    }

    /**
     * Draws the text turned by an angle about its anchor, e.g. an axis title reading upwards.
     *
     * @param g2 where to draw
     * @param font the base font (scripts are set smaller)
     * @param x the anchor's x
     * @param y the anchor's y
     * @param anchor which point of the text lies at (x, y)
     * @param angle the turn in radians, clockwise on screen (−π/2 reads upwards)
     */
    public void drawRotated(Graphics2D g2, Font font, double x, double y, TextAnchor anchor, double angle) {
        java.awt.geom.AffineTransform saved = g2.getTransform();
        g2.rotate(angle, x, y);
        draw(g2, font, x, y, anchor);
        g2.setTransform(saved);
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

    /**
     * The runs of the text as drawn, in order: what a reader of the SVG or PDF finds as separate
     * pieces of text.
     *
     * @return each run's characters and level: 0 base, 1 superscript, −1 subscript
     */
    public List<Map.Entry<String, Integer>> pieces() {
        List<Map.Entry<String, Integer>> out = new ArrayList<>();
        for (Run r : runs) {
            out.add(Map.entry(r.text(), r.level() == Level.BASE ? 0 : r.level() == Level.SUPER ? 1 : -1));
        }
        return out;
    }

    @Override
    public String toString() {
        return markup;
    }
}
