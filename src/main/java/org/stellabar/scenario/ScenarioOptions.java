package org.stellabar.scenario;

import java.util.Optional;
import org.stellabar.output.TableFormat;

import java.util.Collection;
import java.util.Collections;
import java.util.EnumSet;
import java.util.Set;
import org.stellabar.charts.ChartFormat;

/**
 * Settings of a scenario run as a whole, as opposed to those of each star.
 *
 * @param chartFormats image formats every chart is exported in (may be empty: no images)
 * @param notebook whether the run also writes a notebook that reloads and plots the profiles
 * @param tableFormats the formats of the run's own tables (the summary, the demo's catalogue),
 *     when the file or the command line chose them ({@code table_formats}, {@code --table-formats});
 *     empty for each table's default formats
 */
public record ScenarioOptions(Set<ChartFormat> chartFormats, boolean notebook, Optional<Set<TableFormat>> tableFormats) {

    /** Chart formats when none are asked for: one raster, one vector. */
    public static final Set<ChartFormat> DEFAULT_CHART_FORMATS =
            Collections.unmodifiableSet(EnumSet.of(ChartFormat.PNG, ChartFormat.SVG));

    /** The options of a scenario file that sets none. */
    public static final ScenarioOptions DEFAULTS = new ScenarioOptions(DEFAULT_CHART_FORMATS, true, Optional.empty());

    /**
     * Canonical constructor: copies collections in.
     *
     * @param chartFormats image formats every chart is exported in (may be empty: no images)
     * @param notebook whether the run also writes a notebook that reloads and plots the profiles
     * @param tableFormats the formats of the run's own tables, or empty for the defaults
     */
    public ScenarioOptions {
        chartFormats = ScenarioStar.enumSet(ChartFormat.class, chartFormats);
        tableFormats = tableFormats.map(f -> ScenarioStar.enumSet(TableFormat.class, f));
    }

    /**
     * @param formats the chart formats, none for no charts
     * @return a copy exporting charts in these formats
     */
    public ScenarioOptions withChartFormats(Collection<ChartFormat> formats) {
        return new ScenarioOptions(ScenarioStar.enumSet(ChartFormat.class, formats), notebook, tableFormats);
    }

    /**
     * @param write true to write the notebook
     * @return a copy with the notebook switched on or off
     */
    public ScenarioOptions withNotebook(boolean write) {
        return new ScenarioOptions(chartFormats, write, tableFormats);
    }

    /**
     * @param formats the table formats
     * @return a copy writing the run's own tables in these formats
     */
    public ScenarioOptions withTableFormats(Collection<TableFormat> formats) {
        return new ScenarioOptions(chartFormats, notebook, Optional.of(ScenarioStar.enumSet(TableFormat.class, formats)));
    }

    /**
     * @param defaults a table's own default formats
     * @return the formats chosen for the run, else those defaults
     */
    public Set<TableFormat> tableFormatsOr(Set<TableFormat> defaults) {
        return tableFormats.orElse(defaults);
    }
}
