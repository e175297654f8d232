package org.stellabar.charts;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything a chart shows, built by the caller and handed to {@link ChartRenderer}. The charts
 * package knows no physics: the caller computes every curve, contour and marker.
 *
 * <pre>{@code
 * ChartSpec spec = ChartSpec.of(Axis.linear("m/M", ""), Axis.linear("β", ""))
 *         .withSecondaryYAxis(Axis.linear("Γ_1", ""))
 *         .withSeries(Series.line("β", m, beta))
 *         .withSeries(Series.line("Γ_1", m, gamma1).onSecondaryAxis())
 *         .withReferenceLine(ReferenceLine.horizontal(4.0 / 3.0, "Γ_1 = 4/3").onSecondaryAxis())
 *         .withLegend(LegendPosition.INSIDE_BOTTOM_LEFT);
 * }</pre>
 *
 * @param title the figure's name in markup, "" for none: written into the file's metadata (SVG
 *     title, PDF document title) but never drawn, since a journal figure's title is its caption
 * @param xAxis the horizontal axis
 * @param yAxis the left vertical axis
 * @param secondaryYAxis the right vertical axis, or null for none; if present, some series
 *     must use it by the time the chart is drawn
 * @param series the series in drawing and legend order; at least one by the time the chart is
 *     drawn
 * @param referenceLines straight lines at fixed values
 * @param legend where the legend goes
 * @param labelLayout how point labels are placed
 * @param legendNote markup written as the legend's first line, without a symbol, "" for none:
 *     what holds for every curve (e.g. "lines for μ = 0.617"), which a paper figure would
 *     otherwise put in a title
 */
public record ChartSpec(String title, Axis xAxis, Axis yAxis, Axis secondaryYAxis, List<Series> series,
        List<ReferenceLine> referenceLines, LegendPosition legend, LabelLayout labelLayout, String legendNote) {

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param title a title above the plot in markup, "" for none (journal figures carry their title
     *        in the caption)
     * @param xAxis the horizontal axis
     * @param yAxis the left vertical axis
     * @param secondaryYAxis the right vertical axis, or null for none; if present, some series
     *        must use it by the time the chart is drawn
     * @param series the series in drawing and legend order; at least one by the time the chart is
     *        drawn
     * @param referenceLines straight lines at fixed values
     * @param legend where the legend goes
     * @param labelLayout how point labels are placed
     * @param legendNote markup written as the legend's first line, without a symbol, "" for none
     */
    public ChartSpec {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(xAxis, "xAxis");
        Objects.requireNonNull(yAxis, "yAxis");
        Objects.requireNonNull(legend, "legend");
        Objects.requireNonNull(labelLayout, "labelLayout");
        Objects.requireNonNull(legendNote, "legendNote");
        ScriptedText.parse(title);
        ScriptedText.parse(legendNote);
        series = List.copyOf(series);
        referenceLines = List.copyOf(referenceLines);
        boolean secondaryUsed = false;
        for (Series s : series) {
            secondaryUsed |= s.axis() == YAxisSide.SECONDARY;
        }
        if (secondaryUsed && secondaryYAxis == null) {
            throw new IllegalArgumentException("a series is on the secondary y axis, but the chart has none");
        }
        for (ReferenceLine r : referenceLines) {
            if (r.axis() == YAxisSide.SECONDARY && secondaryYAxis == null) {
                throw new IllegalArgumentException("reference line \"" + r.label()
                        + "\" is on the secondary y axis, but the chart has none");
            }
        }
    }

    /**
     * @param xAxis the horizontal axis
     * @param yAxis the left vertical axis
     * @return a spec with no series yet, no title and the legend placed automatically
     */
    public static ChartSpec of(Axis xAxis, Axis yAxis) {
        return new ChartSpec("", xAxis, yAxis, null, List.of(), List.of(), LegendPosition.AUTO,
                LabelLayout.APART, "");
    }

    /** @return the right axis, if any */
    public Optional<Axis> secondary() {
        return Optional.ofNullable(secondaryYAxis);
    }

    /**
     * @param newTitle the title, in the charts' markup
     * @return this spec with a title
     */
    public ChartSpec withTitle(String newTitle) {
        return new ChartSpec(newTitle, xAxis, yAxis, secondaryYAxis, series, referenceLines, legend, labelLayout, legendNote);
    }

    /**
     * @param axis the right-hand axis
     * @return this spec with a right-hand axis, for series and lines added with onSecondaryAxis()
     */
    public ChartSpec withSecondaryYAxis(Axis axis) {
        Objects.requireNonNull(axis, "axis");
        return new ChartSpec(title, xAxis, yAxis, axis, series, referenceLines, legend, labelLayout, legendNote);
    }

    /**
     * @param s the series
     * @return this spec with one more series, drawn after (above) the others
     */
    public ChartSpec withSeries(Series s) {
        List<Series> more = new ArrayList<>(series);
        more.add(s);
        return new ChartSpec(title, xAxis, yAxis, secondaryYAxis, more, referenceLines, legend, labelLayout, legendNote);
    }

    /**
     * @param line the reference line
     * @return this spec with one more reference line
     */
    public ChartSpec withReferenceLine(ReferenceLine line) {
        List<ReferenceLine> more = new ArrayList<>(referenceLines);
        more.add(line);
        return new ChartSpec(title, xAxis, yAxis, secondaryYAxis, series, more, legend, labelLayout, legendNote);
    }

    /**
     * @param position where the legend goes
     * @return this spec with the legend elsewhere
     */
    public ChartSpec withLegend(LegendPosition position) {
        return new ChartSpec(title, xAxis, yAxis, secondaryYAxis, series, referenceLines, position, labelLayout, legendNote);
    }

    /**
     * @param layout how point labels are placed
     * @return this spec with its point labels placed another way
     */
    public ChartSpec withLabelLayout(LabelLayout layout) {
        return new ChartSpec(title, xAxis, yAxis, secondaryYAxis, series, referenceLines, legend, layout, legendNote);
    }

    /**
     * @param note markup written as the legend's first line, "" for none
     * @return this spec with a line of text heading the legend
     */
    public ChartSpec withLegendNote(String note) {
        return new ChartSpec(title, xAxis, yAxis, secondaryYAxis, series, referenceLines, legend, labelLayout, note);
    }

    /** @return the axis a series or horizontal line is measured on */
    Axis yAxis(YAxisSide side) {
        return side == YAxisSide.PRIMARY ? yAxis : secondaryYAxis;
    }
}
