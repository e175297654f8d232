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
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code stellabar audit}: checks a stellar profile from another code against gas + radiation physics. */
@Command(name = "audit", header = "Check a stellar profile from another code against gas + radiation physics.", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Checks a stellar profile from another code (CSV or FITS, one row per shell)",
                "against a fully ionized ideal gas + radiation: our P, beta, Gamma1 and nabla_ad",
                "at each shell's (rho, T), the mismatch with the profile's P and Gamma1,",
                "hydrostatic equilibrium and mass continuity, the virial ratio, <Gamma1> with",
                "the stability margins, and the zones where the ideal description fails.",
                "Columns are found by our own names (r, m, rho, T, P, X, Y, Z, Gamma1) unless",
                "--columns maps them; units come from --units, else from the file, else CGS."},
        footer = {"%nExamples:",
                "  stellabar audit star.csv --columns r=radius_cm,rho=density,T=temp,m=mass \\",
                "      --X 0.7 --Z 0.02",
                "  stellabar audit star.csv --units r=Rsun,m=Msun,rho=kg/m3 --out audit-star"})
public final class AuditCommand implements Callable<Integer> {

    @CommandLine.Mixin
    QuietOption quiet = new QuietOption();

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROFILE",
            description = "The profile table: CSV with a header row ('#' lines are comments), ECSV, VOTable, a FITS"
                    + " binary table, or whitespace-separated text (header lines, then the column names, then rows"
                    + " of numbers).")
    Path profile;

    @Option(names = "--log", split = ",", paramLabel = "KEY",
            description = "Quantity keys whose columns hold log10 values, of the unit --units gives (or the file states),"
                    + " e.g. --log rho,T,P --units rho=g/cm3,T=K,P=dyn/cm2.")
    List<String> log10 = new java.util.ArrayList<>();

    @Option(names = "--ln", split = ",", paramLabel = "KEY",
            description = "Quantity keys whose columns hold natural logarithms, as --log.")
    List<String> ln = new java.util.ArrayList<>();

    @Option(names = "--names-line", paramLabel = "N",
            description = "For whitespace-separated text: the line (from 1) that names the columns (default: the last"
                    + " line that is not all numbers before the first that is).")
    Integer namesLine;

    @Option(names = "--columns", split = ",", paramLabel = "KEY=COLUMN", mapFallbackValue = "",
            description = "Which column holds which quantity; keys r, m, rho, T, P, X, Y, Z, Gamma1 (rho and T required).")
    Map<String, String> columns = new LinkedHashMap<>();

    @Option(names = "--units", split = ",", paramLabel = "KEY=UNIT", mapFallbackValue = "",
            description = "Unit of a column, by quantity key or column name, e.g. r=Rsun,rho=kg/m3,P=Pa (overrides the header).")
    Map<String, String> units = new LinkedHashMap<>();

    @Mixin
    CompositionOptions composition;

    @Mixin
    ElectronsOption electrons;

    @Option(names = "--fits-extension", paramLabel = "EXTNAME",
            description = "For a FITS profile: the binary table with this EXTNAME (default: the first binary table).")
    String fitsExtension;

    @Option(names = "--tolerance", paramLabel = "TOL", defaultValue = "1e-3", converter = Quantities.Number.class,
            description = "Flag rows where |P_profile/P_ours - 1| exceeds this (default ${DEFAULT-VALUE}).")
    double tolerance;

    @Option(names = "--skip-bad-rows",
            description = "Leave out rows that cannot be audited (ragged, empty or non-numeric cells, out of order) and list them, instead of stopping.")
    boolean skipBadRows;

    @Option(names = "--strict",
            description = "Refuse input that looks wrong (e.g. log10 values in a column read as linear) instead of warning.")
    boolean strict;

    @Mixin
    TableFormatsOption tableFormats;

    @Option(names = {"-o", "--out"}, paramLabel = "DIR",
            description = "Write the per-shell table (shells.csv, .ecsv, .fits unless --table-formats says otherwise), summary.json, report.md and the charts"
                    + " (beta and Gamma1, pressure mismatch, hydrostatic residual; PNG, SVG, PDF) into this folder.")
    Path out;

    @Option(names = {"-f", "--format"}, paramLabel = "FORMAT", defaultValue = "text",
            description = "Terminal output: text (summary), json (summary with every shell under 'shells'), csv (the per-shell table); default ${DEFAULT-VALUE}.")
    OutputFormat format;

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
