package org.stellabar.pipeline;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalInt;
import java.util.Set;
import org.stellabar.audit.AuditReport;
import org.stellabar.audit.AuditSummary;
import org.stellabar.audit.AuditTables;
import org.stellabar.audit.ColumnarProfileSource;
import org.stellabar.audit.CsvProfileSource;
import org.stellabar.audit.ProfileAudit;
import org.stellabar.audit.ProfileSource;
import org.stellabar.charts.ChartFormat;
import org.stellabar.charts.ChartSpec;
import org.stellabar.output.AtomicFiles;
import org.stellabar.output.CsvTableReader;
import org.stellabar.output.FitsColumn;
import org.stellabar.output.FitsTable;
import org.stellabar.output.FitsTableReader;
import org.stellabar.output.FitsWriter;
import org.stellabar.output.OutputFolder;
import org.stellabar.output.TableFormat;
import org.stellabar.output.TextTableReader;
import org.stellabar.output.AstronomyTableReader;
import org.stellabar.table.CellTable;
import org.stellabar.output.FitsUnits;
import org.stellabar.physics.BadInputException;
import org.stellabar.table.ColumnHeading;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * The files around an audit: reading a profile from CSV or FITS into the audit's columns, and
 * writing the audit's tables, report and charts. The audit itself is in
 * {@link org.stellabar.audit}.
 */
public final class AuditRun {

    /** The per-shell table's formats unless asked otherwise. */
    public static final Set<TableFormat> FORMATS = java.util.Collections.unmodifiableSet(
            EnumSet.of(TableFormat.CSV, TableFormat.FITS, TableFormat.ECSV));

    private AuditRun() {
    }

    /**
     * A table file as read: its columns, and the lines of metadata it carries above them (a text
     * table's header block, an ECSV or VOTable file's parameters), for the report.
     *
     * @param source the columns
     * @param headerLines the file's metadata as text lines, empty when it has none to report
     */
    public record Read(ProfileSource source, List<String> headerLines) {

        /**
         * Canonical constructor: copies the lines in.
         *
         * @param source the columns
         * @param headerLines the file's metadata as text lines, empty when it has none to report
         */
        public Read {
            headerLines = List.copyOf(headerLines);
        }
    }

    /**
     * Reads a profile table: FITS when the file starts with a FITS header, VOTable when it is XML
     * (or ends in .vot), ECSV when it starts with "# %ECSV", CSV when its column-name line has
     * commas, otherwise whitespace-separated text ({@link TextTableReader}).
     *
     * @param file the profile
     * @param fitsExtension the EXTNAME of the table to read from a FITS file, or null for the first
     * @return the profile's columns
     * @throws BadInputException naming the file when it cannot be read
     */
    public static ProfileSource source(Path file, String fitsExtension) {
        return read(file, fitsExtension, OptionalInt.empty()).source();
    }

    /**
     * As {@link #source(Path, String)}, with the file's metadata lines.
     *
     * @param file the profile
     * @param fitsExtension the EXTNAME of the table to read from a FITS file, or null for the first
     * @param namesLine the 1-based line of a text table's column names, or empty to find it
     * @return the columns and the metadata lines
     * @throws BadInputException naming the file (or the option) when it cannot be read
     */
    public static Read read(Path file, String fitsExtension, OptionalInt namesLine) {
        if (!Files.isRegularFile(file)) {
            throw new BadInputException("PROFILE " + file + ": " + (Files.exists(file) ? "not a regular file" : "no such file"));
        }
        TableFileKind kind = TableFileKind.of(file);
        if (fitsExtension != null && kind != TableFileKind.FITS) {
            throw new BadInputException("--fits-extension " + fitsExtension + ": " + file + " is not a FITS file");
        }
        if (namesLine.isPresent() && kind != TableFileKind.TEXT && kind != TableFileKind.CSV) {
            throw new BadInputException("--names-line " + namesLine.getAsInt() + ": " + file + " is a " + kind.name()
                    + " file, whose columns are named in its header; the option is for whitespace-separated text");
        }
        return switch (kind) {
            case FITS -> new Read(fits(file, fitsExtension), List.of());
            case ECSV -> astronomy(file, AstronomyTableReader.Format.ECSV);
            case VOTABLE -> astronomy(file, AstronomyTableReader.Format.VOTABLE);
            case CSV -> namesLine.isPresent() ? text(file, namesLine)
                    : new Read(new CsvProfileSource(new CsvTableReader().read(file)), List.of());
            case TEXT -> text(file, namesLine);
        };
    }

    private static Read text(Path file, OptionalInt namesLine) {
        TextTableReader reader = namesLine.isPresent() ? new TextTableReader().withNamesLine(namesLine.getAsInt())
                : new TextTableReader();
        CellTable table = reader.read(file);
        return new Read(new CsvProfileSource(table), table.comments());
    }

    private static Read astronomy(Path file, AstronomyTableReader.Format format) {
        AstronomyTableReader.ReadTable table = AstronomyTableReader.read(file, format);
        ColumnarProfileSource.Builder b = new ColumnarProfileSource.Builder(file.toString(), table.rows());
        for (AstronomyTableReader.ReadColumn c : table.columns()) {
            if (c.numbers() != null) {
                // a unit we know in another spelling ("g / cm3") in ours; one we do not, as written
                b.numbers(new ColumnHeading(c.name(), c.unit().isEmpty() ? null : FitsUnits.fromFitsOrAsGiven(c.unit())),
                        c.numbers());
            } else {
                b.text(c.name(), c.text());
            }
        }
        // a table stellabar wrote records its composition: a VOTable PARAM, an input in ECSV's meta
        String prefix = "composition = ";
        table.parameters().stream().filter(p -> p.startsWith(prefix)).findFirst()
                .ifPresent(p -> b.recordedComposition(p.substring(prefix.length())));
        if (format == AstronomyTableReader.Format.ECSV) {
            ecsvRecordedComposition(file).ifPresent(b::recordedComposition);
        }
        return new Read(b.build(), table.parameters());
    }

    /**
     * The composition input of an ECSV file stellabar wrote: {@code output.EcsvWriter} puts the
     * inputs in the {@code meta} mapping, one line of JSON (STIL leaves nested mappings out).
     */
    private static java.util.Optional<String> ecsvRecordedComposition(Path file) {
        try (java.io.BufferedReader in = Files.newBufferedReader(file, java.nio.charset.StandardCharsets.UTF_8)) {
            for (String line = in.readLine(); line != null && line.startsWith("#"); line = in.readLine()) {
                if (line.startsWith("# meta: {")) {
                    com.fasterxml.jackson.databind.JsonNode composition = new com.fasterxml.jackson.databind.ObjectMapper()
                            .readTree(line.substring("# meta: ".length())).path("inputs").path("composition");
                    return composition.isTextual() ? java.util.Optional.of(composition.asText()) : java.util.Optional.empty();
                }
            }
        } catch (IOException e) {
            // not our JSON meta line (another writer's YAML): no recorded composition
        }
        return java.util.Optional.empty();
    }

    private static ProfileSource fits(Path file, String fitsExtension) {
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
        // a profile stellabar wrote records its composition (FitsWriter: HIERARCH STELLABAR INPUT.COMPOSITION)
        b.recordedComposition(table.keywords().get("STELLABAR INPUT COMPOSITION"));
        return b.build();
    }

    /** What a table file is, from its first bytes and, for text, its column-name line. */
    private enum TableFileKind {
        FITS, VOTABLE, ECSV, CSV, TEXT;

        static TableFileKind of(Path file) {
            if (looksLikeFits(file)) {
                return FITS;
            }
            String head = head(file);
            String start = head.stripLeading();
            if (start.startsWith("<?xml") || start.startsWith("<VOTABLE") || file.toString().endsWith(".vot")) {
                return VOTABLE;
            }
            if (start.startsWith("# %ECSV")) {
                return ECSV;
            }
            List<String> lines = head.lines().toList();
            // the last line may be cut by the 64 KiB read: leave it out
            return TextTableReader.looksLikeText(lines.size() > 1 ? lines.subList(0, lines.size() - 1) : lines) ? TEXT
                    : CSV;
        }

        private static String head(Path file) {
            try (InputStream in = Files.newInputStream(file)) {
                return new String(in.readNBytes(1 << 16), java.nio.charset.StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new BadInputException("PROFILE " + file + ": cannot be read (" + e.getMessage() + ")");
            }
        }
    }

    private static boolean looksLikeFits(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(9);
            return new String(head, java.nio.charset.StandardCharsets.US_ASCII).equals("SIMPLE  =");
        } catch (IOException e) {
            throw new BadInputException("PROFILE " + file + ": cannot be read (" + e.getMessage() + ")");
        }
    }

    /**
     * Writes shells.csv, shells.fits, summary.json, report.md and the charts into a folder;
     * renders everything first, then writes each file atomically.
     *
     * @param audit the audit
     * @param metadata its metadata
     * @param shells the per-shell table
     * @param tolerance the pressure tolerance, drawn on the chart
     * @param out the folder
     * @return the files written
     */
    public static List<String> write(ProfileAudit audit, Metadata metadata, Table shells, double tolerance, Path out) {
        return write(audit, metadata, shells, tolerance, out, FORMATS);
    }

    /**
     * As {@link #write(ProfileAudit, Metadata, Table, double, Path)}, the per-shell table in these
     * formats (shells.csv, shells.ecsv, ...); summary.json, the report and the charts as always.
     *
     * @param audit the audit
     * @param metadata its metadata
     * @param shells the per-shell table
     * @param tolerance the pressure tolerance, drawn on the chart
     * @param out the folder
     * @param formats the per-shell table's formats
     * @return the files written
     */
    public static List<String> write(ProfileAudit audit, Metadata metadata, Table shells, double tolerance, Path out,
            Set<TableFormat> formats) {
        // Each file streams to disk through AtomicFiles (a 10^6-shell audit's tables are hundreds of
        // megabytes: never held in memory as bytes); each is whole or absent.
        Summary summary = AuditSummary.of(audit, metadata, null, false);
        Map<String, ChartSpec> charts = AuditFigures.of(shells, tolerance);
        List<String> names = new ArrayList<>();
        for (TableFormat f : formats) {
            names.add("shells." + f.extension());
        }
        names.add("summary.json");
        for (String chart : charts.keySet()) {
            for (String width : new String[] {"1col", "2col"}) {
                for (ChartFormat f : ChartFormat.values()) {
                    names.add(chart + "-" + width + "." + f.extension());
                }
            }
        }
        String report = AuditReport.markdown(audit, metadata, names);
        List<String> written = new ArrayList<>();
        try {
            Files.createDirectories(out);
            OutputFolder folder = new OutputFolder(out);
            for (Path p : folder.tables("shells", shells, formats)) {
                written.add(p.toString());
            }
            written.add(folder.json("summary.json", summary).toString());
            Path reportFile = out.resolve("report.md");
            AtomicFiles.writeText(reportFile, w -> w.write(report));
            written.add(reportFile.toString());
            for (Map.Entry<String, ChartSpec> c : charts.entrySet()) {
                for (Path p : FigureExport.bothWidths(c.getValue(), out, c.getKey(), EnumSet.allOf(ChartFormat.class))) {
                    written.add(p.toString());
                }
            }
        } catch (IOException e) {
            throw new BadInputException(String.format(Locale.US, "--out %s: cannot write (%s)", out, e.getMessage()));
        }
        return written;
    }
}
