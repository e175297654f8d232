package org.stellabar.pipeline;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Where a scenario run writes: the output folder (profiles, summary, charts) and the notebook.
 *
 * @param outputFolder folder for tables and charts
 * @param notebook the notebook file
 */
public record RunLayout(Path outputFolder, Path notebook) {

    /** Default root of run outputs, relative to the working folder (ignored by git). */
    public static final Path DEFAULT_OUTPUT_ROOT = Path.of("profiles", "out");
    /** Default folder of exported notebooks, relative to the working folder. */
    public static final Path DEFAULT_NOTEBOOK_FOLDER = Path.of("notebooks-export");

    /**
     * Canonical constructor: no component may be null.
     *
     * @param outputFolder folder for tables and charts
     * @param notebook the notebook file
     */
    public RunLayout {
        Objects.requireNonNull(outputFolder, "outputFolder");
        Objects.requireNonNull(notebook, "notebook");
    }

    /**
     * The default layout: {@code profiles/out/<scenario>/} and {@code notebooks-export/<scenario>.ipynb},
     * or everything under {@code out} when given.
     *
     * @param scenarioName the scenario's name
     * @param out a folder chosen by the user, or null
     * @return the layout
     */
    public static RunLayout of(String scenarioName, Path out) {
        String slug = FileNames.slug(scenarioName);
        if (out != null) {
            return new RunLayout(out, out.resolve(slug + ".ipynb"));
        }
        return new RunLayout(DEFAULT_OUTPUT_ROOT.resolve(slug), DEFAULT_NOTEBOOK_FOLDER.resolve(slug + ".ipynb"));
    }

    /** @return the folder of per-star profile tables */
    public Path starFolder() {
        return outputFolder.resolve("stars");
    }

    /** @return the folder of charts */
    public Path chartFolder() {
        return outputFolder.resolve("charts");
    }

    /**
     * @param file a file under the output folder
     * @return its path relative to the notebook's folder, with forward slashes
     */
    public String relativeToNotebook(Path file) {
        Path base = notebook.toAbsolutePath().normalize().getParent();
        return base.relativize(file.toAbsolutePath().normalize()).toString().replace('\\', '/');
    }
}
