package org.stellabar.cli;

import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.stellabar.charts.ChartFormat;
import org.stellabar.physics.BadInputException;
import picocli.CommandLine.Option;

/** The {@code --chart-formats} option shared by commands that draw charts. */
public final class ChartFormatOption {

    @Option(names = "--chart-formats", defaultValue = "png,svg,pdf", split = ",", paramLabel = "FORMATS",
            description = "Chart image formats, comma-separated: png, svg, pdf (default: ${DEFAULT-VALUE}).")
    List<String> names;

    /** @return the formats asked for */
    public Set<ChartFormat> formats() {
        Set<ChartFormat> set = EnumSet.noneOf(ChartFormat.class);
        for (String f : names) {
            try {
                set.add(ChartFormat.valueOf(f.strip().toUpperCase(Locale.ROOT)));
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--chart-formats: '" + f + "' is not allowed; choose from png, svg, pdf");
            }
        }
        return set;
    }
}
