package org.stellabar.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.pipeline.GridRun;
import org.stellabar.pipeline.TableMerge;
import org.stellabar.pipeline.Shard;
import org.stellabar.pipeline.PlaneFigure;
import org.stellabar.pipeline.ScenarioRunner;
import org.stellabar.scenario.ScenarioReader;
import org.stellabar.physics.Dimension;
import org.stellabar.survey.EosGrid;
import org.stellabar.table.Table;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar grid}: the equation of state over a ρ–T or P–T grid. */
public final class GridCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    /** Largest number of points along one axis. */
    static final int MAX_AXIS_POINTS = 10_000;

    CommandSpec spec;

    /** Exactly one of --rho-range and --pressure-range. */
    final Plane plane = new Plane();

    static final class Plane {
        String rhoRange;

        String pressureRange;
    }

    String tempRange;

    String points;

    final CompositionOptions composition = new CompositionOptions();

    /** The grid's table formats unless asked otherwise. */
    static final Set<TableFormat> DEFAULT_FORMATS =
            java.util.Collections.unmodifiableSet(java.util.EnumSet.of(TableFormat.CSV, TableFormat.ECSV));

    TableFormat format;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    final ChartFormatOption chartFormats = new ChartFormatOption();

    final ElectronsOption electrons = new ElectronsOption();

    String shard;

    Path stars;

    Path out;

    /** Options that choose the part, the folder or what is printed: not part of what defines the grid. */
    static final Set<String> NOT_DEFINING = Set.of("--shard", "--out", "--quiet", "--chart-formats", "--help",
            "--version");

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("grid", this)
                .header("The equation of state over a rho-T or P-T grid, with the rho-T chart.")
                .description("The gas + radiation equation of state over a logarithmic rho-T (or P-T) grid, written as a",
                        "table, computed on all cores through the allocation-free path. Rows: rho (or P) outer, T inner.",
                        "With --electrons fermi: one Fermi-Dirac state per point (much slower), the columns eta and",
                        "n_positron, and the chart shades the region where Gamma1 < 4/3.")
                .footer("%nExamples:%n  stellabar grid --rho-range 1e-10:1e8 --temp-range 1e3:1e10 --points 200x200",
                        "  stellabar grid --rho-range 1e-4:1e9 --temp-range 1e8:1e10 --points 60x60 --X 0 --Z 1 \\",
                        "      --metal-mass-number 16 --electrons fermi");
        quiet.describe(m);
        CommandModel.Group exactlyOne = m.group(true).multiplicity("1");
        exactlyOne.option("--rho-range").label("LOW:HIGH")
                .description("Density range (g/cm3; units allowed at each end, e.g. '1e-10:1e8').")
                .field(plane, "rhoRange");
        exactlyOne.option("--pressure-range").label("LOW:HIGH")
                .description("Total pressure range (dyn/cm2) for a P-T grid; points with P <= aT^4/3 are left out.")
                .field(plane, "pressureRange");
        exactlyOne.add();
        m.option("--temp-range").label("LOW:HIGH").required()
                .description("Temperature range (K), e.g. '1e3:1e10'.")
                .field(this, "tempRange");
        m.option("--points").label("NxM").defaultValue("200x200")
                .description("Points along rho (or P) x along T; N alone means NxN (default: ${DEFAULT-VALUE}).")
                .field(this, "points");
        composition.describe(m);
        m.option("-f", "--format").label("FORMAT").converter(new TableFormatsOption.Words()).candidates(new TableFormatsOption.Words())
                .description("One table file format: ${COMPLETION-CANDIDATES} (the same as --table-formats FORMAT).")
                .field(this, "format");
        tableFormats.describe(m);
        chartFormats.describe(m);
        electrons.describe(m);
        m.option("--shard").label("K/N")
                .description("Compute only the K-th of N equal parts of the rho (or P) axis (K = 1..N), e.g. for one task"
                        + " of a cluster job array; written as grid-K-of-N, without the chart.")
                .field(this, "shard");
        m.option("--stars").label("SCENARIO")
                .description("Mark the centres of the stars of this scenario file (TOML) on the chart.")
                .field(this, "stars");
        m.option("-o", "--out").label("DIR").defaultValue("profiles/out/grid")
                .description("Folder for the table (grid.csv and grid.ecsv unless --table-formats says otherwise) and the chart"
                        + " (default: ${DEFAULT-VALUE}).")
                .field(this, "out");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() throws IOException {
        OutFolder.check(out);
        EosGrid.Spec request = gridSpec();
        Set<ChartFormat> images = chartFormats.formats();
        List<PlaneFigure.Marker> markers = markers();
        Optional<Shard> part = shard == null ? Optional.empty()
                : Optional.of(Ranges.shard("--shard", shard, request.firstPoints())).map(p -> new Shard(p[0], p[1]));
        Set<TableFormat> formats = formats();
        List<String> arguments = part.isEmpty() ? List.of() : definingArguments();
        GridRun.Result result = GridRun.run(request, part, out, formats, images, markers, arguments);
        // the grid's results are its files: progress and the list of files on stderr, as every command
        if (!quiet.quiet) {
            PrintWriter err = spec.commandLine().getErr();
            err.printf(Locale.US, "grid: %d points computed in %.2f s, table written in %.2f s%n",
                    result.table().rowCount(), result.computeSeconds(), result.writeSeconds());
            Printer.wrote(result.files(), err);
        }
        return 0;
    }

    private EosGrid.Spec gridSpec() {
        EosGrid.Plane which = plane.rhoRange != null ? EosGrid.Plane.RHO_T : EosGrid.Plane.P_T;
        double[] first = which == EosGrid.Plane.RHO_T
                ? Ranges.parse("--rho-range", plane.rhoRange, Dimension.DENSITY, 1.0)
                : Ranges.parse("--pressure-range", plane.pressureRange, Dimension.PRESSURE, 1.0);
        double[] temps = Ranges.parse("--temp-range", tempRange, Dimension.TEMPERATURE, 1.0);
        int[] n = Ranges.points("--points", points, MAX_AXIS_POINTS);
        return new EosGrid.Spec(which, first[0], first[1], n[0], temps[0], temps[1], n[1],
                composition.composition(), electrons.electrons());
    }

    private List<PlaneFigure.Marker> markers() {
        return stars == null ? List.of() : new ScenarioRunner().centres(ScenarioReader.read(stars));
    }

    private Set<TableFormat> formats() {
        if (format != null && tableFormats.formats().isPresent()) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--format and --table-formats both choose the table's formats; give one of them");
        }
        return format != null ? java.util.EnumSet.of(format) : tableFormats.formatsOr(DEFAULT_FORMATS);
    }

    /** The arguments that define the grid, the scenario of --stars by its absolute path. */
    private List<String> definingArguments() {
        List<String> arguments = new java.util.ArrayList<>();
        for (String a : CanonicalArguments.of(spec, NOT_DEFINING)) {
            arguments.add(a.startsWith("--stars=") ? "--stars=" + stars.toAbsolutePath().normalize() : a);
        }
        return arguments;
    }

    /**
     * The whole grid that a part's recorded arguments define, for {@code merge}.
     *
     * @param arguments the recorded arguments
     * @return the whole job: its table's schema and its writer
     */
    static TableMerge.WholeJob wholeJob(List<String> arguments) {
        GridCommand command = CanonicalArguments.parse(new GridCommand(), arguments);
        EosGrid.Spec grid = command.gridSpec();
        List<PlaneFigure.Marker> markers = command.markers();
        Set<TableFormat> formats = command.format != null ? java.util.EnumSet.of(command.format)
                : command.tableFormats.formatsOr(DEFAULT_FORMATS);
        return new TableMerge.WholeJob() {
            @Override
            public Table schema(int rows, java.util.Map<String, Long> extras) {
                Table empty = new EosGrid().evaluate(grid, 0, 0);
                return new Table(empty.name(), EosGrid.wholeMetadata(grid, rows), empty.columns());
            }

            @Override
            public List<Path> write(Table table, Path folder, Set<ChartFormat> chartFormats) throws IOException {
                return GridRun.writeWhole(grid, table, folder, formats, chartFormats.isEmpty()
                        ? java.util.EnumSet.allOf(ChartFormat.class) : chartFormats, markers);
            }
        };
    }
}
