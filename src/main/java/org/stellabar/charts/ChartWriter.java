package org.stellabar.charts;

import java.io.IOException;
import java.io.OutputStream;
import org.jfree.chart.JFreeChart;

/** Draws a chart at its printed size into one file format. */
interface ChartWriter {

    /**
     * @param chart the chart
     * @param size the printed size
     * @param title a plain document title for formats that store one
     * @param out where the bytes go (not closed here)
     * @throws IOException if writing fails
     */
    void write(JFreeChart chart, FigureSize size, String title, OutputStream out) throws IOException;
}
