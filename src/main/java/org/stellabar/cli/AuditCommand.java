package org.stellabar.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.stellabar.charts.ChartExporter;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.charts.FigureSize;
import org.stellabar.eos.Composition;
import org.stellabar.output.AtomicFiles;
import org.stellabar.output.CsvTableReader;
import org.stellabar.output.CsvWriter;
import org.stellabar.output.FitsColumn;
import org.stellabar.output.FitsTable;
import org.stellabar.output.FitsTableReader;
import org.stellabar.output.FitsUnits;
import org.stellabar.output.FitsWriter;
import org.stellabar.output.JsonWriter;
import org.stellabar.physics.BadInputException;
import org.stellabar.survey.audit.AuditReport;
import org.stellabar.survey.audit.AuditTables;
import org.stellabar.survey.audit.ColumnMapping;
import org.stellabar.survey.audit.ColumnarProfileSource;
import org.stellabar.survey.audit.CompositionPolicy;
import org.stellabar.survey.audit.CsvProfileSource;
import org.stellabar.survey.audit.LoadedProfile;
import org.stellabar.survey.audit.ProfileAudit;
import org.stellabar.survey.audit.ProfileAuditor;
import org.stellabar.survey.audit.ProfileLoader;
import org.stellabar.survey.audit.ProfileSource;
import org.stellabar.table.Column;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.Metadata;
import org.stellabar.table.NumberColumn;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;
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

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROFILE",
            description = "The profile table: CSV with a header row ('#' lines are comments), or a FITS binary table.")
    Path profile;

    @Option(names = "--columns", split = ",", paramLabel = "KEY=COLUMN", mapFallbackValue = "",
            description = "Which column holds which quantity; keys r, m, rho, T, P, X, Y, Z, Gamma1 (rho and T required).")
    Map<String, String> columns = new LinkedHashMap<>();

    @Option(names = "--units", split = ",", paramLabel = "KEY=UNIT", mapFallbackValue = "",
            description = "Unit of a column, by quantity key or column name, e.g. r=Rsun,rho=kg/m3,P=Pa (overrides the header).")
    Map<String, String> units = new LinkedHashMap<>();

    @Mixin
    CompositionOptions composition;

    @Option(names = "--fits-extension", paramLabel = "EXTNAME",
            description = "For a FITS profile: the binary table with this EXTNAME (default: the first binary table).")
    String fitsExtension;

    @Option(names = "--tolerance", paramLabel = "TOL", defaultValue = "1e-3", converter = Quantities.Number.class,
            description = "Flag rows where |P_profile/P_ours - 1| exceeds this (default ${DEFAULT-VALUE}).")
    double tolerance;

    @Option(names = "--skip-bad-rows",
            description = "Leave out rows that cannot be audited (ragged, empty or non-numeric cells, out of order) and list them, instead of stopping.")
    boolean skipBadRows;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Write the per-shell table (shells.csv, shells.fits), summary.json, report.md and the charts"
                    + " (beta and Gamma1, pressure mismatch, hydrostatic residual; PNG, SVG, PDF) into this folder.")
    Path out;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "Terminal output: text (summary), json (summary with every shell under 'shells'), csv (the per-shell table); default ${DEFAULT-VALUE}.")
    OutputFormat format;

    @Override
    public Integer call() {
        ColumnMapping mapping = ColumnMapping.of(columns).withUnits(units);
        Composition mixture = composition.composition();
        boolean compositionGiven = composition.x != null || composition.y != null || composition.z != null
                || composition.mu != null;
        CompositionPolicy policy = compositionGiven ? CompositionPolicy.wholeStar(mixture)
                : CompositionPolicy.columnsFirst(mixture);
        ProfileAuditor auditor = new ProfileAuditor(tolerance);
        if (out != null && Files.exists(out) && !Files.isDirectory(out)) {
            throw new BadInputException("--out " + out + ": exists and is not a folder");
        }

        LoadedProfile loaded = new ProfileLoader(mapping, policy, skipBadRows).load(source(profile));
        ProfileAudit audit = auditor.audit(loaded);

        Map<String, String> inputs = new LinkedHashMap<>();
        inputs.put("profile", profile.toString());
        inputs.put("columns", loaded.mapped().stream().map(c -> c.quantity().key() + "=" + c.column())
                .collect(Collectors.joining(", ")));
        if (!units.isEmpty()) {
            inputs.put("units", units.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue())
                    .collect(Collectors.joining(", ")));
        }
        inputs.put("composition", compositionGiven ? composition.describe() : loaded.compositionSource());
        inputs.put("tolerance", String.valueOf(tolerance));
        inputs.put("skip_bad_rows", String.valueOf(skipBadRows));
        Metadata metadata = AuditTables.metadata(audit, inputs);
        Table shells = AuditTables.shells(audit, metadata);

        List<String> written = out == null ? List.of() : write(audit, metadata, shells);

        PrintWriter stdout = spec.commandLine().getOut();
        switch (format) {
            case text -> {
                Printer.print(AuditTables.summary(audit, metadata, null, true), format, stdout);
                for (String f : written) {
                    stdout.println("wrote " + f);
                }
                stdout.flush();
            }
            case json -> Printer.print(AuditTables.summary(audit, metadata, shells, false), format, stdout);
            case csv -> Printer.print(shells, format, stdout);
        }
        return 0;
    }

    /** Reads the profile; FITS is recognised by its first bytes. */
    private ProfileSource source(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new BadInputException("PROFILE " + file + ": " + (Files.exists(file) ? "not a regular file" : "no such file"));
        }
        if (!looksLikeFits(file)) {
            if (fitsExtension != null) {
                throw new BadInputException("--fits-extension " + fitsExtension + ": " + file + " is not a FITS file");
            }
            return new CsvProfileSource(new CsvTableReader().read(file));
        }
        FitsTable table;
        try {
            table = FitsTableReader.read(file, fitsExtension);
        } catch (IOException e) {
            throw new BadInputException("PROFILE " + file + ": cannot be read (" + e.getMessage() + ")");
        }
        ColumnarProfileSource.Builder b = new ColumnarProfileSource.Builder(file.toString(), table.rowCount());
        for (FitsColumn c : table.columns()) {
            // no TUNIT: no unit stated (CGS assumed for a dimensional quantity)
            b.numbers(new ColumnHeading(c.name(), c.fitsUnit().isBlank() ? null : c.unit()), c.values());
        }
        table.textColumns().forEach(b::text);
        return b.build();
    }

    private static boolean looksLikeFits(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(9);
            return new String(head, java.nio.charset.StandardCharsets.US_ASCII).equals("SIMPLE  =");
        } catch (IOException e) {
            throw new BadInputException("PROFILE " + file + ": cannot be read (" + e.getMessage() + ")");
        }
    }

    /** Renders everything first, then writes each file atomically. */
    private List<String> write(ProfileAudit audit, Metadata metadata, Table shells) {
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put("shells.csv", utf8(render(w -> CsvWriter.withComments().write(shells, w))));
        ByteArrayOutputStream fits = new ByteArrayOutputStream();
        try {
            new FitsWriter().write(List.of(fitsSpelled(shells)), fits);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        files.put("shells.fits", fits.toByteArray());
        Summary summary = AuditTables.summary(audit, metadata, null, false);
        files.put("summary.json", utf8(render(w -> new JsonWriter().write(summary, w))));
        List<String> names = new ArrayList<>(files.keySet());
        Map<String, ChartSpec> charts = AuditCharts.of(shells, tolerance);
        for (String chart : charts.keySet()) {
            for (ChartFormat f : ChartFormat.values()) {
                names.add(chart + "." + f.extension());
            }
        }
        files.put("report.md", utf8(AuditReport.markdown(audit, metadata, names)));
        List<String> written = new ArrayList<>();
        try {
            Files.createDirectories(out);
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path target = out.resolve(e.getKey());
                AtomicFiles.write(target, o -> o.write(e.getValue()));
                written.add(target.toString());
            }
            ChartExporter exporter = new ChartExporter(FigureSize.ONE_COLUMN);
            for (Map.Entry<String, ChartSpec> c : charts.entrySet()) {
                for (Path p : exporter.write(c.getValue(), out, c.getKey(), EnumSet.allOf(ChartFormat.class))) {
                    written.add(p.toString());
                }
            }
        } catch (IOException e) {
            throw new BadInputException(String.format(Locale.ROOT, "--out %s: cannot write (%s)", out, e.getMessage()));
        }
        return written;
    }

    /**
     * The table with every unit FITS can spell; an input column in a unit it cannot (kg/m3, Pa,
     * MK ...) keeps its values and carries the unit in its description instead of TUNIT.
     */
    private static Table fitsSpelled(Table table) {
        List<Column> columns = new ArrayList<>();
        for (Column c : table.columns()) {
            if (!(c instanceof NumberColumn n) || knownToFits(c.unit())) {
                columns.add(c);
            } else if (FitsUnits.fromFits(n.unit()).isPresent()) {
                // another spelling of a unit we know, e.g. "g cm-3" or "solRad" from the input
                columns.add(new NumberColumn(n.name(), FitsUnits.fromFits(n.unit()).get(), n.description(), n.values()));
            } else {
                columns.add(new NumberColumn(n.name(), "", n.description() + " [unit: " + n.unit() + "]", n.values()));
            }
        }
        return new Table(table.name(), table.metadata(), columns);
    }

    private static boolean knownToFits(String unit) {
        try {
            FitsUnits.toFits(unit);
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private static byte[] utf8(String text) {
        return text.getBytes(java.nio.charset.StandardCharsets.UTF_8);
    }

    private interface Render {
        void to(StringWriter w) throws IOException;
    }

    private static String render(Render r) {
        StringWriter w = new StringWriter();
        try {
            r.to(w);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }
}
