package org.stellabar.charts;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/**
 * The one look of stellabar charts: white, an open frame (left and bottom axes only), thin dark
 * axes with outward ticks, faint major gridlines, DejaVu Sans at journal sizes, and a style slot
 * per series that combines a colour, a dash pattern and a marker shape, so that every series can
 * be told apart in colour, in greyscale and by colour-blind readers.
 *
 * <p>Colours: the colour-blind-safe {@link Palette}, in our own order, its darker five only. Dashes cycle through solid, dashed, dotted, dash-dot, long dash and
 * dash-dot-dot; markers through circle, square, triangle, diamond, inverted triangle and cross.
 * The colour cycle (5) and the dash and marker cycles (6) have co-prime lengths, so
 * slots stay distinct well beyond the number of series a readable chart holds, and any two of
 * the first six slots differ in dash and in marker shape as well as in colour: a chart printed
 * in grey tells its series apart by line style and marker.
 *
 * <p>All lengths are in points (1/72 inch) at the printed size.
 */
public final class ChartStyle {

    /**
     * The palette in the order slots use it: only the colours that keep a contrast of at least
     * 3:1 against white (WCAG 2.1, success criterion 1.4.11, for graphics), so that every
     * series still reads when printed in grey; orange and sky blue fall below it and are left out.
     */
    private static final Color[] COLOURS = {
        Palette.BLUE.colour(),
        Palette.VERMILLION.colour(),
        Palette.BLUISH_GREEN.colour(),
        Palette.REDDISH_PURPLE.colour(),
        Palette.BLACK.colour(),
    };

    /** Dash patterns in units of the line width; null is solid. Round caps add one width per dash. */
    private static final float[][] DASHES = {
        null,
        {3.0f, 3.2f},
        {0.01f, 2.4f},
        {4.0f, 2.6f, 0.01f, 2.6f},
        {7.5f, 3.2f},
        {4.0f, 2.4f, 0.01f, 2.4f, 0.01f, 2.4f},
    };

    private static final int SHAPES = 6;

    static final Color INK = new Color(0x1A1A1A);
    static final Color GRID = new Color(0xE4E4E4);
    static final Color REFERENCE = new Color(0x6E6E6E);
    static final Color REFERENCE_TEXT = new Color(0x3C3C3C);
    static final Color LEGEND_BACKGROUND = new Color(255, 255, 255, 220);
    /** Behind labels written on the plot, so that lines under them do not cut the letters. */
    static final Color HALO = new Color(255, 255, 255, 200);

    private final FigureSize size;

    /** @param size the printed size, which sets the text sizes */
    public ChartStyle(FigureSize size) {
        this.size = size;
    }

    /** @return the printed size */
    public FigureSize size() {
        return size;
    }

    /**
     * @param slot style slot, 0 or more (the styles repeat after the last)
     * @return the colour of a style slot
     */
    public Color colour(int slot) {
        return COLOURS[slot % COLOURS.length];
    }

    /**
     * @param slot style slot, 0 or more (the styles repeat after the last)
     * @return the line stroke of a style slot
     */
    public Stroke line(int slot) {
        float width = lineWidth();
        float[] pattern = DASHES[slot % DASHES.length];
        if (pattern == null) {
            return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float[] dash = new float[pattern.length];
        for (int i = 0; i < dash.length; i++) {
            dash[i] = pattern[i] * width;
        }
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /**
     * @param slot style slot, 0 or more (the styles repeat after the last)
     * @return the marker of a style slot, centred on (0, 0)
     */
    public Shape marker(int slot) {
        double d = markerSize();
        double r = d / 2;
        switch (slot % SHAPES) {
            case 0:
                return new Ellipse2D.Double(-r, -r, d, d);
            case 1: {
                // a square of about the circle's area
                double s = 0.89 * d;
                return new Rectangle2D.Double(-s / 2, -s / 2, s, s);
            }
            case 2:
                return polygon(1.2 * r, 3, -Math.PI / 2, 0.18 * r);
            case 3:
                return polygon(1.25 * r, 4, -Math.PI / 2, 0);
            case 4:
                return polygon(1.2 * r, 3, Math.PI / 2, -0.18 * r);
            default:
                return cross(1.3 * r, 0.45 * r);
        }
    }

    private static Shape polygon(double radius, int corners, double startAngle, double shiftY) {
        double[][] corner = new double[corners][];
        for (int i = 0; i < corners; i++) {
            double a = startAngle + 2 * Math.PI * i / corners;
            corner[i] = new double[] {radius * Math.cos(a), radius * Math.sin(a) + shiftY};
        }
        return outline(corner);
    }

    private static Shape cross(double arm, double half) {
        // an upright plus made of one outline, rotated 45 degrees into an x
        double[][] pts = {{-half, -arm}, {half, -arm}, {half, -half}, {arm, -half}, {arm, half}, {half, half},
            {half, arm}, {-half, arm}, {-half, half}, {-arm, half}, {-arm, -half}, {-half, -half}};
        double c = Math.cos(Math.PI / 4);
        double[][] corner = new double[pts.length][];
        for (int i = 0; i < pts.length; i++) {
            corner[i] = new double[] {c * (pts[i][0] - pts[i][1]), c * (pts[i][0] + pts[i][1])};
        }
        return outline(corner);
    }

    /** @return the closed outline through the corners {x, y}, in order */
    private static Shape outline(double[][] corner) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(corner[0][0], corner[0][1]);
        for (int i = 1; i < corner.length; i++) {
            p.lineTo(corner[i][0], corner[i][1]);
        }
        p.closePath();
        return p;
    }

    /** @return data line width */
    public float lineWidth() {
        return 1.1f;
    }

    /** @return marker diameter */
    public double markerSize() {
        return 5.0;
    }

    /** @return the white edge drawn round markers, to lift them off lines beneath */
    public Stroke markerEdge() {
        return new BasicStroke(0.45f);
    }

    /** @return axis line and tick stroke */
    public Stroke axisLine() {
        return new BasicStroke(0.6f, BasicStroke.CAP_SQUARE, BasicStroke.JOIN_MITER);
    }

    /** @return gridline stroke */
    public Stroke gridLine() {
        return new BasicStroke(0.4f);
    }

    /** @return reference line stroke */
    public Stroke referenceLine() {
        return new BasicStroke(0.7f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2.2f, 1.6f}, 0f);
    }

    /** @return the thin solid line from a label moved away to its marker */
    public Stroke leaderLine() {
        return new BasicStroke(0.45f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    }

    /** @return length of major ticks, outside the plot */
    public float majorTick() {
        return 3.2f;
    }

    /** @return length of minor ticks, outside the plot */
    public float minorTick() {
        return 1.8f;
    }

    /** @return font of axis titles */
    public Font axisTitleFont() {
        return BundledFont.atSize(size.fontPoints());
    }

    /** @return font of tick labels */
    public Font tickFont() {
        return BundledFont.atSize(size.fontPoints() - 1);
    }

    /** @return font of legend entries */
    public Font legendFont() {
        return BundledFont.atSize(size.fontPoints() - 1);
    }

    /** @return font of labels written on the plot (point and reference-line labels) */
    public Font annotationFont() {
        return BundledFont.atSize(size.fontPoints() - 1.5);
    }

    /** @return font of the chart title */
    public Font titleFont() {
        return BundledFont.atSize(size.fontPoints() + 1);
    }
}
