package org.stellabar.charts;

import java.awt.Font;
import java.awt.FontFormatException;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The one typeface of every chart: DejaVu Sans 2.37, shipped inside the jar
 * ({@code org/stellabar/charts/fonts/DejaVuSans.ttf}, Bitstream Vera licence with DejaVu changes
 * in the public domain; the licence text is beside the font as {@code LICENSE-DejaVu.txt}).
 *
 * <p>Why a bundled font: it has every glyph the charts need (Greek, ∇, the minus sign U+2212,
 * superscript and subscript digits, ☉), it gives the same metrics on every machine (so the SVG
 * output is byte-identical everywhere), and the PDF exporter embeds the very same file.
 */
public final class BundledFont {

    /** Resource path of the font file inside the jar. */
    static final String RESOURCE = "fonts/DejaVuSans.ttf";

    private static final Font BASE = load();

    private BundledFont() {
    }

    /**
     * @param points size in points (1/72 inch)
     * @return the chart typeface at this size
     */
    public static Font atSize(double points) {
        return BASE.deriveFont((float) points);
    }

    /**
     * Opens the font file, e.g. for embedding it in a PDF. The caller closes the stream.
     *
     * @return a stream over the TrueType file
     */
    public static InputStream openStream() {
        InputStream in = BundledFont.class.getResourceAsStream(RESOURCE);
        if (in == null) {
            throw new IllegalStateException("chart font " + RESOURCE + " is missing from the class path");
        }
        return in;
    }

    private static Font load() {
        try (InputStream in = openStream()) {
            Font font = Font.createFont(Font.TRUETYPE_FONT, in);
            // Registering makes the family name resolvable: an AttributedString carries the
            // font's attributes (family, size), not the Font object, and Java looks the family up
            // by name when it lays out sub- and superscripts. If a system copy of DejaVu Sans is
            // installed already, registration is refused and that identical copy is used.
            GraphicsEnvironment.getLocalGraphicsEnvironment().registerFont(font);
            return font;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read chart font " + RESOURCE, e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("chart font " + RESOURCE + " is not a TrueType font", e);
        }
    }
}
