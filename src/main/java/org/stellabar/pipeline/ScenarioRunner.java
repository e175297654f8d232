package org.stellabar.pipeline;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.IntStream;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.Palette;
import org.stellabar.eos.Composition;
import org.stellabar.output.NotebookContent;
import org.stellabar.output.NotebookPlot;
import org.stellabar.output.NotebookWriter;
import org.stellabar.output.OutputFolder;
import org.stellabar.output.TableFormat;
import org.stellabar.output.TextWriter;
import org.stellabar.physics.BadInputException;
import org.stellabar.physics.Constants;
import org.stellabar.scenario.Scenario;
import org.stellabar.scenario.StarSpec;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarModelSummary;
import org.stellabar.structure.StarRequestException;
import org.stellabar.survey.RegimeLines;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Runs a scenario: builds every star, then writes per-star profiles and charts, the cluster
 * summary (CSV, JSON, FITS), the cluster charts and the notebook. Models are all computed before
 * the first file is written.
 */
public final class ScenarioRunner {

    private final StarBuilder builder;

    /** A runner with the default structure solvers. */
    public ScenarioRunner() {
        this(new StarBuilder());
    }

    /** @param builder the star builder to use */
    public ScenarioRunner(StarBuilder builder) {
        this.builder = builder;
    }

    /**
     * @param scenario the scenario
     * @param layout where to write
     * @param progress receives one line per star and per stage (for a terminal)
     * @return the models, the summary and the files written
     * @throws BadInputException when a star cannot be built (naming the star), before anything is written
     * @throws IOException when a file cannot be written
     */
    public RunResult run(Scenario scenario, RunLayout layout, Consumer<String> progress) throws IOException {
        try {
            return runUnchecked(scenario, layout, progress);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private RunResult runUnchecked(Scenario scenario, RunLayout layout, Consumer<String> progress) throws IOException {
        List<StarModel> models = new ArrayList<>();
        int k = 0;
        for (StarSpec spec : scenario.stars()) {
            k++;
            long start = System.nanoTime();
            StarModel model = build(scenario, spec);
            models.add(model);
            progress.accept(String.format(Locale.ROOT, "star %d/%d %s (%s%s): %.2f s", k, scenario.stars().size(),
                    spec.name(), model.summary().kind().name(),
                    Double.isNaN(model.summary().index()) ? "" : ", n = " + model.summary().index(),
                    (System.nanoTime() - start) * 1e-9));
        }
        List<String> notes = new ArrayList<>(StarBuilder.PHYSICS);
        Table summary = ClusterSummaryTable.of(scenario.name(), source(scenario), models, notes);

        List<Path> files = new ArrayList<>();
        Set<ChartFormat> chartFormats = scenario.options().chartFormats();
        long start = System.nanoTime();
        // Stars are independent: write them in parallel, then list their files in scenario order.
        List<List<Path>> perStar = IntStream.range(0, models.size()).parallel()
                .mapToObj(i -> writeStar(models.get(i), scenario.stars().get(i), layout, chartFormats)).toList();
        perStar.forEach(files::addAll);
        progress.accept(String.format(Locale.ROOT, "star tables and charts: %.2f s", (System.nanoTime() - start) * 1e-9));

        start = System.nanoTime();
        OutputFolder top = new OutputFolder(layout.outputFolder());
        files.add(top.csv("summary.csv", summary));
        files.add(top.json("summary.json", summary));
        files.add(top.fits("summary.fits", summary));

        EddingtonStandardModel standardModel = builder.standardModel();
        for (Map.Entry<String, ChartSpec> c : ClusterFigures.of(models, standardModel).entrySet()) {
            files.addAll(FigureExport.bothWidths(c.getValue(), layout.chartFolder(), c.getKey(), chartFormats));
        }
        files.addAll(FigureExport.bothWidths(plane(models), layout.chartFolder(), "rho-T-plane", chartFormats));
        progress.accept(String.format(Locale.ROOT, "summary and cluster charts: %.2f s",
                (System.nanoTime() - start) * 1e-9));

        if (scenario.options().notebook()) {
            NotebookContent content = notebook(scenario, summary.metadata(), layout, files);
            new NotebookWriter(Palette.hexCodes()).write(content, layout.notebook());
            files.add(layout.notebook());
        }
        return new RunResult(models, summary, files);
    }

    private static List<Path> writeStar(StarModel model, StarSpec spec, RunLayout layout, Set<ChartFormat> formats) {
        List<Path> files = new ArrayList<>();
        String slug = FileNames.slug(spec.name());
        try {
            OutputFolder stars = new OutputFolder(layout.starFolder());
            if (spec.outputs().contains(TableFormat.CSV)) {
                files.add(stars.csv(slug + ".csv", model.profile()));
            }
            if (spec.outputs().contains(TableFormat.FITS)) {
                files.add(stars.fits(slug + ".fits", model.profile()));
            }
            if (spec.outputs().contains(TableFormat.JSON)) {
                files.add(stars.json(slug + ".json", StarModelSummary.of(model, true)));
            }
            for (Map.Entry<String, ChartSpec> c : StarFigures.of(model, spec.charts()).entrySet()) {
                files.addAll(FigureExport.bothWidths(c.getValue(), layout.chartFolder(), slug + "-" + c.getKey(), formats));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return files;
    }

    /**
     * Builds every star of a scenario and returns their centres, for marking on a ρ–T chart.
     *
     * @param scenario the scenario
     * @return one marker per star, in scenario order
     */
    public List<PlaneFigure.Marker> centres(Scenario scenario) {
        List<PlaneFigure.Marker> markers = new ArrayList<>();
        for (StarSpec spec : scenario.stars()) {
            var c = build(scenario, spec).summary().centre();
            markers.add(new PlaneFigure.Marker(spec.name(), c.rho(), c.T()));
        }
        return markers;
    }

    private StarModel build(Scenario scenario, StarSpec spec) {
        try {
            return builder.build(StarRequests.of(spec));
        } catch (StarRequestException e) {
            throw new BadInputException(source(scenario) + ": star '" + spec.name() + "': " + e.getMessage());
        } catch (BadInputException e) {
            throw e.about(source(scenario) + ": star '" + spec.name() + "'");
        }
    }

    private static ChartSpec plane(List<StarModel> models) {
        Composition mixture = models.get(0).summary().composition();
        double tMin = 1e5;
        double tMax = 1e10;
        double rhoMin = 1e-6;
        double rhoMax = 1e6;
        List<PlaneFigure.Marker> markers = new ArrayList<>();
        for (StarModel m : models) {
            var c = m.summary().centre();
            markers.add(new PlaneFigure.Marker(m.summary().name(), c.rho(), c.T()));
            rhoMin = Math.min(rhoMin, c.rho() / 10);
            rhoMax = Math.max(rhoMax, c.rho() * 10);
        }
        Table lines = RegimeLines.table(mixture, tMin, tMax, 200, RegimeLines.DEFAULT_BETAS);
        return PlaneFigure.of(lines, RegimeLines.DEFAULT_BETAS, rhoMin, rhoMax, markers)
                .withTitle(String.format(Locale.ROOT, "lines for μ = %.3f", mixture.mu()));
    }

    private static NotebookContent notebook(Scenario scenario, Metadata metadata, RunLayout layout, List<Path> files) {
        String summaryCsv = layout.relativeToNotebook(layout.outputFolder().resolve("summary.csv"));
        List<NotebookPlot> plots = new ArrayList<>();
        plots.add(NotebookPlot.of("Radiation pressure fraction at the centre", summaryCsv, "M",
                List.of("one_minus_beta_c"), "M [Msun]", "1 - beta (centre)").withLogX().withLogY());
        plots.add(NotebookPlot.of("Stability: pressure-weighted Gamma1 - 4/3 and the GR threshold", summaryCsv, "M",
                List.of("newtonian_margin", "gr_threshold"), "M [Msun]", "<Gamma1> - 4/3").withLogX().withLogY());
        for (StarSpec spec : scenario.stars()) {
            Path csv = layout.starFolder().resolve(FileNames.slug(spec.name()) + ".csv");
            if (!files.contains(csv)) {
                continue;
            }
            String rel = layout.relativeToNotebook(csv);
            plots.add(NotebookPlot.of(spec.name() + ": density, pressure and temperature", rel, "r_over_R",
                    List.of("rho"), "r/R", "rho [g/cm3]").withLogY());
            plots.add(NotebookPlot.of(spec.name() + ": beta and Gamma1", rel, "m_over_M", List.of("beta", "Gamma1"),
                    "m/M", "beta, Gamma1").withHorizontalLine(4.0 / 3.0, "Gamma1 = 4/3"));
        }
        StringBuilder stars = new StringBuilder("\n\n| star | kind | n | M [Msun] | given | X | Y | Z | mu |\n"
                + "| --- | --- | --- | ---: | --- | ---: | ---: | ---: | ---: |\n");
        for (StarSpec spec : scenario.stars()) {
            String given = spec.radius().isPresent()
                    ? "R = " + TextWriter.format(spec.radius().getAsDouble() / Constants.SOLAR_RADIUS) + " Rsun"
                    : spec.centralTemperature().isPresent()
                            ? "T_c = " + TextWriter.format(spec.centralTemperature().getAsDouble()) + " K"
                            : "s = " + TextWriter.format(spec.entropyPerBaryon().orElse(0)) + " k_B per baryon";
            var c = spec.composition();
            stars.append(String.format(Locale.ROOT, "| %s | %s | %s | %s | %s | %s | %s | %s | %s |%n",
                    spec.name(), spec.kind().word(), spec.index().isPresent() ? TextWriter.format(spec.index()
                            .getAsDouble()) : spec.kind().word().equals("standard") ? "3" : "-",
                    TextWriter.format(spec.mass() / Constants.SOLAR_MASS), given, TextWriter.format(c.X()),
                    TextWriter.format(c.Y()), TextWriter.format(c.Z()), TextWriter.format(c.mu())));
        }
        String description = NotebookWriter.describe(metadata) + stars + "\nScenario: " + scenario.description()
                + "\n\nMasses in the summary are in solar masses (IAU 2015 nominal, M_sun = "
                + Constants.SOLAR_MASS + " g).";
        return new NotebookContent("stellabar scenario " + scenario.name(), description, plots);
    }

    private static String source(Scenario scenario) {
        return scenario.source();
    }
}
