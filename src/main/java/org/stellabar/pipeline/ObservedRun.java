package org.stellabar.pipeline;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import org.stellabar.charts.ChartFormat;
import org.stellabar.output.TableFormat;
import org.stellabar.charts.ChartSpec;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.Objects;
import org.stellabar.audit.ProfileSource;
import org.stellabar.observed.ObservedCatalogue;
import org.stellabar.observed.ObservedSchema;
import org.stellabar.observed.ObservedStarAnalysis;
import org.stellabar.observed.StarOutcome;
import org.stellabar.observed.StarProblem;
import org.stellabar.observed.UncertaintyPropagation;
import org.stellabar.output.OutputFolder;
import org.stellabar.physics.BadInputException;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.table.Inputs;
import org.stellabar.table.Metadata;
import org.stellabar.table.Summary;
import org.stellabar.table.Table;

/**
 * {@code stellabar observed}: a catalogue file in ({@link AuditRun#source}, the one place that
 * knows the table formats), the per-star estimates ({@link ObservedCatalogue}) out as a table
 * (CSV, FITS) and a JSON summary with every row.
 */
public final class ObservedRun {

    /** The table's formats unless asked otherwise; observed.json, the summary, is always written. */
    public static final Set<TableFormat> FORMATS = java.util.Collections.unmodifiableSet(
            EnumSet.of(TableFormat.CSV, TableFormat.FITS, TableFormat.ECSV));

    /** File stem of the outputs: observed.csv, observed.fits, observed.json. */
    public static final String STEM = "observed";

    /** Method notes written into the metadata of every output. */
    public static final List<String> NOTES = List.of(
            "R, Teff or L from the other two by L = 4 pi R^2 sigma Teff^4; log_g = log10(G M/R^2 [cm/s2])",
            "Gamma_e = kappa_es L/(4 pi G M c), kappa_es = 0.2(1+X) cm2/g (Thomson scattering, n_e = rho(1+X)/(2 m_u))",
            "standard model (n = 3, constant beta from Eddington's quartic) of this M and mu scaled to (M, R): "
                    + "beta_standard, rho_c, T_c, P_c, Gamma1_mean and the stability margins",
            "M_from_L: mass of the standard model whose L = (1 - beta) L_Edd equals the observed L; model-dependent; "
                    + "used as M when the catalogue gives neither M nor log_g (mass_source)",
            String.format(Locale.US, "uncertainties: Monte Carlo, %d draws per star, seed %d, errors uncorrelated and normal "
                    + "(in dex for log columns); median and 16th/84th percentiles", UncertaintyPropagation.SAMPLES,
                    UncertaintyPropagation.SEED));

    /**
     * The estimates of a catalogue.
     *
     * @param outcomes every row's outcome
     * @param table the stars with an estimate
     * @param summary every row, with counts
     * @param locations row number → "file:line"
     */
    public record Result(List<StarOutcome> outcomes, Table table, Summary summary, Map<Integer, String> locations) {
        /**
         * Canonical constructor: no component may be null; copies collections in.
         *
         * @param outcomes every row's outcome
         * @param table the stars with an estimate
         * @param summary every row, with counts
         * @param locations row number → "file:line"
         */
        public Result {
            outcomes = List.copyOf(outcomes);
            Objects.requireNonNull(table, "table");
            Objects.requireNonNull(summary, "summary");
            locations = Map.copyOf(locations);
        }

        /** @return the rows without an estimate, each as "file:line: row N: kind: message" */
        public List<String> badRows() {
            List<String> lines = new ArrayList<>();
            for (StarOutcome o : outcomes) {
                for (StarProblem p : o.problems()) {
                    lines.add(locations.getOrDefault(p.row(), "row " + p.row()) + ": " + p.describe());
                }
            }
            return lines;
        }
    }

    private ObservedRun() {
    }

    /**
     * @param file the catalogue (CSV or FITS)
     * @param fitsExtension EXTNAME of the FITS table, or null for the first
     * @param reader how to read its columns
     * @param model the standard model
     * @param inputs the options as given, for metadata
     * @return the estimates
     * @throws BadInputException for a file, column or unit that cannot be read
     */
    public static Result run(Path file, String fitsExtension, CatalogueReader reader, EddingtonStandardModel model,
            Inputs inputs) {
        return run(file, fitsExtension, java.util.OptionalInt.empty(), reader, model, inputs);
    }

    /**
     * @param file the catalogue (CSV, ECSV, VOTable, FITS or whitespace-separated text)
     * @param fitsExtension EXTNAME of the FITS table, or null for the first
     * @param namesLine the 1-based line of a text catalogue's column names, or empty to find it
     * @param reader how to read its columns
     * @param model the standard model
     * @param inputs the options as given, for metadata
     * @return the estimates
     * @throws BadInputException for a file, column or unit that cannot be read
     */
    public static Result run(Path file, String fitsExtension, java.util.OptionalInt namesLine, CatalogueReader reader,
            EddingtonStandardModel model, Inputs inputs) {
        return run(source(file, fitsExtension, namesLine), file.getFileName().toString(), reader, model, inputs);
    }

    /**
     * @param file the catalogue (CSV, ECSV, VOTable, FITS or whitespace-separated text)
     * @param fitsExtension EXTNAME of the FITS table, or null for the first
     * @param namesLine the 1-based line of a text catalogue's column names, or empty to find it
     * @return the catalogue's table as read, before any column has a meaning
     * @throws BadInputException for a missing file or one that cannot be read
     */
    public static ProfileSource source(Path file, String fitsExtension, java.util.OptionalInt namesLine) {
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new BadInputException("CATALOGUE " + file, java.nio.file.Files.exists(file) ? "not a regular file" : "no such file");
        }
        return AuditRun.read(file, fitsExtension, namesLine).source();
    }

    /**
     * @param source the catalogue's table
     * @param fileName its file name, for "file:line" locations and the title
     * @param reader how to read its columns
     * @param model the standard model
     * @param inputs the options as given, for metadata
     * @return the estimates
     * @throws BadInputException for a column or unit that cannot be read
     */
    public static Result run(ProfileSource source, String fileName, CatalogueReader reader, EddingtonStandardModel model,
            Inputs inputs) {
        CatalogueReader.Catalogue catalogue = reader.read(source, fileName);
        List<StarOutcome> outcomes = new ObservedCatalogue(new ObservedStarAnalysis(model)).analyzeEntries(catalogue.entries());
        Metadata metadata = Metadata.of("observed stars of " + fileName, inputs, NOTES);
        return new Result(outcomes, ObservedSchema.table(STEM, metadata, outcomes),
                ObservedSchema.summary(STEM, metadata, outcomes), catalogue.locations());
    }

    /**
     * Writes observed.csv, observed.ecsv, observed.fits (when a star has an estimate) and observed.json into a
     * folder, and the charts ({@link ObservedFigures}) under charts/.
     *
     * @param result the estimates
     * @param out the folder
     * @param model the standard model for the charts' curves
     * @return the files written
     */
    public static List<Path> write(Result result, Path out, EddingtonStandardModel model) {
        return write(result, out, model, FORMATS);
    }

    /**
     * Writes the table of estimates in each format (FITS only when a star has an estimate),
     * observed.json (the summary with every star's outcome, whatever the formats: it is the
     * catalogue's JSON) and the charts ({@link ObservedFigures}) under charts/.
     *
     * @param result the estimates
     * @param out the folder
     * @param model the standard model for the charts' curves
     * @param formats the table's formats
     * @return the files written
     */
    public static List<Path> write(Result result, Path out, EddingtonStandardModel model, Set<TableFormat> formats) {
        List<Path> written = new ArrayList<>();
        try {
            OutputFolder folder = new OutputFolder(java.nio.file.Files.createDirectories(out));
            for (TableFormat f : formats) {
                if (f != TableFormat.JSON && (f != TableFormat.FITS || result.table().rowCount() > 0)) {
                    written.add(folder.table(STEM, result.table(), f));
                }
            }
            written.add(folder.json(STEM + ".json", result.summary()));
            if (result.table().rowCount() > 0) {
                Path charts = java.nio.file.Files.createDirectories(out.resolve("charts"));
                for (Map.Entry<String, ChartSpec> c : ObservedFigures.of(result.table(), model).entrySet()) {
                    written.addAll(FigureExport.bothWidths(c.getValue(), charts, c.getKey(), EnumSet.allOf(ChartFormat.class)));
                }
            }
        } catch (IOException e) {
            throw new BadInputException("--out " + out, "cannot write (" + e.getMessage() + ")");
        }
        return written;
    }
}
