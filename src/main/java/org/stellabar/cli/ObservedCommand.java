package org.stellabar.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.stellabar.audit.LogValuedColumnGuard;
import org.stellabar.audit.ProfileSource;
import org.stellabar.eos.Composition;
import org.stellabar.observed.ObservedSchema;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.CatalogueReader;
import org.stellabar.pipeline.ObservedRun;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.table.Inputs;
import org.stellabar.table.Table;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar observed}: Eddington factor and standard-model estimates for a catalogue of observed stars. */
public final class ObservedCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    Path catalogue;

    Integer namesLine;

    Map<String, String> columns = new LinkedHashMap<>();

    Map<String, String> units = new LinkedHashMap<>();

    List<String> logKeys = new ArrayList<>();

    List<String> lnKeys = new ArrayList<>();

    final CompositionOptions composition = new CompositionOptions();

    String fitsExtension;

    boolean strict;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    Path out;

    OutputFormat format;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("observed", this)
                .header("Eddington factor and standard-model estimates for a catalogue of observed stars.")
                .description("Reads a catalogue (CSV or FITS, one row per star) of luminosities, effective",
                        "temperatures and perhaps masses, radii, log g and X, Z, and gives per star R, log g,",
                        "L_Edd, the electron-scattering Eddington factor Gamma_e, the standard model's beta",
                        "for that M and mu with its centre and stability margins, and the standard model's",
                        "mass for the observed L (M_from_L, model-dependent; used when M and log g are absent).",
                        "Keys: L, Teff, R, M, log_g, X, Z, name and the errors L_err, Teff_err, R_err, M_err,",
                        "log_g_err. Columns are found under the keys unless --columns maps them. Units: --units,",
                        "else the file's, else Lsun, K, Rsun, Msun. Rows that cannot be estimated are listed",
                        "with their row numbers; the others are estimated.")
                .footer("%nExamples:",
                        "  stellabar observed profiles/demo-catalogue.csv --columns L=logL,Teff=logTeff,M=Mspec \\",
                        "      --log L,Teff --out profiles/out/demo-catalogue",
                        "  stellabar observed stars.fits --units M=kg --X 0.6 --Z 0.02 --format json");
        quiet.describe(m);
        m.positional("0").label("CATALOGUE")
                .description("The catalogue: CSV with a header row ('#' lines are comments), ECSV, VOTable, a FITS binary"
                        + " table, or whitespace-separated text (header lines, then the column names, then rows).")
                .field(this, "catalogue");
        m.option("--names-line").label("N")
                .description("For whitespace-separated text: the line (from 1) that names the columns (default: the last"
                        + " line that is not all numbers before the first that is).")
                .field(this, "namesLine");
        m.option("--columns").label("KEY=COLUMN").split(",").mapFallbackValue("")
                .description("Which column holds which quantity, e.g. L=logL,Teff=logTeff,M=Mspec,L_err=e_logL.")
                .field(this, "columns");
        m.option("--units").label("KEY=UNIT").split(",").mapFallbackValue("")
                .description("Unit of L, Teff, R or M (their error columns follow), e.g. L=Lsun,M=kg; of the value inside log10 for --log columns.")
                .field(this, "units");
        m.option("--log").label("KEY").split(",")
                .description("Quantities whose columns hold log10 of the value (in its unit), e.g. L,Teff; their errors are then in dex.")
                .field(this, "logKeys");
        m.option("--ln").label("KEY").split(",")
                .description("Keys (L, Teff, R, M) whose columns hold natural logarithms of the value in the unit of"
                        + " --units; their error columns in e-folds.")
                .field(this, "lnKeys");
        composition.describe(m);
        m.option("--fits-extension").label("EXTNAME")
                .description("For a FITS catalogue: the binary table with this EXTNAME (default: the first binary table).")
                .field(this, "fitsExtension");
        m.option("--strict")
                .description("Any row without an estimate is an error (exit 2) naming file:line;"
            + " so is a column that looks like log10 values read as linear (otherwise a warning).")
                .field(this, "strict");
        tableFormats.describe(m);
        m.option("-o", "--out").label("DIR")
                .description("Write the table of estimates (observed.csv, .ecsv, .fits unless --table-formats says otherwise; FITS only with an estimate), observed.json (every row) and the charts (HR diagram, Gamma_e against M; PNG, SVG, PDF, one and two columns) into this folder.")
                .field(this, "out");
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Terminal output: text (main columns and the bad rows), json (every row under 'stars'), csv (the full table); default ${DEFAULT-VALUE}.")
                .field(this, "format");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() {
        OutFolder.check(out);
        Composition mixture = composition.composition();
        CatalogueReader reader = new CatalogueReader(columns, units, logKeys, lnKeys, mixture);
        Inputs.Builder inputs = Inputs.builder().text("catalogue", catalogue.toString())
                .text("default_composition", composition.describe());
        columns.forEach((k, v) -> inputs.text("column_" + k, v));
        units.forEach((k, v) -> inputs.text("unit_" + k, v));
        if (!logKeys.isEmpty()) {
            inputs.text("log10_columns", String.join(",", logKeys));
        }
        if (!lnKeys.isEmpty()) {
            inputs.text("ln_columns", String.join(",", lnKeys));
        }
        EddingtonStandardModel model = EddingtonStandardModel.create();
        ProfileSource source = ObservedRun.source(catalogue, fitsExtension,
                namesLine == null ? java.util.OptionalInt.empty() : java.util.OptionalInt.of(namesLine));
        // columns that look like log10 values read as linear: a warning, or bad input under --strict
        List<LogValuedColumnGuard.Finding> suspicious = reader.logLookingColumns(source);
        if (!suspicious.isEmpty() && strict) {
            throw new BadInputException(catalogue + ": " + LogValuedColumnGuard.oneLine(suspicious));
        }
        suspicious.forEach(f -> spec.commandLine().getErr().println("observed: warning: " + catalogue + ": " + f.message()));
        ObservedRun.Result result = ObservedRun.run(source, catalogue.getFileName().toString(), reader, model,
                inputs.build());
        List<String> bad = result.badRows();
        if (strict && !bad.isEmpty()) {
            throw new BadInputException(bad.get(0) + (bad.size() > 1 ? " (and " + (bad.size() - 1) + " more)" : "")
                    + "; --strict allows no bad row");
        }
        List<Path> written = out == null ? List.of() : ObservedRun.write(result, out, model,
                tableFormats.formatsOr(ObservedRun.FORMATS));
        PrintWriter stdout = spec.commandLine().getOut();
        switch (format) {
            case text -> {
                Table main = result.table().select(ObservedSchema.NAME, ObservedSchema.ROW.name(),
                        ObservedSchema.M.name(), ObservedSchema.R.name(), ObservedSchema.LOG_G.name(),
                        ObservedSchema.GAMMA_E.name(), ObservedSchema.BETA_STANDARD.name(),
                        ObservedSchema.GAMMA_E_OVER_ONE_MINUS_BETA.name(), ObservedSchema.GR_MARGIN.name(),
                        ObservedSchema.MASS_SOURCE);
                Printer.print(main, format, stdout);
                stdout.println(String.format(java.util.Locale.US, "%d rows, %d estimated, %d bad",
                        result.outcomes().size(), result.table().rowCount(), result.outcomes().size() - result.table().rowCount()));
                bad.forEach(stdout::println);
                stdout.flush();
            }
            case json -> Printer.print(result.summary(), format, stdout);
            case csv -> Printer.print(result.table(), format, stdout);
        }
        if (!quiet.quiet) {
            Printer.wrote(written, spec.commandLine().getErr());
        }
        return 0;
    }
}
