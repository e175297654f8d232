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
import org.stellabar.structure.ProfileTable;
import org.stellabar.eos.EosQuantities;
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
import org.stellabar.scenario.ScenarioStar;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.eos.Electrons;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.ScaleAnchor;
import org.stellabar.structure.StarSchema;
import org.stellabar.structure.StarRequest;
import org.stellabar.structure.StarRequestException;
import org.stellabar.survey.RegimeLines;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * Runs a scenario: builds every star, then writes per-star profiles and charts, the cluster
 * summary (CSV, JSON, FITS), the cluster charts and the notebook. Models are all computed before
 * the first file is written.
 */
public final class ScenarioRunner {

    /** The summary's formats when the scenario chooses none. */
    public static final java.util.Set<TableFormat> SUMMARY_FORMATS = java.util.Collections.unmodifiableSet(
            java.util.EnumSet.of(TableFormat.CSV, TableFormat.FITS, TableFormat.JSON, TableFormat.ECSV));

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
        return write(scenario, buildAll(scenario, progress), layout, progress);
    }

    /**
     * Builds every star of a scenario. The stars are independent, so they are built on all
     * cores; the progress lines and the first failure are those of a build in scenario order
     * (each model is the same, bit for bit, whichever thread builds it).
     *
     * @param scenario the scenario
     * @param progress receives one line per star, in scenario order
     * @return the models, in scenario order
     * @throws BadInputException when a star cannot be built (naming the first such star)
     */
    public List<StarModel> buildAll(Scenario scenario, Consumer<String> progress) {
        List<ScenarioStar> stars = scenario.stars();
        List<Built> built = buildInParallel(scenario);
        List<StarModel> models = new ArrayList<>();
        for (int k = 0; k < built.size(); k++) {
            Built b = built.get(k);
            if (b.failure() != null) {
                throw b.failure();
            }
            StarModel model = b.model();
            models.add(model);
            progress.accept(String.format(Locale.US, "star %d/%d %s (%s%s): %.2f s", k + 1, stars.size(),
                    stars.get(k).name(), model.headline().kind().word(),
                    model.headline().index().isEmpty() ? "" : ", n = " + model.headline().index().getAsDouble(),
                    b.seconds()));
        }
        return models;
    }

    /**
     * Builds every star on a pool of one thread per core, the costliest kinds first (a fermi
     * isentropic core takes tens of cheaper stars' time; started last it would finish alone).
     *
     * @return one result per star, in scenario order
     */
    private List<Built> buildInParallel(Scenario scenario) {
        List<ScenarioStar> stars = scenario.stars();
        int threads = Math.min(stars.size(), Runtime.getRuntime().availableProcessors());
        if (threads <= 1) {
            return stars.stream().map(s -> timedBuild(scenario, s)).toList();
        }
        Integer[] order = new Integer[stars.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, java.util.Comparator.comparingInt((Integer i) -> -costRank(stars.get(i)))
                .thenComparingInt(i -> i));
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads,
                r -> {
                    Thread t = new Thread(r, "star-builder");
                    t.setDaemon(true);
                    return t;
                });
        try {
            List<java.util.concurrent.Future<Built>> futures = new ArrayList<>(java.util.Collections.nCopies(
                    stars.size(), null));
            for (int i : order) {
                futures.set(i, pool.submit(() -> timedBuild(scenario, stars.get(i))));
            }
            List<Built> built = new ArrayList<>();
            for (java.util.concurrent.Future<Built> f : futures) {
                built.add(f.get());
            }
            return built;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while building the stars", e);
        } catch (java.util.concurrent.ExecutionException e) {
            // timedBuild catches what a build throws; anything else is an Error
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }

    /** A rough order of a star's build cost: fermi isentropic, isentropic, polytrope, standard. */
    private static int costRank(ScenarioStar star) {
        StarRequest request = star.request();
        int rank = switch (request.kind()) {
            case isentropic -> 2;
            case polytrope -> 1;
            case standard -> 0;
        };
        return request.electrons() == Electrons.fermi ? rank + 3 : rank;
    }

    /** One star's build: its model, or the failure that names it, and the time it took. */
    private record Built(StarModel model, RuntimeException failure, double seconds) {
    }

    private Built timedBuild(Scenario scenario, ScenarioStar spec) {
        long start = System.nanoTime();
        try {
            StarModel model = build(scenario, spec);
            return new Built(model, null, (System.nanoTime() - start) * 1e-9);
        } catch (RuntimeException e) {
            return new Built(null, e, (System.nanoTime() - start) * 1e-9);
        }
    }

    /**
     * Writes the stars of a scenario, already built: per-star profiles and charts, the summary,
     * the cluster charts and the notebook.
     *
     * @param scenario the scenario
     * @param models its stars, built, in scenario order
     * @param layout where to write
     * @param progress receives one line per stage
     * @return the models, the summary and the files written
     * @throws IOException when a file cannot be written
     */
    public RunResult write(Scenario scenario, List<StarModel> models, RunLayout layout, Consumer<String> progress)
            throws IOException {
        if (models.size() != scenario.stars().size()) {
            throw new IllegalArgumentException(models.size() + " models for " + scenario.stars().size() + " stars");
        }
        try {
            return writeUnchecked(scenario, models, layout, progress);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    private RunResult writeUnchecked(Scenario scenario, List<StarModel> models, RunLayout layout,
            Consumer<String> progress) throws IOException {
        List<String> notes = new ArrayList<>(StarBuilder.PHYSICS);
        List<String> fermiStars = models.stream().filter(m -> m.request().electrons() == Electrons.fermi)
                .map(m -> m.request().name()).toList();
        if (!fermiStars.isEmpty()) {
            // a summary of classical stars only stays as it was; otherwise it says which star used which
            notes.set(0, notes.get(0) + " (stars with electrons = classical)");
            notes.add("electrons = fermi for: " + String.join(", ", fermiStars));
            notes.addAll(StarBuilder.FERMI_PHYSICS);
        }
        Table summary = StarSchema.table("summary", summaryMetadata(scenario, notes), models);

        Set<ChartFormat> chartFormats = scenario.options().chartFormats();
        // every folder the run writes into exists before the first file: a file in the way of
        // one fails the run before anything is written
        for (Path folder : List.of(layout.outputFolder(), layout.starFolder(), layout.chartFolder())) {
            java.nio.file.Files.createDirectories(folder);
        }
        long start = System.nanoTime();
        // Every table and every chart in every width and format is an independent file: write
        // them all on all cores, listed (and named) in the order of a sequential run.
        FileTasks tasks = new FileTasks();
        for (int i = 0; i < models.size(); i++) {
            addStar(tasks, models.get(i), scenario.stars().get(i), layout, chartFormats);
        }
        OutputFolder top = new OutputFolder(layout.outputFolder());
        for (TableFormat f : scenario.options().tableFormatsOr(SUMMARY_FORMATS)) {
            tasks.add(top.folder().resolve("summary." + f.extension()), () -> List.of(top.table("summary", summary, f)));
        }
        EddingtonStandardModel standardModel = builder.standardModel();
        for (Map.Entry<String, ChartSpec> c : ClusterFigures.of(models, standardModel).entrySet()) {
            tasks.addAll(FigureExport.tasks(c.getValue(), layout.chartFolder(), c.getKey(), chartFormats));
        }
        tasks.addAll(FigureExport.tasks(plane(models), layout.chartFolder(), "rho-T-plane", chartFormats));
        List<Path> files = new ArrayList<>(tasks.runAll());
        progress.accept(String.format(Locale.US, "tables and charts: %.2f s", (System.nanoTime() - start) * 1e-9));

        boolean csvWritten = files.stream().anyMatch(f -> f.getFileName().toString().endsWith(".csv"));
        if (scenario.options().notebook() && !csvWritten) {
            // the notebook plots from the CSV tables, which the chosen formats left out
            progress.accept("notebook: not written, it reads the CSV tables and the table formats have no csv");
        } else if (scenario.options().notebook()) {
            NotebookContent content = notebook(scenario, models, summary.metadata(), layout, files);
            new NotebookWriter(Palette.hexCodes()).write(content, layout.notebook());
            files.add(layout.notebook());
        }
        return new RunResult(models, summary, files);
    }

    /**
     * Every chart a run of the scenario writes, by file name without width and extension, in the
     * order the run writes them: each star's charts, then the cluster's and the ρ–T plane.
     *
     * @param scenario the scenario
     * @param models its stars, built, in scenario order
     * @return chart specs by file base name
     */
    public Map<String, ChartSpec> figures(Scenario scenario, List<StarModel> models) {
        Map<String, ChartSpec> all = new java.util.LinkedHashMap<>();
        for (int i = 0; i < models.size(); i++) {
            String slug = FileNames.slug(scenario.stars().get(i).name());
            StarFigures.of(models.get(i), scenario.stars().get(i).charts()).forEach((k, v) -> all.put(slug + "-" + k, v));
        }
        all.putAll(ClusterFigures.of(models, builder.standardModel()));
        all.put("rho-T-plane", plane(models));
        return all;
    }

    private static void addStar(FileTasks tasks, StarModel model, ScenarioStar spec, RunLayout layout,
            Set<ChartFormat> formats) {
        String slug = FileNames.slug(spec.name());
        OutputFolder stars = new OutputFolder(layout.starFolder());
        for (TableFormat f : spec.outputs()) {
            Path file = stars.folder().resolve(slug + "." + f.extension());
            // a star's JSON is its summary with the profile inside; the other formats hold the profile
            tasks.add(file, f == TableFormat.JSON ? () -> List.of(stars.json(slug + ".json", StarSchema.summary(model, true)))
                    : () -> List.of(stars.table(slug, model.profile(), f)));
        }
        for (Map.Entry<String, ChartSpec> c : StarFigures.of(model, spec.charts()).entrySet()) {
            tasks.addAll(FigureExport.tasks(c.getValue(), layout.chartFolder(), slug + "-" + c.getKey(), formats));
        }
    }

    /**
     * Builds every star of a scenario and returns their centres, for marking on a ρ–T chart.
     *
     * @param scenario the scenario
     * @return one marker per star, in scenario order
     */
    public List<PlaneFigure.Marker> centres(Scenario scenario) {
        List<PlaneFigure.Marker> markers = new ArrayList<>();
        for (ScenarioStar spec : scenario.stars()) {
            var c = build(scenario, spec).headline().centre();
            markers.add(new PlaneFigure.Marker(spec.name(), c.rho(), c.T()));
        }
        return markers;
    }

    private StarModel build(Scenario scenario, ScenarioStar spec) {
        try {
            return build(spec.request());
        } catch (StarRequestException e) {
            throw new BadInputException(source(scenario) + ": star '" + spec.name() + "': " + e.getMessage());
        } catch (BadInputException e) {
            throw e.about(source(scenario) + ": star '" + spec.name() + "'");
        }
    }

    /**
     * Builds one star.
     *
     * @param request what to build
     * @return the model
     * @throws StarRequestException when the request has no solution, naming the input at fault
     */
    public StarModel build(StarRequest request) {
        return builder.build(request);
    }

    private static ChartSpec plane(List<StarModel> models) {
        Composition mixture = models.get(0).headline().composition();
        double tMin = 1e5;
        double tMax = 1e10;
        double rhoMin = 1e-6;
        double rhoMax = 1e6;
        List<PlaneFigure.Marker> markers = new ArrayList<>();
        for (StarModel m : models) {
            var c = m.headline().centre();
            markers.add(new PlaneFigure.Marker(m.headline().name(), c.rho(), c.T()));
            rhoMin = Math.min(rhoMin, c.rho() / 10);
            rhoMax = Math.max(rhoMax, c.rho() * 10);
        }
        Table lines = RegimeLines.table(mixture, tMin, tMax, 200, RegimeLines.DEFAULT_BETAS);
        return PlaneFigure.of(lines, RegimeLines.DEFAULT_BETAS, rhoMin, rhoMax, markers, mixture.mu());
    }

    private static NotebookContent notebook(Scenario scenario, List<StarModel> models, Metadata metadata,
            RunLayout layout, List<Path> files) {
        Path summaryFile = layout.outputFolder().resolve("summary.csv");
        String summaryCsv = layout.relativeToNotebook(summaryFile);
        List<NotebookPlot> plots = new ArrayList<>();
        if (files.contains(summaryFile)) {
            plots.add(NotebookPlot.of("Radiation pressure fraction at the centre", summaryCsv, StarSchema.M.name(),
                List.of(StarSchema.ONE_MINUS_BETA_C.name()), "M [Msun]", "1 - beta (centre)").withLogX().withLogY());
        plots.add(NotebookPlot.of("Stability: pressure-weighted Gamma1 - 4/3 and the GR threshold", summaryCsv, StarSchema.M.name(),
                List.of(StarSchema.NEWTONIAN_MARGIN.name(), StarSchema.GR_THRESHOLD.name()), "M [Msun]", "<Gamma1> - 4/3").withLogX().withLogY());
        }
        for (ScenarioStar spec : scenario.stars()) {
            Path csv = layout.starFolder().resolve(FileNames.slug(spec.name()) + ".csv");
            if (!files.contains(csv)) {
                continue;
            }
            String rel = layout.relativeToNotebook(csv);
            plots.add(NotebookPlot.of(spec.name() + ": density, pressure and temperature", rel, ProfileTable.R_OVER_R.name(),
                    List.of(EosQuantities.RHO.name()), "r/R", "rho [g/cm3]").withLogY());
            plots.add(NotebookPlot.of(spec.name() + ": beta and Gamma1", rel, ProfileTable.M_OVER_M.name(),
                    List.of(EosQuantities.BETA.name(), ProfileTable.GAMMA1.name()),
                    "m/M", "beta, Gamma1").withHorizontalLine(4.0 / 3.0, "Gamma1 = 4/3"));
        }
        StringBuilder stars = new StringBuilder("\n\n| star | kind | n | M [Msun] | given | X | Y | Z | mu |\n"
                + "| --- | --- | --- | ---: | --- | ---: | ---: | ---: | ---: |\n");
        for (int i = 0; i < scenario.stars().size(); i++) {
            ScenarioStar spec = scenario.stars().get(i);
            var headline = models.get(i).headline();
            var c = spec.request().composition();
            stars.append(String.format(Locale.US, "| %s | %s | %s | %s | %s | %s | %s | %s | %s |%n",
                    spec.name(), headline.kind().word(), headline.index().isPresent()
                            ? TextWriter.format(headline.index().getAsDouble()) : "-",
                    TextWriter.format(spec.request().mass() / Constants.SOLAR_MASS), given(spec.request().anchor()),
                    TextWriter.format(c.X()), TextWriter.format(c.Y()), TextWriter.format(c.Z()),
                    TextWriter.format(c.mu())));
        }
        String description = NotebookWriter.describe(metadata) + stars + "\nScenario: " + scenario.description()
                + "\n\nMasses in the summary are in solar masses (IAU 2015 nominal, M_sun = "
                + Constants.SOLAR_MASS + " g).";
        return new NotebookContent("stellabar scenario " + scenario.name(), description, plots);
    }

    /** What fixes a star's scale besides M, as the notebook's table of stars shows it. */
    private static String given(ScaleAnchor anchor) {
        if (anchor instanceof ScaleAnchor.Radius r) {
            return "R = " + TextWriter.format(r.value() / Constants.SOLAR_RADIUS) + " Rsun";
        }
        if (anchor instanceof ScaleAnchor.CentralTemperature t) {
            return "T_c = " + TextWriter.format(t.value()) + " K";
        }
        return "s = " + TextWriter.format(anchor.value()) + " k_B per baryon";
    }

    private static Metadata summaryMetadata(Scenario scenario, List<String> notes) {
        Inputs inputs = Inputs.builder().text("scenario", scenario.name()).text("source", source(scenario))
                .integer("stars", scenario.stars().size(), "number of stars").build();
        return Metadata.of("summary of the stars of scenario " + scenario.name(), inputs, notes);
    }

    private static String source(Scenario scenario) {
        return scenario.source();
    }
}
