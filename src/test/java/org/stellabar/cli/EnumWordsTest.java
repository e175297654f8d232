package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import picocli.CommandLine.TypeConversionException;

class EnumWordsTest {

    @Test
    void readsWordsIgnoringCaseAndSpaces() {
        ChartFormatOption.Words words = new ChartFormatOption.Words();
        assertEquals(ChartFormat.SVG, words.convert("svg"));
        assertEquals(ChartFormat.PNG, words.convert(" PNG "));
    }

    @Test
    void listsTheAllowedWordsInOrder() {
        List<String> listed = new ArrayList<>();
        new TableFormatsOption.Words().forEach(listed::add);
        assertEquals(List.of("csv", "ecsv", "fits", "votable", "json"), listed);
    }

    // A format's file extension is not its word ("vot" is the extension of "votable").
    @Test
    void refusesWordsOutsideTheAllowedOnesNamingValueAndChoices() {
        TypeConversionException e = assertThrows(TypeConversionException.class,
                () -> new TableFormatsOption.Words().convert(TableFormat.VOTABLE.extension()));
        assertTrue(e.getMessage().contains("'vot'") && e.getMessage().contains("csv, ecsv, fits, votable, json"),
                e.getMessage());
    }

    @Test
    void aBadChartFormatIsOneLineNamingTheOptionTheValueAndTheChoices() {
        CliRun r = CliRun.of("polytrope", "--index", "1", "--chart-formats", "png,gif");
        assertEquals(2, r.exitCode(), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
        for (String part : new String[] {"--chart-formats", "'gif'", "png, svg, pdf"}) {
            assertTrue(r.err().contains(part), r.err());
        }
    }
}
