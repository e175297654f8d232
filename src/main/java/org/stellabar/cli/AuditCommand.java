package org.stellabar.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.stellabar.audit.AuditMetadata;
import org.stellabar.audit.AuditSummary;
import org.stellabar.audit.AuditTables;
import org.stellabar.audit.ColumnMapping;
import org.stellabar.audit.CompositionPolicy;
import org.stellabar.audit.LoadedProfile;
import org.stellabar.audit.LogValuedColumnGuard;
import org.stellabar.audit.ProfileAudit;
import org.stellabar.audit.ProfileAuditor;
import org.stellabar.audit.ProfileLoader;
import org.stellabar.audit.LogarithmicColumns;
import org.stellabar.audit.ProfileSource;
import org.stellabar.audit.RecordedComposition;
import org.stellabar.eos.Composition;
import org.stellabar.physics.BadInputException;
import org.stellabar.pipeline.AuditRun;
import org.stellabar.table.Metadata;
import org.stellabar.table.Table;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;

/** {@code stellabar audit}: checks a stellar profile from another code against gas + radiation physics. */
public final class AuditCommand implements Callable<Integer>, Subcommand {

    final QuietOption quiet = new QuietOption();

    CommandSpec spec;

    Path profile;

    List<String> log10 = new java.util.ArrayList<>();

    List<String> ln = new java.util.ArrayList<>();

    Integer namesLine;

    Map<String, String> columns = new LinkedHashMap<>();

    Map<String, String> units = new LinkedHashMap<>();

    final CompositionOptions composition = new CompositionOptions();

    final ElectronsOption electrons = new ElectronsOption();

    String fitsExtension;

    double tolerance;

    boolean skipBadRows;

    boolean strict;

    final TableFormatsOption tableFormats = new TableFormatsOption();

    Path out;

    OutputFormat format;

    @Override
    public CommandSpec model() {
        CommandModel m = CommandModel.of("audit", this)
                .header("Check a stellar profile from another code against gas + radiation physics.")
                .description("Checks a stellar profile from another code (CSV or FITS, one row per shell)",
                        "against a fully ionized ideal gas + radiation: our P, beta, Gamma1 and nabla_ad",
                        "at each shell's (rho, T), the mismatch with the profile's P and Gamma1,",
                        "hydrostatic equilibrium and mass continuity, the virial ratio, <Gamma1> with",
                        "the stability margins, and the zones where the ideal description fails.",
                        "Columns are found by our own names (r, m, rho, T, P, X, Y, Z, Gamma1) unless",
                        "--columns maps them; units come from --units, else from the file, else CGS.")
                .footer("%nExamples:",
                        "  stellabar audit star.csv --columns r=radius_cm,rho=density,T=temp,m=mass \\",
                        "      --X 0.7 --Z 0.02",
                        "  stellabar audit star.csv --units r=Rsun,m=Msun,rho=kg/m3 --out audit-star");
        quiet.describe(m);
        m.positional("0").label("PROFILE")
                .description("The profile table: CSV with a header row ('#' lines are comments), ECSV, VOTable, a FITS"
                        + " binary table, or whitespace-separated text (header lines, then the column names, then rows"
                        + " of numbers).")
                .field(this, "profile");
        m.option("--log").label("KEY").split(",")
                .description("Quantity keys whose columns hold log10 values, of the unit --units gives (or the file states),"
                        + " e.g. --log rho,T,P --units rho=g/cm3,T=K,P=dyn/cm2.")
                .field(this, "log10");
        m.option("--ln").label("KEY").split(",")
                .description("Quantity keys whose columns hold natural logarithms, as --log.")
                .field(this, "ln");
        m.option("--names-line").label("N")
                .description("For whitespace-separated text: the line (from 1) that names the columns (default: the last"
                        + " line that is not all numbers before the first that is).")
                .field(this, "namesLine");
        m.option("--columns").label("KEY=COLUMN").split(",").mapFallbackValue("")
                .description("Which column holds which quantity; keys r, m, rho, T, P, X, Y, Z, Gamma1 (rho and T required).")
                .field(this, "columns");
        m.option("--units").label("KEY=UNIT").split(",").mapFallbackValue("")
                .description("Unit of a column, by quantity key or column name, e.g. r=Rsun,rho=kg/m3,P=Pa (overrides the header).")
                .field(this, "units");
        composition.describe(m);
        electrons.describe(m);
        m.option("--fits-extension").label("EXTNAME")
                .description("For a FITS profile: the binary table with this EXTNAME (default: the first binary table).")
                .field(this, "fitsExtension");
        m.option("--tolerance").label("TOL").defaultValue("1e-3").converter(new Quantities.Number())
                .description("Flag rows where |P_profile/P_ours - 1| exceeds this (default ${DEFAULT-VALUE}).")
                .field(this, "tolerance");
        m.option("--skip-bad-rows")
                .description("Leave out rows that cannot be audited (ragged, empty or non-numeric cells, out of order) and list them, instead of stopping.")
                .field(this, "skipBadRows");
        m.option("--strict")
                .description("Refuse input that looks wrong (e.g. log10 values in a column read as linear) instead of warning.")
                .field(this, "strict");
        tableFormats.describe(m);
        m.option("-o", "--out").label("DIR")
                .description("Write the per-shell table (shells.csv, .ecsv, .fits unless --table-formats says otherwise), summary.json, report.md and the charts"
                        + " (beta and Gamma1, pressure mismatch, hydrostatic residual; PNG, SVG, PDF) into this folder.")
                .field(this, "out");
        m.option("-f", "--format").label("FORMAT").defaultValue("text")
                .description("Terminal output: text (summary), json (summary with every shell under 'shells'), csv (the per-shell table); default ${DEFAULT-VALUE}.")
                .field(this, "format");
        spec = m.withStandardHelp();
        return spec;
    }

    @Override
    public Integer call() {
        OutFolder.check(out);
        ColumnMapping mapping = ColumnMapping.of(columns).withUnits(units);
        Composition mixture = composition.composition();
        boolean compositionGiven = composition.x != null || composition.y != null || composition.z != null
                || composition.mu != null;
        ProfileAuditor auditor = new ProfileAuditor(tolerance).withElectrons(electrons.electrons());
        Loaded read = load(mapping, mixture, compositionGiven);
        List<String> headerLines = read.headerLines();
        LoadedProfile loaded = read.profile();
        CompositionPolicy policy = read.policy();
        ProfileAudit audit = auditor.audit(loaded);

        Metadata metadata = AuditMetadata.of(audit, profile.toString(), units, policy,
                composition.mu == null ? OptionalDouble.empty() : OptionalDouble.of(composition.mu), skipBadRows);
        if (!log10.isEmpty()) {
            metadata = metadata.withNote("columns of log10 values (--log): " + String.join(", ", log10));
        }
        if (!ln.isEmpty()) {
            metadata = metadata.withNote("columns of natural logarithms (--ln): " + String.join(", ", ln));
        }
        // the file's own metadata (a text table's header block, ECSV or VOTable parameters) goes into the report
        for (String line : headerLines) {
            metadata = metadata.withNote("file header: " + line);
        }
        Table shells = AuditTables.shells(audit, metadata);

        List<String> written = out == null ? List.of() : AuditRun.write(audit, metadata, shells, tolerance, out,
                tableFormats.formatsOr(AuditRun.FORMATS));

        PrintWriter stdout = spec.commandLine().getOut();
        switch (format) {
            case text -> {
                Printer.print(AuditSummary.of(audit, metadata, null, true), format, stdout);
            }
            case json -> Printer.print(AuditSummary.of(audit, metadata, shells, false), format, stdout);
            case csv -> Printer.print(shells, format, stdout);
        }
        // results on stdout, the files written on stderr, as every command does
        if (!quiet.quiet) {
            Printer.wrote(written.stream().map(java.nio.file.Path::of).toList(), spec.commandLine().getErr());
        }
        return 0;
    }

    /** The profile as loaded, with the composition policy it was loaded under. */
    private record Loaded(LoadedProfile profile, CompositionPolicy policy, List<String> headerLines) {
    }

    /**
     * Reads the profile and loads it; the file's cells (hundreds of megabytes for 10^6 rows) are
     * garbage once this returns.
     */
    private Loaded load(ColumnMapping mapping, Composition mixture, boolean compositionGiven) {
        AuditRun.Read file = AuditRun.read(profile, fitsExtension,
                namesLine == null ? java.util.OptionalInt.empty() : java.util.OptionalInt.of(namesLine));
        ProfileSource source = LogarithmicColumns.of(file.source(), mapping, log10, ln);
        // our own profiles record their composition: auditing one needs no composition options again
        Optional<Composition> recorded = compositionGiven ? Optional.empty()
                : source.recordedComposition().flatMap(RecordedComposition::parse);
        CompositionPolicy policy = compositionGiven ? CompositionPolicy.wholeStar(mixture)
                : recorded.map(CompositionPolicy::recordedInProfile).orElse(CompositionPolicy.columnsFirst(mixture));
        ProfileLoader loader = new ProfileLoader(mapping, policy, skipBadRows);
        // columns that look like log10 values read as linear (those declared --log or --ln are
        // already converted by LogarithmicColumns): a warning, or bad input under --strict
        List<LogValuedColumnGuard.Finding> suspicious = LogValuedColumnGuard.inspect(source, loader.mappedColumns(source));
        if (!suspicious.isEmpty() && strict) {
            throw new BadInputException(profile + ": " + LogValuedColumnGuard.oneLine(suspicious));
        }
        suspicious.forEach(f -> spec.commandLine().getErr().println("audit: warning: " + profile + ": " + f.message()));
        return new Loaded(loader.load(source), policy, file.headerLines());
    }
}
