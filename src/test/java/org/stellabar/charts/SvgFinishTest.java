package org.stellabar.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * {@link SvgChartWriter#finish} against the regular expressions it replaces: the document type
 * ({@code <!DOCTYPE[^>]*>\s*}, first only) dropped, the XML declaration given its encoding, and
 * every {@code font-family="[^"]*"} attribute given the fallback list.
 */
class SvgFinishTest {

    private static final Pattern DOCTYPE = Pattern.compile("<!DOCTYPE[^>]*>\\s*");
    private static final Pattern FONT_FAMILY = Pattern.compile("font-family=\"[^\"]*\"");

    private static String byPatterns(String svg) {
        String out = DOCTYPE.matcher(svg).replaceFirst("");
        if (out.startsWith("<?xml version=\"1.0\"?>")) {
            out = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>" + out.substring("<?xml version=\"1.0\"?>".length());
        }
        return FONT_FAMILY.matcher(out).replaceAll(Matcher.quoteReplacement(SvgChartWriter.FONT_STACK));
    }

    @Test
    void finishEqualsThePatternsOnChartsAndEdgeCases() {
        String[] inputs = {
            "<?xml version=\"1.0\"?>\n<!DOCTYPE svg PUBLIC '-//W3C//DTD SVG 1.0//EN' 'x.dtd'>\n \t<svg>"
                + "<text font-family=\"'Dialog'\" x=\"1\">a</text><g font-family=\"sans-serif\"/></svg>",
            "<svg font-family=\"\"><!DOCTYPE no end",
            "<?xml version=\"1.0\"?><svg/>",
            "<!DOCTYPE a><!DOCTYPE b>\n<svg font-family=\"x\" font-family=\"unclosed",
            "",
            "font-family=\"a\"font-family=\"b\"",
            "<?xml version=\"1.0\" encoding=\"UTF-8\"?><svg/>",
        };
        for (String in : inputs) {
            assertEquals(byPatterns(in), SvgChartWriter.finish(in), in);
        }
    }

    @Test
    void finishEqualsThePatternsOnARealChart() throws Exception {
        ChartSpec spec = ExampleCharts.twoAxisProfile();
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        new SvgChartWriter().write(new ChartRenderer(FigureSize.ONE_COLUMN).render(spec), FigureSize.ONE_COLUMN, "t",
                out);
        String svg = out.toString(java.nio.charset.StandardCharsets.UTF_8);
        // a written file has been finished once; finishing it again must change nothing either way
        assertEquals(byPatterns(svg), SvgChartWriter.finish(svg));
    }
}
