package org.stellabar.output;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One figure of an exported notebook: columns of a CSV file that sits next to the notebook,
 * drawn as lines against one x column. Knows nothing of physics: names, labels and numbers only.
 *
 * @param title the figure's title, also the comment heading its code cell
 * @param csvFile the CSV file, relative to the notebook, with forward slashes ("profile.csv")
 * @param xColumn the x column's name as in the CSV header without its unit ("r")
 * @param yColumns the y columns' names, drawn in this order, at least one
 * @param xLabel the x-axis label, with its unit ("r [Rsun]"); Matplotlib mathtext between $ signs
 *     is passed through
 * @param yLabel the y-axis label, with its unit
 * @param logX whether the x axis is logarithmic
 * @param logY whether the y axis is logarithmic
 * @param referenceLines horizontal or vertical lines with labels, drawn under the data
 */
public record NotebookPlot(String title, String csvFile, String xColumn, List<String> yColumns, String xLabel,
        String yLabel, boolean logX, boolean logY, List<ReferenceLine> referenceLines) {

    /** Which way a reference line runs. */
    public enum Orientation {
        /** y = value across the plot */
        HORIZONTAL,
        /** x = value up the plot */
        VERTICAL
    }

    /**
     * A labelled straight line marking a value, such as Γ1 = 4/3.
     *
     * @param orientation horizontal (a y value) or vertical (an x value)
     * @param value where, in the axis' data units; finite
     * @param label the legend entry
     */
    public record ReferenceLine(Orientation orientation, double value, String label) {
        /**
         * Canonical constructor: no component may be null; checks ranges and consistency.
         *
         * @param orientation horizontal (a y value) or vertical (an x value)
         * @param value where, in the axis' data units; finite
         * @param label the legend entry
         */
        public ReferenceLine {
            Objects.requireNonNull(orientation, "orientation");
            Objects.requireNonNull(label, "label");
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("reference line '" + label + "' at " + value + " is not finite");
            }
        }
    }

    /**
     * Canonical constructor: no component may be null; checks ranges and consistency; copies collections in.
     *
     * @param title the figure's title, also the comment heading its code cell
     * @param csvFile the CSV file, relative to the notebook, with forward slashes ("profile.csv")
     * @param xColumn the x column's name as in the CSV header without its unit ("r")
     * @param yColumns the y columns' names, drawn in this order, at least one
     * @param xLabel the x-axis label, with its unit ("r [Rsun]"); Matplotlib mathtext between $ signs
     *        is passed through
     * @param yLabel the y-axis label, with its unit
     * @param logX whether the x axis is logarithmic
     * @param logY whether the y axis is logarithmic
     * @param referenceLines horizontal or vertical lines with labels, drawn under the data
     */
    public NotebookPlot {
        requireText(title, "title");
        requireText(csvFile, "csvFile");
        if (csvFile.startsWith("/") || csvFile.contains("\\") || csvFile.matches("^[A-Za-z]:.*")) {
            throw new IllegalArgumentException("csvFile '" + csvFile
                    + "' must be a path relative to the notebook, with forward slashes");
        }
        requireText(xColumn, "xColumn");
        yColumns = List.copyOf(yColumns);
        if (yColumns.isEmpty()) {
            throw new IllegalArgumentException("plot '" + title + "' has no y column");
        }
        yColumns.forEach(y -> requireText(y, "yColumns"));
        Objects.requireNonNull(xLabel, "xLabel");
        Objects.requireNonNull(yLabel, "yLabel");
        referenceLines = List.copyOf(referenceLines);
        for (ReferenceLine line : referenceLines) {
            boolean onLogAxis = line.orientation() == Orientation.HORIZONTAL ? logY : logX;
            if (onLogAxis && line.value() <= 0) {
                throw new IllegalArgumentException("reference line '" + line.label() + "' at " + line.value()
                        + " cannot be drawn on the logarithmic axis of plot '" + title + "'");
            }
        }
    }

    /**
     * A plot with linear axes and no reference lines.
     *
     * @param title figure title
     * @param csvFile CSV file relative to the notebook
     * @param xColumn x column name
     * @param yColumns y column names
     * @param xLabel x-axis label with unit
     * @param yLabel y-axis label with unit
     * @return the plot
     */
    public static NotebookPlot of(String title, String csvFile, String xColumn, List<String> yColumns,
            String xLabel, String yLabel) {
        return new NotebookPlot(title, csvFile, xColumn, yColumns, xLabel, yLabel, false, false, List.of());
    }

    /** @return a copy with a logarithmic x axis */
    public NotebookPlot withLogX() {
        return new NotebookPlot(title, csvFile, xColumn, yColumns, xLabel, yLabel, true, logY, referenceLines);
    }

    /** @return a copy with a logarithmic y axis */
    public NotebookPlot withLogY() {
        return new NotebookPlot(title, csvFile, xColumn, yColumns, xLabel, yLabel, logX, true, referenceLines);
    }

    /**
     * @param y where, in y data units
     * @param label legend entry
     * @return a copy with one more horizontal reference line
     */
    public NotebookPlot withHorizontalLine(double y, String label) {
        return withLine(new ReferenceLine(Orientation.HORIZONTAL, y, label));
    }

    /**
     * @param x where, in x data units
     * @param label legend entry
     * @return a copy with one more vertical reference line
     */
    public NotebookPlot withVerticalLine(double x, String label) {
        return withLine(new ReferenceLine(Orientation.VERTICAL, x, label));
    }

    private NotebookPlot withLine(ReferenceLine line) {
        List<ReferenceLine> more = new ArrayList<>(referenceLines);
        more.add(line);
        return new NotebookPlot(title, csvFile, xColumn, yColumns, xLabel, yLabel, logX, logY, more);
    }

    private static void requireText(String text, String what) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("notebook plot: " + what + " is empty");
        }
    }
}
