package org.stellabar.cli;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import picocli.CommandLine.Option;

/** The {@code --chart-formats} option shared by commands that draw charts. */
public final class ChartFormatOption {

    /** The words of the chart formats: png, svg, pdf. */
    static final class Words extends EnumWords<ChartFormat> {
        Words() {
            super(List.of(ChartFormat.values()));
        }

        @Override
        String word(ChartFormat format) {
            return format.extension();
        }
    }

    // a bad word is refused while the command line is parsed, before any work
    @Option(names = "--chart-formats", defaultValue = "png,svg,pdf", split = ",", paramLabel = "FORMATS",
            converter = Words.class, completionCandidates = Words.class,
            description = "Chart image formats, comma-separated: png, svg, pdf (default: ${DEFAULT-VALUE}).")
    List<ChartFormat> formats;

    /** @return the formats asked for */
    public Set<ChartFormat> formats() {
        Set<ChartFormat> set = EnumSet.noneOf(ChartFormat.class);
        set.addAll(formats);
        return set;
    }
}
