package org.stellabar.cli;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.stellabar.charts.ChartFormat;

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

    /** The formats given; null when the option is not given and has no default. */
    List<ChartFormat> formats;

    /** @param m the command that takes {@code --chart-formats} */
    void describe(CommandModel m) {
        // a bad word is refused while the command line is parsed, before any work
        m.option("--chart-formats").label("FORMATS").defaultValue("png,svg,pdf").split(",").converter(new Words())
                .candidates(new Words())
                .description("Chart image formats, comma-separated: png, svg, pdf (default: ${DEFAULT-VALUE}).")
                .field(this, "formats");
    }

    /** @return the formats asked for */
    public Set<ChartFormat> formats() {
        Set<ChartFormat> set = EnumSet.noneOf(ChartFormat.class);
        set.addAll(formats);
        return set;
    }
}
