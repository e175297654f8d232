package org.stellabar.pipeline;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.stellabar.audit.AuditTables;
import org.stellabar.audit.ColumnMapping;
import org.stellabar.audit.CompositionPolicy;
import org.stellabar.audit.CsvProfileSource;
import org.stellabar.audit.LoadedProfile;
import org.stellabar.audit.ProfileAudit;
import org.stellabar.audit.ProfileAuditor;
import org.stellabar.audit.ProfileLoader;
import org.stellabar.charts.ChartExporter;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartRenderer;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.FigureCheck;
import org.stellabar.charts.FigureSize;
import org.stellabar.eos.Composition;
import org.stellabar.output.CsvTableReader;
import org.stellabar.output.CsvWriter;
import org.stellabar.physics.Constants;
import org.stellabar.scenario.Scenario;
import org.stellabar.scenario.ScenarioReader;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.StarModel;
import org.stellabar.survey.EosGrid;
import org.stellabar.survey.MassSequence;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;

/**
 * The figure check ({@link FigureCheck}) on every chart the demo ({@code model}: stars, cluster,
 * ρ–T plane, observed catalogue), a {@code sequence}, an {@code audit}, a {@code grid} and a
 * {@code polytrope} write,
 * built by the same pipeline classes the commands use and written by the same exporter, in both
 * journal widths; plus a stress case of 30 stars with nearly equal masses (40.00 to 40.29 M☉,
 * invented) on the cluster charts and the ρ–T plane. A chart passes when no word leaves the page,
 * no two words overlap, no word covers a data point, and every legend entry is one label.
 */
class FigureCheckTest {

    /**
     * A folder to keep the checked charts in, with a PNG of each for a person to look at
     * ({@code -Dstellabar.figureCheck.keep=DIR}); unset, they go to a temporary folder that is
     * removed.
     */
    private static final String KEEP = System.getProperty("stellabar.figureCheck.keep");
    private static Path dir;
    private static final Map<String, ChartSpec> CHARTS = new LinkedHashMap<>();

    @BeforeAll
    static void buildCharts() throws Exception {
        dir = KEEP == null ? Files.createTempDirectory("figure-check") : Files.createDirectories(Path.of(KEEP));
        ScenarioRunner runner = new ScenarioRunner();
        Scenario demo = ScenarioReader.builtInDemo();
        List<StarModel> models = runner.buildAll(demo, line -> { });
        runner.figures(demo, models).forEach((k, v) -> CHARTS.put("demo " + k, v));
        EddingtonStandardModel standard = EddingtonStandardModel.create();
        Table observed = DemoCatalogue.run(dir.resolve("observed-run"), standard).getKey().table();
        ObservedFigures.of(observed, standard).forEach((k, v) -> CHARTS.put("demo " + k, v));

        Table sequence = SequenceRun.compute(SequenceRun.Request.whole(new MassSequence(standard, Composition.DEFAULT,
                1 * Constants.SOLAR_MASS, 1e6 * Constants.SOLAR_MASS, 60))).table();
        CHARTS.put("sequence-support", SurveyFigures.radiationSupport(sequence));
        CHARTS.put("sequence-stability", SurveyFigures.stabilityMargin(sequence));

        for (double n : new double[] {1.5, 3.0}) {
            Table profile = PolytropeRun.compute(new PolytropeRun.Request(n, 200)).profile();
            CHARTS.put("polytrope n = " + n, SurveyFigures.polytrope(profile, n));
        }

        // audits across the range: gas-dominated, radiation-dominated, supermassive
        for (StarModel star : models) {
            String name = star.headline().name();
            if (!List.of("Ombrelune", "Dunmerrow", "Aurelith Deep").contains(name)) {
                continue;
            }
            AuditFigures.of(audit(star), 1e-3).forEach((k, v) -> CHARTS.put("audit of " + name + " " + k, v));
        }

        EosGrid.Spec grid = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-4, 1e4, 30, 1e5, 1e9, 30, Composition.DEFAULT);
        CHARTS.put("grid rho-T-plane", GridRun.chart(grid, new EosGrid().evaluate(grid, 0, 30), List.of()));

        StringBuilder toml = new StringBuilder("name = \"stress\"\n");
        for (int i = 0; i < 30; i++) {
            // invented stars: masses 40.00 ... 40.29 Msun, one radius
            toml.append(String.format(Locale.ROOT, "[[star]]%nname = \"Star %02d\"%nmass = \"%.2f Msun\"%n"
                    + "radius = \"12 Rsun\"%n", i + 1, 40.0 + 0.01 * i));
        }
        Scenario stress = ScenarioReader.read("stress.toml", toml.toString());
        runner.figures(stress, runner.buildAll(stress, line -> { })).forEach((k, v) -> {
            if (k.startsWith("cluster-") || k.equals("rho-T-plane")) {
                CHARTS.put("stress " + k, v);
            }
        });
    }

    @AfterAll
    static void clean() throws Exception {
        if (KEEP != null) {
            return;
        }
        try (Stream<Path> files = Files.walk(dir)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    /** The audit's per-shell table of a star's own profile, read back from its CSV text. */
    private static Table audit(StarModel star) throws Exception {
        StringWriter w = new StringWriter();
        CsvWriter.withComments().write(star.profile(), w);
        LoadedProfile loaded = new ProfileLoader(ColumnMapping.ourNames(),
                CompositionPolicy.wholeStar(star.headline().composition()), false)
                .load(new CsvProfileSource(new CsvTableReader().parse("profile.csv", w.toString().lines().toList())));
        ProfileAudit audit = new ProfileAuditor().audit(loaded);
        return AuditTables.shells(audit, Metadata.of("audit", Inputs.none(), List.of()));
    }

    /**
     * The placement is computed per drawing from the chart alone: charts exported in parallel
     * (as a run does, {@link FileTasks}) are byte for byte those exported one after another.
     */
    @org.junit.jupiter.api.Test
    void parallelExportIsByteIdenticalToSequential() throws Exception {
        Path parallel = Files.createDirectories(dir.resolve("parallel"));
        Path sequential = Files.createDirectories(dir.resolve("sequential"));
        List<String> names = List.of("demo cluster-support", "demo cluster-stability", "demo rho-T-plane",
                "demo kestrafel-gradients", "demo observed-hr", "stress cluster-support");
        java.util.Set<ChartFormat> formats = java.util.EnumSet.of(ChartFormat.SVG, ChartFormat.PDF, ChartFormat.PNG);
        FileTasks tasks = new FileTasks();
        for (String n : names) {
            tasks.addAll(FigureExport.tasks(CHARTS.get(n), parallel, n.replace(' ', '_'), formats));
        }
        List<Path> written = tasks.runAll();
        for (String n : names) {
            for (FigureSize size : List.of(FigureSize.ONE_COLUMN, FigureSize.TWO_COLUMN)) {
                for (ChartFormat f : formats) {
                    String file = n.replace(' ', '_') + (size == FigureSize.ONE_COLUMN ? "-1col." : "-2col.") + f.extension();
                    new ChartExporter(size).write(CHARTS.get(n), f, sequential.resolve(file));
                    org.junit.jupiter.api.Assertions.assertArrayEquals(Files.readAllBytes(sequential.resolve(file)),
                            Files.readAllBytes(parallel.resolve(file)), file);
                }
            }
        }
        org.junit.jupiter.api.Assertions.assertEquals(names.size() * 2 * formats.size(), written.size());
    }

    @TestFactory
    Stream<DynamicTest> everyChartPassesTheFigureCheck() {
        List<DynamicTest> tests = new ArrayList<>();
        for (Map.Entry<String, ChartSpec> c : CHARTS.entrySet()) {
            for (FigureSize size : List.of(FigureSize.ONE_COLUMN, FigureSize.TWO_COLUMN)) {
                String name = c.getKey() + (size == FigureSize.ONE_COLUMN ? " 1col" : " 2col");
                tests.add(DynamicTest.dynamicTest(name, () -> check(name, c.getValue(), size)));
            }
        }
        return tests.stream();
    }

    private static void check(String name, ChartSpec spec, FigureSize size) throws Exception {
        String file = name.replaceAll("[^A-Za-z0-9-]+", "_");
        Path pdf = dir.resolve(file + ".pdf");
        Path svg = dir.resolve(file + ".svg");
        ChartExporter exporter = new ChartExporter(size);
        exporter.write(spec, ChartFormat.PDF, pdf);
        exporter.write(spec, ChartFormat.SVG, svg);
        if (KEEP != null) {
            exporter.write(spec, ChartFormat.PNG, dir.resolve(file + ".png"));
        }
        FigureCheck.Page page = FigureCheck.read(pdf);
        List<String> problems = new ArrayList<>(FigureCheck.layoutProblems(page));
        problems.addAll(FigureCheck.coverProblems(page, new ChartRenderer(size).dataPointsOnPage(spec)));
        problems.addAll(FigureCheck.legendProblems(svg, FigureCheck.legendEntries(spec)));
        assertTrue(page.words().size() > 5, name + ": too few words read back (" + page.words().size() + ")");
        assertTrue(problems.isEmpty(), name + ":\n  " + String.join("\n  ", problems));
    }
}
