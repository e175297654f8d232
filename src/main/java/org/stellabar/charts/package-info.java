/**
 * Publication charts from data the caller computes: one look, exported as PNG, SVG and PDF at
 * journal widths. This package knows no physics; it reads {@link org.stellabar.table} columns
 * at most, and every curve, contour, threshold and marker is handed to it.
 *
 * <h2>Building a chart</h2>
 * A {@link org.stellabar.charts.ChartSpec} holds the axes ({@link org.stellabar.charts.Axis}:
 * label, unit, linear or log, optional fixed range), the {@link org.stellabar.charts.Series}
 * (lines, markers, or both; optionally on a right-hand axis; optionally a label beside each
 * point), {@link org.stellabar.charts.ReferenceLine}s at fixed values, and the
 * {@link org.stellabar.charts.LegendPosition}. Labels are {@link org.stellabar.charts.ScriptedText}
 * markup ({@code "Γ_1"}, {@code "∇_{ad}"}, {@code "1 − β"}); units may be the table unit strings
 * ({@code "g/cm3"} is typeset as g cm⁻³).
 *
 * <pre>{@code
 * ChartSpec spec = ChartSpec.of(Axis.log("ρ", "g/cm3"), Axis.log("T", "K"))
 *         .withSeries(Series.line("β = 0.5", rho, tHalf))
 *         .withSeries(Series.points("centres", rhoC, tC).withPointLabels(names))
 *         .withReferenceLine(ReferenceLine.horizontal(1e9, "pair creation"))
 *         .withLegendNote("lines for μ = 0.617");
 * new ChartExporter(FigureSize.ONE_COLUMN).write(spec, folder, "rho-T", EnumSet.allOf(ChartFormat.class));
 * }</pre>
 *
 * <h2>Guarantees</h2>
 * <ul>
 * <li>No NaN or infinity reaches a chart: {@code Series}, {@code ReferenceLine} and {@code Axis}
 * refuse them with the series and point named.</li>
 * <li>Zero and negative values on a logarithmic axis are left out before any range is computed
 * (a line breaks there); ranges are set by {@code AxisRanges}, never by JFreeChart's autorange.</li>
 * <li>Text is DejaVu Sans, bundled in the jar (Bitstream Vera licence, DejaVu changes public
 * domain; see {@code fonts/LICENSE-DejaVu.txt}), embedded as a subset in PDFs.</li>
 * <li>PNG is 300 dpi with the resolution in its pHYs chunk; SVG and PDF are byte-identical for
 * equal charts; every file is written atomically through
 * {@link org.stellabar.output.AtomicFiles}.</li>
 * <li>No title is drawn: a figure's caption describes it ({@code ChartSpec.title} only names the
 * file in its metadata).</li>
 * <li>Every text is set by {@link org.stellabar.charts.ScriptedText}, tick labels and axis titles
 * included: one style of sub- and superscript, and every letter stays text in PDF and SVG.</li>
 * <li>Inside the plot, text covers no data: the legend, reference-line labels and point labels
 * are placed by one rule ({@code DataAreaText}); what finds no free place moves (a line's label
 * into the legend, the legend below the plot), and the figure check of the test suite reads the
 * PDFs back to confirm it.</li>
 * <li>Each style slot pairs a colour (contrast at least 3:1 on white) with a dash pattern and a
 * marker shape, so series survive greyscale printing.</li>
 * <li>Rendering is headless (no display needed).</li>
 * </ul>
 *
 * <p><b>Internal.</b> Not part of the API (see {@link org.stellabar.api}): public for the other
 * packages of stellabar, and free to change between versions.
 */
package org.stellabar.charts;
