package org.stellabar.pipeline;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.stellabar.audit.CsvProfileSource;
import org.stellabar.eos.Composition;
import org.stellabar.output.CsvTableReader;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.table.Inputs;

/**
 * The demo's invented catalogue of observed stars ({@code profiles/demo-catalogue.csv}, packaged
 * beside the demo scenario), which {@code stellabar model} without arguments runs after the
 * demo cluster, into the {@value #FOLDER} folder of the cluster's output. Its column mapping is
 * the one written in the catalogue's header and in README.md.
 */
public final class DemoCatalogue {

    /** Resource name, beside {@link org.stellabar.scenario.ScenarioReader}. */
    public static final String RESOURCE = "demo-catalogue.csv";

    /** Folder of the demo catalogue's outputs inside the demo's output folder. */
    public static final String FOLDER = "observed";

    /** The command-line mapping of the demo catalogue's columns. */
    public static final Map<String, String> COLUMNS = columns();

    /** Log10 columns of the demo catalogue. */
    public static final List<String> LOG = List.of("L", "Teff");

    private DemoCatalogue() {
    }

    private static Map<String, String> columns() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("name", "star");
        m.put("L", "logL");
        m.put("Teff", "logTeff");
        m.put("M", "Mspec");
        m.put("L_err", "e_logL");
        m.put("Teff_err", "e_logTeff");
        m.put("M_err", "e_Mspec");
        m.put("X", "Xsurf");
        return java.util.Collections.unmodifiableMap(m);
    }

    /**
     * Estimates the demo catalogue and writes its files, the table in its default formats.
     *
     * @param outputFolder the demo's output folder; the files go to its {@value #FOLDER} folder
     * @param model the standard model
     * @return the estimates and the files written
     */
    public static Map.Entry<ObservedRun.Result, List<Path>> run(Path outputFolder, EddingtonStandardModel model) {
        return run(outputFolder, model, ObservedRun.FORMATS);
    }

    /**
     * Estimates the demo catalogue and writes its files.
     *
     * @param outputFolder the demo's output folder; the files go to its {@value #FOLDER} folder
     * @param model the standard model
     * @param formats the formats of the table of estimates
     * @return the estimates and the files written
     */
    public static Map.Entry<ObservedRun.Result, List<Path>> run(Path outputFolder, EddingtonStandardModel model,
            java.util.Set<org.stellabar.output.TableFormat> formats) {
        ObservedRun.Result result = estimate(model);
        return Map.entry(result, ObservedRun.write(result, outputFolder.resolve(FOLDER), model, formats));
    }

    /**
     * Where the catalogue's files go and in which table formats: known once the demo scenario is
     * read and its output folders checked.
     *
     * @param outputFolder the demo's output folder; the files go to its {@value #FOLDER} folder
     * @param formats the formats of the table of estimates
     */
    public record Destination(Path outputFolder, java.util.Set<org.stellabar.output.TableFormat> formats) {
    }

    /**
     * Runs the catalogue on a thread of its own, beside the demo cluster: the estimates (the
     * Monte Carlo draws, most of its work) at once — while the scenario is still being read, when
     * the second core has nothing else to do — and the files once {@code destination} is given.
     * If {@code destination} fails (an output folder that cannot be used), nothing is written.
     *
     * @param destination completed with where the files go, or exceptionally
     * @return the running task: the estimates and the files written
     */
    public static java.util.concurrent.FutureTask<Map.Entry<ObservedRun.Result, List<Path>>> startBeside(
            java.util.concurrent.CompletableFuture<Destination> destination) {
        var task = new java.util.concurrent.FutureTask<Map.Entry<ObservedRun.Result, List<Path>>>(() -> {
            EddingtonStandardModel model = EddingtonStandardModel.create();
            ObservedRun.Result result = estimate(model);
            Destination d = destination.join();
            return Map.entry(result, ObservedRun.write(result, d.outputFolder().resolve(FOLDER), model, d.formats()));
        });
        new Thread(task, "demo-catalogue").start();
        return task;
    }

    /**
     * @param model the standard model
     * @return the demo catalogue's estimates
     */
    public static ObservedRun.Result estimate(EddingtonStandardModel model) {
        String text;
        try (InputStream in = org.stellabar.scenario.ScenarioReader.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new UncheckedIOException(new IOException("resource " + RESOURCE
                        + " is missing beside ScenarioReader; the build did not package it"));
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        CatalogueReader reader = new CatalogueReader(COLUMNS, Map.of(), LOG, Composition.DEFAULT);
        CsvProfileSource source = new CsvProfileSource(new CsvTableReader().parse("built-in " + RESOURCE, text.lines().toList()));
        Inputs.Builder inputs = Inputs.builder().text("catalogue", "built-in " + RESOURCE);
        COLUMNS.forEach((k, v) -> inputs.text("column_" + k, v));
        inputs.text("log10_columns", String.join(",", LOG));
        return ObservedRun.run(source, RESOURCE, reader, model, inputs.build());
    }
}
